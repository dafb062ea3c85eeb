package org.beamfolio.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.CombinationResult;
import org.beamfolio.analysis.Extreme;
import org.beamfolio.analysis.Extremes;
import org.beamfolio.model.Hinge;
import org.beamfolio.model.Job;
import org.beamfolio.model.Load;
import org.beamfolio.model.Material;
import org.beamfolio.model.Section;
import org.beamfolio.model.Support;
import org.beamfolio.model.SupportKind;
import org.beamfolio.results.CheckOutcome;
import org.beamfolio.results.ReportUnits;
import org.beamfolio.results.Version;
import org.beamfolio.section.SectionProperties;
import org.beamfolio.units.Unit;

/** Gathers a solved job into the {@link ReportModel}, converting to the report's units once. */
final class ReportModelBuilder {
    private final AnalysisResult result;
    private final ReportUnits u;

    ReportModelBuilder(AnalysisResult result) {
        this.result = result;
        this.u = ReportUnits.of(result.job().report().units());
    }

    ReportModel build(List<CheckOutcome> checks) {
        Job job = result.job();
        var p = job.project();
        ReportModel.Project project = new ReportModel.Project(p.title(), p.number(), p.client(), p.location(), p.subject(),
                p.preparedBy(), p.checkedBy(), p.date(), p.revision(), p.notes());
        return new ReportModel(project, job.report().paper().name().toLowerCase(java.util.Locale.ROOT), Version.get(),
                job.sha256(), job.name() + ".yaml", beam(), supports(), loads(),
                List.of("Section", "Shape", "A (" + u.area().symbol() + ")", "I (" + u.secondMoment().symbol() + ")",
                        "y_b (" + u.sectionLength().symbol() + ")", "S_top (" + u.firstMoment().symbol() + ")",
                        "S_bot (" + u.firstMoment().symbol() + ")"),
                sections(), result.combinationSource(), result.droppedCombinations(), reactionHeader(), reactions(),
                envelope(), checks(checks), governing(checks), method(), cautions());
    }

    private String len(double metres) {
        return Numbers.format(u.length().fromSi(metres), u.length().symbol());
    }

    private String q(double si, Unit unit) {
        return Numbers.format(unit.fromSi(si), unit.symbol());
    }

    private List<ReportModel.Row> beam() {
        Job job = result.job();
        List<ReportModel.Row> rows = new ArrayList<>();
        rows.add(new ReportModel.Row("Length", len(job.beam().length())));
        List<String> spans = result.spans().stream().map(s -> s.label() + " " + len(s.to() - s.from())).toList();
        rows.add(new ReportModel.Row("Spans", String.join("; ", spans)));
        rows.add(new ReportModel.Row("Section", job.beam().section()));
        Material m = job.materials().get(job.beam().material());
        rows.add(new ReportModel.Row("Material", m.id() + ", E = " + q(m.elasticModulus(), org.beamfolio.units.Units.of(
                u.stress().symbol().equals("psi") ? "ksi" : "MPa")) + (m.source().isEmpty() ? "" : " (" + m.source() + ")")));
        for (var s : job.beam().segments()) {
            rows.add(new ReportModel.Row("Segment", len(s.from()) + " to " + len(s.to()) + ": section " + s.section()
                    + ", material " + s.material()));
        }
        List<String> hinges = job.beam().hinges().stream().map(Hinge::at).map(this::len).toList();
        rows.add(new ReportModel.Row("Hinges", hinges.isEmpty() ? "none" : String.join(", ", hinges)));
        if (job.beam().selfWeightCase() != null) {
            rows.add(new ReportModel.Row("Self weight", "included in case " + job.beam().selfWeightCase()));
        }
        return rows;
    }

    private List<List<String>> supports() {
        List<List<String>> rows = new ArrayList<>();
        for (Support s : result.job().beam().supports()) {
            String detail = "";
            if (s.kind() instanceof SupportKind.Spring sp) {
                detail = "k = " + q(sp.k(), u.stiffness()) + (sp.kr() > 0 ? ", kr = " + q(sp.kr(), u.rotationalStiffness()) : "");
            }
            rows.add(List.of(len(s.at()), s.kind().label(), detail));
        }
        return rows;
    }

    private List<List<String>> loads() {
        List<List<String>> rows = new ArrayList<>();
        for (Load load : result.job().loads()) {
            if (load instanceof Load.Point p) {
                rows.add(List.of(p.loadCase(), "point", "P = " + q(p.P(), u.force()), "at " + len(p.at()), p.note()));
            } else if (load instanceof Load.Couple c) {
                rows.add(List.of(c.loadCase(), "couple", "M = " + q(Math.abs(c.M()), u.moment()) + (c.M() >= 0 ? " ccw" : " cw"),
                        "at " + len(c.at()), c.note()));
            } else if (load instanceof Load.Distributed d) {
                String w = d.uniform() ? "w = " + q(d.wStart(), u.distributed())
                        : "w = " + q(d.wStart(), u.distributed()) + " to " + q(d.wEnd(), u.distributed());
                rows.add(List.of(d.loadCase(), d.uniform() ? "uniform" : "linear", w, len(d.from()) + " to " + len(d.to()), d.note()));
            }
        }
        return rows;
    }

