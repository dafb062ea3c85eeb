package org.beamfolio.report;

import java.util.ArrayList;
import java.util.Collection;
import java.util.Comparator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.Response;
import org.beamfolio.checks.CheckOutcome;
import org.beamfolio.model.Job;
import org.beamfolio.model.ReactionLoad;
import org.beamfolio.units.Numbers;
import org.beamfolio.units.ReportUnits;

/**
 * Gathers the members of a job with members into one package: a cover and contents, a member
 * schedule, the design basis once (what every member's basis states, each statement once), each
 * member's part as a one-member package would print it, the load path (every reaction one member
 * carries from another, case by case), and one set of cautions, sign-off, history and job file.
 */
final class ProjectPart {
    /** One member solved and its part built. */
    record Built(String id, AnalysisResult result, List<CheckOutcome> checks, ReportModel model) {}

    /** Why a reaction arrives as it does, printed beneath the load path. */
    static final String RULE = "Each reaction is the supporting member's unfactored reaction for each of its load cases,"
            + " reversed to act downward on the member that carries it, so that member's combinations factor each case as they"
            + " factor its own loads. Live load arrives as the supporting member carried it: reduced where that member reduced"
            + " its area loads (ASCE 7 Section 4.7), and not reduced again by the member that carries it. Repeated members at a"
            + " spacing s become a line load w = R / s over the stated range. Support moments are not carried: a member bearing"
            + " on another is taken to transfer shear only.";

    private final List<Built> members;
    private final Texts t;

    ProjectPart(List<Built> members) {
        this.members = members;
        Job first = members.get(0).result().job();
        this.t = new Texts(ReportUnits.of(first.report().units()), first.report().positions());
    }

    /** The prefix of a member's anchors and figures: its place, since an id may hold characters an anchor may not. */
    static String ns(int index) {
        return "m" + (index + 1) + "-";
    }

    ProjectModel build() {
        ReportModel first = members.get(0).model();
        List<ProjectModel.Member> parts = new ArrayList<>();
        List<String> anchors = new ArrayList<>();
        for (int i = 0; i < members.size(); i++) {
            Built m = members.get(i);
            parts.add(new ProjectModel.Member(m.id(), "Member " + m.id() + ": " + section(m.result()) + ", "
                    + t.len(m.result().job().beam().length()) + " long", ns(i), m.model()));
            anchors.add(ns(i) + "loading");
        }
        List<ReportModel.Row> contents = new ArrayList<>();
        contents.add(new ReportModel.Row("Member schedule", "schedule"));
        contents.add(new ReportModel.Row("Design basis", "basis"));
        for (int i = 0; i < members.size(); i++) {
            contents.add(new ReportModel.Row(parts.get(i).title(), anchors.get(i)));
        }
        contents.add(new ReportModel.Row("Load path: reactions carried from member to member", "load-path"));
        contents.add(new ReportModel.Row("Cautions", "cautions"));
        contents.add(new ReportModel.Row("Reviewer sign-off", "review"));
        contents.add(new ReportModel.Row("Revision history", "history"));
        contents.add(new ReportModel.Row("Appendix: job file", "appendix"));
        int checks = members.stream().mapToInt(m -> m.checks().size()).sum();
        String scope = "Linear elastic analysis and design checks of " + members.size() + " members of one load path, each"
                + " solved and checked as set out in its own part, with " + checks + " checks against the stated limits; the"
                + " reactions of each member are carried, case by case, to the members that support it.";
        return new ProjectModel(first.sheet(), scope, contents, basis(), parts, schedule(), anchors, loadPath(), RULE, failing(),
                cautions(), first.reviewChecklist(), first.history(), appendices());
    }

    /** The member's section as the schedule names it: its id and its size. */
    private String section(AnalysisResult result) {
        Job job = result.job();
        org.beamfolio.model.Section s = job.sections().get(job.beam().section());
        String size;
        if (s.lumber() != null) {
            size = s.lumber().toString();
        } else if (s.shape() instanceof org.beamfolio.model.SectionShape.Rectangle r) {
            size = t.q(r.b(), t.units().sectionLength()) + " x " + t.q(r.h(), t.units().sectionLength());
        } else {
            size = StressPart.shapeName(s);
        }
        return s.id() + ", " + size;
    }

