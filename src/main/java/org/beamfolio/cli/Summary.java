package org.beamfolio.cli;

import java.util.List;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.ReactionEnvelope;
import org.beamfolio.analysis.Extreme;
import org.beamfolio.analysis.Extremes;
import org.beamfolio.analysis.StressDemand;
import org.beamfolio.model.Support;
import org.beamfolio.units.Numbers;
import org.beamfolio.checks.CheckOutcome;
import org.beamfolio.units.ReportUnits;
import org.beamfolio.units.Unit;

/** The one-screen terminal summary that {@code check} prints for a job. */
final class Summary {
    private Summary() {}

    static String of(AnalysisResult r, List<CheckOutcome> checks) {
        ReportUnits u = ReportUnits.of(r.job().report().units());
        StringBuilder out = new StringBuilder();
        out.append(r.job().name()).append(": ").append(r.job().project().title()).append('\n');
        out.append("  length ").append(len(r.job().beam().length(), u)).append("; ");
        List<String> spans = r.spans().stream().map(s -> s.label() + " " + len(s.to() - s.from(), u)).toList();
        out.append(String.join(", ", spans)).append('\n');
        r.job().sections().values().stream().filter(s -> s.choice() != null && !s.choice().tried().isEmpty()).forEach(s ->
                out.append("  section ").append(s.id()).append(" chosen: ").append(CandidatesTable.name(s, u))
                        .append(s.choice().passing() ? ", the lightest that passes every check" : ", the best of candidates that all FAIL")
                        .append(" (").append(s.choice().tried().size()).append(" tried; check --candidates lists them)\n"));
        out.append("  ").append(r.combinations().size()).append(" combinations from ").append(r.combinationSource()).append('\n');
        List<Support> supports = r.job().beam().supports();
        List<ReactionEnvelope.AtSupport> reactions = r.reactions().supports();
        out.append("  governing reactions (").append(u.force().symbol())
                .append(", up +), largest and smallest over every combination and arrangement:\n");
        for (int i = 0; i < Math.min(8, reactions.size()); i++) {
            Support s = supports.get(i);
            ReactionEnvelope.AtSupport a = reactions.get(i);
            out.append(String.format("    R%-3d %-7s at %-10s max %12s (%s)%n", i + 1, s.kind().label(), len(s.at(), u),
                    Numbers.format(u.force().fromSi(a.max().force())), a.max().combination()));
            out.append(String.format("    %-26s min %12s (%s)%s%n", "", Numbers.format(u.force().fromSi(a.min().force())),
                    a.min().combination(), a.uplift() ? "  UPLIFT" : ""));
        }
        if (reactions.size() > 8) {
            long uplift = reactions.stream().skip(8).filter(ReactionEnvelope.AtSupport::uplift).count();
            out.append("    (").append(reactions.size() - 8).append(" more supports in the results file")
                    .append(uplift > 0 ? ", " + uplift + " of them with UPLIFT" : "").append(")\n");
        }
        Extremes e = r.envelope();
        if (e != null) {
            line(out, "moment, sagging", e.momentMax(), u.moment(), u);
            line(out, "moment, hogging", e.momentMin(), u.moment(), u);
            line(out, "shear, largest +", e.shearMax(), u.force(), u);
            line(out, "shear, largest -", e.shearMin(), u.force(), u);
            line(out, "deflection, down", e.deflectionMax(), u.deflection(), u);
        }
        // the governing stresses the checks and the worked steps read
        for (StressDemand d : java.util.Arrays.asList(r.stresses().tension(), r.stresses().compression(), r.stresses().shear())) {
            if (d != null) {
                line(out, "stress, " + d.kind().name().toLowerCase(java.util.Locale.ROOT), d.extreme(), u.stress(), u);
            }
        }
        for (CheckOutcome c : checks) {
            out.append(String.format("  %-4s %-40s ratio %-8s %s%n", c.pass() ? "ok" : "FAIL", c.id(), Numbers.format(c.ratio()),
                    c.combination()));
        }
        if (r.pivotRatio() < AnalysisResult.POOR_CONDITIONING) {
            out.append("  warning: the model is badly conditioned (smallest pivot ratio ").append(Numbers.format(r.pivotRatio()))
                    .append("); check very stiff springs or very short spans\n");
        }
        if (!r.droppedCombinations().isEmpty()) {
            out.append("  note: ").append(r.droppedCombinations().size()).append(" combinations of the set left out (listed in the package)\n");
        }
        if (checks.stream().anyMatch(c -> !c.pass())) {
            out.append("  DOES NOT MEET: ").append(String.join(", ", checks.stream().filter(c -> !c.pass()).map(CheckOutcome::id).toList()))
                    .append(" exceed their limits (exit status 3)\n");
        }
        return out.toString();
    }

    private static void line(StringBuilder out, String label, Extreme e, Unit unit, ReportUnits u) {
        out.append(String.format("  %-20s %14s at %-10s (%s)%n", label, Numbers.format(unit.fromSi(e.value()), unit.symbol()),
                len(e.at(), u), e.combination()));
    }

    private static String len(double metres, ReportUnits u) {
        return Numbers.format(u.length().fromSi(metres), u.length().symbol());
    }
}
