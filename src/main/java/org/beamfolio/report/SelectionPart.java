package org.beamfolio.report;

import java.util.ArrayList;
import java.util.List;
import org.beamfolio.model.Job;
import org.beamfolio.model.Section;
import org.beamfolio.model.SectionChoice;
import org.beamfolio.units.Numbers;

/**
 * The selection sheet of a section the tool chose: how the candidates were given, the order they
 * were tried in, each candidate tried with its weight, governing check and ratio (the values the
 * checks gave, not worked again), the one chosen, and, when none passes, by how much the best
 * one misses.
 */
final class SelectionPart {
    private final Job job;
    private final Texts t;

    SelectionPart(Job job, Texts t) {
        this.job = job;
        this.t = t;
    }

    /** The section of the job the tool chose, or null. */
    static Section chosenSection(Job job) {
        return job.sections().values().stream().filter(s -> s.choice() != null && !s.choice().tried().isEmpty())
                .findFirst().orElse(null);
    }

    /** The sheet, or null for a job that names all its sections. */
    ReportModel.Selection build() {
        Section section = chosenSection(job);
        if (section == null) {
            return null;
        }
        SectionChoice choice = section.choice();
        SectionChoice.Trial chosen = choice.chosen();
        boolean lumber = choice.kind().timber();
        boolean weights = choice.tried().stream().noneMatch(tr -> Double.isNaN(tr.weight()));
        List<String> header = new ArrayList<>(List.of("Tried", lumber ? "Size" : "Shape"));
        if (weights) {
            header.add("Weight (" + Texts.symbol(t.units().distributed()) + ")");
        }
        header.add("Area (" + Texts.symbol(t.units().area()) + ")");
        header.addAll(List.of("Governing check", "Ratio", "Result"));
        List<List<String>> rows = new ArrayList<>();
        List<Boolean> failing = new ArrayList<>();
        for (int i = 0; i < choice.tried().size(); i++) {
            SectionChoice.Trial tr = choice.tried().get(i);
            List<String> row = new ArrayList<>(List.of(Integer.toString(i + 1), name(tr, t)));
            if (weights) {
                row.add(t.plain(tr.weight(), t.units().distributed()));
            }
            row.add(t.plain(tr.area(), t.units().area()));
            row.add(Double.isNaN(tr.ratio()) ? tr.governing() + ": " + tr.description() : tr.governing());
            row.add(Double.isNaN(tr.ratio()) ? "-" : Numbers.format(tr.ratio()));
            row.add((tr == chosen ? "CHOSEN, " : "") + (tr.pass() ? "passes" : "fails"));
            rows.add(row);
            failing.add(!tr.pass());
        }
        String order = lumber ? "by cross-section area, smallest first (equal areas: the shallower first)"
                : "by nominal weight per length W, lightest first (equal weights: the shallower first)";
        String method = "Each candidate is put in the job as if named there and the beam is analysed and checked in full:"
                + " every combination and arrangement and every check of this package"
                + (job.beam().selfWeightCase() != null ? ", with the candidate's own self weight" : "")
                + ". Candidates are tried " + order + "; the first that passes every check is the lightest that does, and"
                + " the heavier ones are not tried.";
        int notTried = choice.candidates().size() - choice.tried().size();
        return new ReportModel.Selection("Choosing section " + section.id(), "Candidates: " + choice.basis() + ".", method,
                new ReportModel.Table(header, rows, failing, header.size() - 1), outcome(choice, chosen),
                notTried == 0 ? "" : notTried + " heavier candidate" + (notTried == 1 ? " was" : "s were") + " not tried.",
                choice.passing());
    }

    private String outcome(SectionChoice choice, SectionChoice.Trial chosen) {
        if (!chosen.pass()) {
            double miss = (chosen.ratio() - 1) * 100;
            return "No candidate passes every check. The package uses " + name(chosen, t) + ", the candidate with the lowest"
                    + " governing ratio: " + chosen.governing() + " at a ratio of " + Numbers.format(chosen.ratio())
                    + ", which misses its limit by " + Numbers.format(miss) + " %. The member is marked as failing: choose"
                    + " from heavier candidates, or change the bracing, spans or loads.";
        }
        String text = name(chosen, t) + " is chosen: the lightest candidate that passes every check (governing: "
                + chosen.governing() + ", ratio " + Numbers.format(chosen.ratio()) + ").";
        int at = choice.tried().indexOf(chosen);
        if (at > 0) {
            SectionChoice.Trial lighter = choice.tried().get(at - 1);
            text += " The next " + (choice.kind().timber() ? "smaller" : "lighter") + " candidate, " + name(lighter, t) + ", fails: " + (Double.isNaN(lighter.ratio())
                    ? lighter.governing() + " (" + lighter.description() + ")"
                    : lighter.governing() + " at a ratio of " + Numbers.format(lighter.ratio())) + ".";
        }
        return text;
    }

    /** A candidate as the sheet names it: designation, lumber size, or a glulam's width x depth. */
    static String name(SectionChoice.Trial tr, Texts t) {
        Section s = tr.section();
        if (s.lumber() != null) {
            return s.lumber().toString();
        }
        if (s.shape() instanceof org.beamfolio.model.SectionShape.Rectangle r) {
            return t.plain(r.b(), t.units().sectionLength()) + " x " + t.plain(r.h(), t.units().sectionLength()) + " "
                    + Texts.symbol(t.units().sectionLength());
        }
        return s.designation();
    }
}
