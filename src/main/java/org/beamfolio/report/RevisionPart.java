package org.beamfolio.report;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.Extreme;
import org.beamfolio.analysis.Extremes;
import org.beamfolio.checks.CheckOutcome;
import org.beamfolio.model.InputChange;
import org.beamfolio.units.Numbers;
import org.beamfolio.units.Unit;

/**
 * The revision-delta sheet: every input that differs between the previous revision of the job
 * and this one, and how the governing results and checks moved, so a reviewer sees what a
 * revision changed without comparing two packages by hand.
 */
final class RevisionPart {
    private final AnalysisResult now;
    private final List<CheckOutcome> nowChecks;
    private final AnalysisResult before;
    private final List<CheckOutcome> beforeChecks;
    private final List<InputChange> inputChanges;
    private final Texts t;

    RevisionPart(AnalysisResult now, List<CheckOutcome> nowChecks, AnalysisResult before, List<CheckOutcome> beforeChecks,
                 List<InputChange> inputChanges, Texts t) {
        this.now = now;
        this.nowChecks = nowChecks;
        this.before = before;
        this.beforeChecks = beforeChecks;
        this.inputChanges = List.copyOf(inputChanges);
        this.t = t;
    }

    ReportModel.Revision build() {
        List<List<String>> inputs = new ArrayList<>();
        for (InputChange change : inputChanges) {
            inputs.add(List.of(change.key(), change.before() == null ? "(not given)" : change.before(),
                    change.now() == null ? "(removed)" : change.now()));
        }
        List<List<String>> results = new ArrayList<>();
        Extremes x = before.envelope();
        Extremes y = now.envelope();
        if (x != null && y != null) {
            results.add(row("Largest sagging moment", x.momentMax(), y.momentMax(), t.units().moment()));
            results.add(row("Largest hogging moment", x.momentMin(), y.momentMin(), t.units().moment()));
            results.add(row("Largest shear", larger(x.shearMax(), x.shearMin()), larger(y.shearMax(), y.shearMin()), t.units().force()));
            results.add(row("Largest deflection", x.deflectionMax(), y.deflectionMax(), t.units().deflection()));
            // the governing stresses, as the checks and the worked steps read them
            results.add(row("Largest tension", before.stresses().tension().extreme(), now.stresses().tension().extreme(),
                    t.units().stress()));
            results.add(row("Largest compression", before.stresses().compression().extreme(), now.stresses().compression().extreme(),
                    t.units().stress()));
        }
        List<List<String>> checks = new ArrayList<>();
        Set<String> ids = new LinkedHashSet<>();
        beforeChecks.forEach(c -> ids.add(c.id()));
        nowChecks.forEach(c -> ids.add(c.id()));
        for (String id : ids) {
            CheckOutcome o = beforeChecks.stream().filter(c -> c.id().equals(id)).findFirst().orElse(null);
            CheckOutcome n = nowChecks.stream().filter(c -> c.id().equals(id)).findFirst().orElse(null);
            checks.add(List.of(id, o == null ? "-" : Numbers.format(o.ratio()) + (o.pass() ? "" : " (exceeds)"),
                    n == null ? "-" : Numbers.format(n.ratio()) + (n.pass() ? "" : " (exceeds)")));
        }
        String revisions = "Revision " + blank(before.job().project().revision()) + " (" + blank(before.job().project().date()) + ", SHA-256 "
                + before.job().sha256().substring(0, 12) + "…) to revision " + blank(now.job().project().revision()) + " ("
                + blank(now.job().project().date()) + ").";
        return new ReportModel.Revision(revisions,
                new ReportModel.Table(List.of("Input", "Previous", "This revision"), inputs),
                new ReportModel.Table(List.of("Result", "Previous", "This revision", "Change"), results),
                new ReportModel.Table(List.of("Check", "Previous ratio", "This ratio"), checks));
    }

    private static String blank(String s) {
        return s == null || s.isEmpty() ? "?" : s;
    }

    private static Extreme larger(Extreme a, Extreme b) {
        return Math.abs(a.value()) >= Math.abs(b.value()) ? a : b;
    }

    private List<String> row(String label, Extreme old, Extreme neu, Unit unit) {
        String change = old.value() == 0 ? (neu.value() == 0 ? "none" : "new")
                : Numbers.format(100 * (neu.value() - old.value()) / Math.abs(old.value())) + " %";
        return List.of(label, t.q(old.value(), unit) + " at " + t.len(old.at()), t.q(neu.value(), unit) + " at " + t.len(neu.at()), change);
    }
}
