package org.beamfolio.cli;

import java.util.List;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.CombinationResult;
import org.beamfolio.analysis.Extreme;
import org.beamfolio.analysis.Extremes;
import org.beamfolio.model.Support;
import org.beamfolio.units.Numbers;
import org.beamfolio.results.CheckOutcome;
import org.beamfolio.results.ReportUnits;
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
        out.append("  ").append(r.combinations().size()).append(" combinations from ").append(r.combinationSource()).append('\n');
        out.append("  reactions (least and greatest over the combinations):\n");
        List<Support> supports = r.job().beam().supports();
        for (int i = 0; i < supports.size(); i++) {
            double lo = Double.POSITIVE_INFINITY;
            double hi = Double.NEGATIVE_INFINITY;
            for (CombinationResult c : r.combinations()) {
                lo = Math.min(lo, c.response().reactionForce()[i]);
                hi = Math.max(hi, c.response().reactionForce()[i]);
            }
            out.append(String.format("    %-7s at %-10s %s to %s%n", supports.get(i).kind().label(), len(supports.get(i).at(), u),
                    Numbers.format(u.force().fromSi(lo)), Numbers.format(u.force().fromSi(hi), u.force().symbol())));
        }
        Extremes e = r.envelope();
        if (e != null) {
            line(out, "moment, sagging", e.momentMax(), u.moment(), u);
            line(out, "moment, hogging", e.momentMin(), u.moment(), u);
            line(out, "shear, largest +", e.shearMax(), u.force(), u);
            line(out, "shear, largest -", e.shearMin(), u.force(), u);
            line(out, "deflection, down", e.deflectionMax(), u.deflection(), u);
            line(out, "stress, tension", Math.abs(e.stressTopMax().value()) > Math.abs(e.stressBottomMax().value())
                    ? e.stressTopMax() : e.stressBottomMax(), u.stress(), u);
            line(out, "stress, compression", e.stressTopMin().value() < e.stressBottomMin().value()
                    ? e.stressTopMin() : e.stressBottomMin(), u.stress(), u);
        }
        for (CheckOutcome c : checks) {
            out.append(String.format("  %-4s %-62s ratio %s%n", c.pass() ? "ok" : "FAIL", c.id(), Numbers.format(c.ratio())));
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