    private List<List<String>> sections() {
        List<List<String>> rows = new ArrayList<>();
        for (Map.Entry<String, SectionProperties> e : result.sections().entrySet()) {
            SectionProperties s = e.getValue();
            Section section = result.job().sections().get(e.getKey());
            String shape = section.shape().getClass().getSimpleName().toLowerCase(java.util.Locale.ROOT) + (section.flip() ? ", flipped" : "");
            rows.add(List.of(e.getKey(), shape, s.area() == null ? "not given" : q(s.area(), u.area()).replace(" " + u.area().symbol(), ""),
                    Numbers.format(u.secondMoment().fromSi(s.inertia())), Numbers.format(u.sectionLength().fromSi(s.yBottom())),
                    Numbers.format(u.firstMoment().fromSi(s.sTop())), Numbers.format(u.firstMoment().fromSi(s.sBottom()))));
        }
        return rows;
    }

    private List<String> reactionHeader() {
        List<String> header = new ArrayList<>();
        header.add("Combination");
        for (Support s : result.job().beam().supports()) {
            header.add(s.kind().label() + " at " + len(s.at()));
        }
        return header;
    }

    private List<List<String>> reactions() {
        List<List<String>> rows = new ArrayList<>();
        List<Support> supports = result.job().beam().supports();
        for (CombinationResult c : result.combinations()) {
            if (!c.arrangement().isEmpty()) {
                continue;
            }
            List<String> row = new ArrayList<>();
            row.add(c.name());
            for (int i = 0; i < supports.size(); i++) {
                String cell = q(c.response().reactionForce()[i], u.force());
                if (supports.get(i).kind() instanceof SupportKind.Fixed || c.response().reactionMoment()[i] != 0) {
                    cell += "; " + q(c.response().reactionMoment()[i], u.moment());
                }
                row.add(cell);
            }
            rows.add(row);
        }
        return rows;
    }

    private List<List<String>> envelope() {
        Extremes e = result.envelope();
        List<List<String>> rows = new ArrayList<>();
        if (e == null) {
            return rows;
        }
        rows.add(row("Shear V", e.shearMax(), e.shearMin(), u.force()));
        rows.add(row("Moment M", e.momentMax(), e.momentMin(), u.moment()));
        rows.add(row("Deflection (down +)", e.deflectionMax(), e.deflectionMin(), u.deflection()));
        rows.add(row("Top fibre stress (tension +)", e.stressTopMax(), e.stressTopMin(), u.stress()));
        rows.add(row("Bottom fibre stress (tension +)", e.stressBottomMax(), e.stressBottomMin(), u.stress()));
        if (e.shearStressMax() != null) {
            rows.add(List.of("Shear stress at neutral axis", q(e.shearStressMax().value(), u.stress()),
                    len(e.shearStressMax().at()), e.shearStressMax().combination(), "", "", ""));
        }
        return rows;
    }

    private List<String> row(String label, Extreme max, Extreme min, Unit unit) {
        return List.of(label, q(max.value(), unit), len(max.at()), max.combination(), q(min.value(), unit), len(min.at()),
                min.combination());
    }

    private List<List<String>> checks(List<CheckOutcome> checks) {
        List<List<String>> rows = new ArrayList<>();
        for (CheckOutcome c : checks) {
            rows.add(List.of(c.description(), Numbers.format(c.demand(), c.unit()), Numbers.format(c.limit(), c.unit()),
                    Numbers.format(c.ratio()), c.pass() ? "meets limit" : "EXCEEDS LIMIT", c.combination(), len(c.at())));
        }
        return rows;
    }

    private String governing(List<CheckOutcome> checks) {
        return checks.stream().max(java.util.Comparator.comparingDouble(CheckOutcome::ratio))
                .map(c -> "Governing ratio " + Numbers.format(c.ratio()) + " (" + c.id() + ", " + c.combination() + "): "
                        + (c.pass() ? "within the limit" : "exceeds the limit"))
                .orElse("No checks were requested in the job file.");
    }

    private List<String> method() {
        return List.of(
                "Linear elastic analysis, small deflections, plane sections remain plane (Euler-Bernoulli beam theory); shear deformation is neglected.",
                "Direct stiffness method with a node at every support, hinge, load point, load end and section change; within each element shear, moment, slope and deflection are exact polynomials, so extremes are located from roots, not by sampling.",
                "Loads act downward when positive. Reactions are positive upward, support moments counter-clockwise; bending moment is positive when sagging; deflection is positive downward; stress is positive in tension.",
                "Each load case is solved once; combinations and pattern arrangements are formed by superposition.",
                "Sections are modelled as rectangles (fillets and rounded corners are not modelled) or by their closed forms; given properties are used as stated.");
    }

    private List<String> cautions() {
        return List.of(
                "This package is valid only when reviewed, signed and sealed by a licensed professional engineer responsible for the design.",
                "Loads, load combinations, support conditions and material values must be verified against the governing building code and the requirements of the authority having jurisdiction.",
                "Not checked unless shown: lateral-torsional buckling, local buckling, connections, bearing, web crippling, vibration, fire, fatigue and long-term effects such as creep.",
                "The analysis is linear elastic: it does not capture cracking, yielding, second-order effects or support settlement beyond the springs given.");
    }
}