    private ReportModel.Table schedule() {
        List<List<String>> rows = new ArrayList<>();
        List<Boolean> failing = new ArrayList<>();
        for (Built m : members) {
            String spans = String.join(" + ", m.result().spans().stream().map(s -> t.len(s.to() - s.from())).toList());
            CheckOutcome governing = m.checks().stream().max(Comparator.comparingDouble(CheckOutcome::ratio)).orElse(null);
            boolean pass = m.checks().stream().allMatch(CheckOutcome::pass);
            rows.add(List.of(m.id(), section(m.result()), spans,
                    governing == null ? "no checks" : governing.id() + " (" + governing.clause() + ")",
                    governing == null ? "-" : Numbers.format(governing.ratio()), pass ? "meets" : "EXCEEDS"));
            failing.add(!pass);
        }
        return new ReportModel.Table(List.of("Member", "Section", "Span(s)", "Governing check", "Ratio", "Result"), rows, failing, 5);
    }

    private ReportModel.Table loadPath() {
        List<List<String>> rows = new ArrayList<>();
        for (Built m : members) {
            for (ReactionLoad r : m.result().job().reactionLoads()) {
                AnalysisResult from = members.stream().filter(b -> b.id().equals(r.member())).findFirst().orElseThrow().result();
                List<String> cases = new ArrayList<>();
                for (Map.Entry<String, Response> c : from.cases().entrySet()) {
                    double reaction = c.getValue().reactionForce()[r.support() - 1];
                    cases.add(c.getKey() + " " + t.force(reaction)
                            + (r.smeared() ? " / " + t.len(r.spacing()) + " = " + t.q(reaction / r.spacing(), t.units().distributed()) : ""));
                }
                String how = r.smeared() ? "line load, members at " + t.len(r.spacing()) + ", from " + t.len(r.from()) + " to "
                        + t.len(r.to()) : "point load at " + t.len(r.at());
                rows.add(List.of(m.id(), r.member() + ", support " + r.support() + " (R" + r.support() + ")", how,
                        String.join("; ", cases)));
            }
        }
        return new ReportModel.Table(List.of("Carried by", "Reaction of", "Applied as", "Unfactored, by load case"), rows);
    }

    private List<String> failing() {
        List<String> out = new ArrayList<>();
        for (Built m : members) {
            long n = m.checks().stream().filter(c -> !c.pass()).count();
            if (n > 0) {
                out.add("Member " + m.id() + ": " + n + " check" + (n == 1 ? "" : "s") + " exceed" + (n == 1 ? "s" : "")
                        + " the limit (see its checks sheet)");
            }
        }
        return out;
    }

    /** Each job file once: the one file of a job with members, or every file of a package gathered from several. */
    private List<ReportModel.Appendix> appendices() {
        Map<String, ReportModel.Appendix> byDigest = new java.util.LinkedHashMap<>();
        members.forEach(m -> byDigest.putIfAbsent(m.model().appendix().attachment() + " " + m.model().appendix().digest(),
                m.model().appendix()));
        return List.copyOf(byDigest.values());
    }

    /** Every member's basis, each statement once, in the order first stated. */
    private ReportModel.Basis basis() {
        ReportModel.Basis first = members.get(0).model().basis();
        return new ReportModel.Basis(union(m -> m.basis().codes()), first.units(), first.conventions(), first.conventionSketch(),
                union(m -> m.basis().method()), union(m -> m.basis().limitations()), first.notes(), first.materials(),
                first.sections());
    }

    /** The cautions every member states, once; a caution only some members state names them. */
    private List<String> cautions() {
        List<String> all = union(ReportModel::cautions);
        List<String> out = new ArrayList<>();
        for (String caution : all) {
            List<String> stating = members.stream().filter(m -> m.model().cautions().contains(caution)).map(Built::id).toList();
            out.add(stating.size() == members.size() ? caution : "Member" + (stating.size() == 1 ? " " : "s ")
                    + String.join(", ", stating) + ": " + caution);
        }
        return out;
    }

    private List<String> union(java.util.function.Function<ReportModel, Collection<String>> part) {
        LinkedHashSet<String> out = new LinkedHashSet<>();
        members.forEach(m -> out.addAll(part.apply(m.model())));
        return List.copyOf(out);
    }
}
