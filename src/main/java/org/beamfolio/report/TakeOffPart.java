package org.beamfolio.report;

import java.util.ArrayList;
import java.util.List;
import org.beamfolio.loads.LiveLoadReduction;
import org.beamfolio.loads.TakeOff;
import org.beamfolio.loads.Tributary;
import org.beamfolio.model.ReportSettings;
import org.beamfolio.units.Numbers;
import org.beamfolio.units.Unit;
import org.beamfolio.units.Units;

/**
 * The take-off of the area loads, line by line (pressure x width = line load, x the reduction
 * factor where one applies), and the live load reduction worked beneath it: AT, KLL, the factor
 * and its clause, or why no reduction applies.
 */
final class TakeOffPart {
    private final TakeOff takeOff;
    private final Texts t;
    private final Unit pressure;
    private final Unit area;

    TakeOffPart(TakeOff takeOff, org.beamfolio.units.UnitSystem units, Texts t) {
        this.takeOff = takeOff;
        this.t = t;
        boolean us = units == org.beamfolio.units.UnitSystem.US;
        this.pressure = Units.of(us ? "psf" : "kPa");
        this.area = Units.of(us ? "ft^2" : "m^2");
    }

    /** Null when the job has no area loads. */
    ReportModel.AreaLoads build() {
        if (takeOff.isEmpty()) {
            return null;
        }
        List<List<String>> rows = new ArrayList<>();
        for (TakeOff.Line line : takeOff.lines()) {
            Tributary tr = line.tributary();
            String w = product(line.pressure(), tr.widthStart(), line.unreducedStart())
                    + (tr.varying() ? " to " + product(line.pressure(), tr.widthEnd(), line.unreducedEnd()) : "");
            String used = lineLoad(line.wStart()) + (tr.varying() ? " to " + lineLoad(line.wEnd()) : "");
            List<String> notes = new ArrayList<>();
            for (String n : List.of(tr.load().note(), tr.note())) {
                if (!n.isBlank()) {
                    notes.add(n);
                }
            }
            rows.add(List.of(tr.load().name(), line.loadCase(), w, line.reduced() ? "× " + Numbers.format(line.factor()) : "none",
                    used, t.len(tr.from()) + " to " + t.len(tr.to()), String.join("; ", notes)));
        }
        ReportModel.Table table = new ReportModel.Table(List.of("Area load", "Case", "Pressure × width = line load",
                "Reduction", "Line load used", "Where", "Note"), rows);
        List<ReportModel.Equation> working = new ArrayList<>();
        for (TakeOff.Area a : takeOff.areas()) {
            working.add(tributaryArea(a));
        }
        for (TakeOff.Outcome o : takeOff.outcomes()) {
            working.add(reduction(o));
        }
        return new ReportModel.AreaLoads(table, working);
    }

    private ReportModel.Equation tributaryArea(TakeOff.Area a) {
        List<String> terms = new ArrayList<>();
        for (Tributary tr : a.counted()) {
            terms.add(tr.load().name() + " (" + t.len(tr.widthStart()) + " + " + t.len(tr.widthEnd()) + ") / 2 × "
                    + t.len(tr.to() - tr.from()) + " = " + t.q(tr.area(), area));
        }
        String result = "AT = " + t.q(a.area(), area) + (area.symbol().equals("ft^2") ? ""
                : " (" + Numbers.format(a.area() / (0.3048 * 0.3048), "ft²") + ")");
        return new ReportModel.Equation("Tributary area of the member for case " + a.loadCase()
                + ": the area loads marked reducible and not excluded",
                "AT = Σ (b_start + b_end) / 2 × (to − from), the integral of the tributary width b over the loaded length",
                String.join("; ", terms), result,
                (a.loadCase().equals(TakeOff.FLOOR_LIVE) ? "ASCE/SEI 7-22 4.7.2 (AT)" : "ASCE/SEI 7-22 4.8.2 (AT)")
                        + "; the integral of a linear width is exact, common practice");
    }

    private ReportModel.Equation reduction(TakeOff.Outcome o) {
        LiveLoadReduction.Reduction r = o.reduction();
        boolean floor = o.loadCase().equals(TakeOff.FLOOR_LIVE);
        String what = (floor ? "Live" : "Roof live") + " load reduction, area load " + o.areaLoad() + ", case " + o.loadCase();
        String symbolic = floor ? "L = Lo (0.25 + 15 / √(KLL AT)), KLL AT ≥ 400 ft², L ≥ 0.50 Lo (one floor) or 0.40 Lo (two or more)"
                : "Lr = Lo R1 R2, 12 psf ≤ Lr ≤ Lo";
        if (!r.applied()) {
            return new ReportModel.Equation(what + ": none", symbolic, r.basis(), "factor 1 (not reduced)", o.clause());
        }
        String kll = floor ? "KLL = " + Numbers.format(r.kll()) + " (Table 4.7-1); KLL AT = " + Numbers.format(r.kll()) + " × "
                + Numbers.format(r.atSqFt(), "ft²") + " = " + Numbers.format(r.kll() * r.atSqFt(), "ft²") + " ≥ 400 ft²; " : "";
        return new ReportModel.Equation(what, symbolic, kll + r.basis(), "factor " + o.loadCase() + " / Lo = " + Numbers.format(r.factor()),
                o.clause());
    }

    private String product(double p, double width, double w) {
        return t.q(p, pressure) + " × " + t.len(width) + " = " + lineLoad(w);
    }

    private String lineLoad(double w) {
        return t.q(w, t.units().distributed());
    }
}
