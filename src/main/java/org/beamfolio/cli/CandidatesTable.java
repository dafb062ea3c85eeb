package org.beamfolio.cli;

import java.util.ArrayList;
import java.util.List;
import org.beamfolio.model.Job;
import org.beamfolio.model.Section;
import org.beamfolio.model.SectionChoice;
import org.beamfolio.units.Numbers;
import org.beamfolio.units.ReportUnits;

/**
 * The candidates a job's section choice tried, as a terminal table ({@code check --candidates}):
 * weight per length, area, governing check and ratio, pass or fail, the chosen one marked; the
 * same values the selection sheet and the results file print.
 */
final class CandidatesTable {
    private CandidatesTable() {}

    /** The table of a solved job, or of each member of a job with members under its id. */
    static String of(Pipeline.Solved solved) {
        if (!solved.hasMembers()) {
            return of(solved.result().job());
        }
        StringBuilder out = new StringBuilder();
        solved.members().forEach(m -> out.append("member ").append(m.id()).append('\n').append(of(m.result().job())));
        return out.toString();
    }

    /** The table, or a line saying the job leaves no section to choose. */
    static String of(Job job) {
        Section section = job.sections().values().stream()
                .filter(s -> s.choice() != null && !s.choice().tried().isEmpty()).findFirst().orElse(null);
        if (section == null) {
            return job.name() + ": every section is named; nothing to choose\n";
        }
        SectionChoice choice = section.choice();
        SectionChoice.Trial chosen = choice.chosen();
        ReportUnits u = ReportUnits.of(job.report().units());
        List<String[]> rows = new ArrayList<>();
        for (int i = 0; i < choice.tried().size(); i++) {
            SectionChoice.Trial t = choice.tried().get(i);
            rows.add(new String[] {Integer.toString(i + 1), (t == chosen ? "* " : "  ") + name(t.section(), u),
                    Double.isNaN(t.weight()) ? "-" : Numbers.format(u.distributed().fromSi(t.weight())),
                    Numbers.format(u.area().fromSi(t.area())), t.governing(),
                    Double.isNaN(t.ratio()) ? "-" : Numbers.format(t.ratio()), t.pass() ? "passes" : "FAILS"});
        }
        StringBuilder out = new StringBuilder();
        out.append(job.name()).append(": choosing section ").append(section.id()).append(" from ").append(choice.basis()).append('\n');
        out.append(ResultTable.of(List.of("#", "  candidate", "weight " + u.distributed().symbol(), "A " + u.area().symbol(),
                "governing check", "ratio", "result"), rows).indent(2));
        int notTried = choice.candidates().size() - choice.tried().size();
        if (chosen.pass()) {
            out.append("  chosen: ").append(name(chosen.section(), u)).append(", the lightest that passes every check");
        } else {
            out.append("  NO CANDIDATE PASSES: the lowest governing ratio is ").append(name(chosen.section(), u)).append("'s, ")
                    .append(Numbers.format(chosen.ratio())).append(" (").append(chosen.governing()).append(")");
        }
        out.append(notTried > 0 ? "; " + notTried + " heavier not tried\n" : "\n");
        return out.toString();
    }

    static String name(Section s, ReportUnits u) {
        if (s.lumber() != null) {
            return s.lumber().designation();
        }
        if (s.shape() instanceof org.beamfolio.model.SectionShape.Rectangle r) {
            return Numbers.format(u.sectionLength().fromSi(r.b())) + "x" + Numbers.format(u.sectionLength().fromSi(r.h()))
                    + " " + u.sectionLength().symbol();
        }
        return s.designation();
    }
}
