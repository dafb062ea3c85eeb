package org.beamfolio.design.steel;

import java.util.List;
import org.beamfolio.analysis.Field;
import org.beamfolio.analysis.Polynomial;
import org.beamfolio.analysis.Roots;

/**
 * The lateral-torsional buckling modification factor of one unbraced segment [from, to], AISC 360
 * F1, Eq. F1-1: Cb = 12.5 Mmax / (2.5 Mmax + 3 MA + 4 MB + 3 MC), absolute values. Mmax is exact:
 * every polynomial piece of the moment field that meets the segment is examined at its ends
 * within the segment and at the real roots of its derivative there, never sampled. The quarter
 * point moments are read from the field; where a quarter point falls on a jump (a concentrated
 * couple), the larger absolute value of the two sides is taken, which gives the smaller Cb. A
 * segment that ends at an unbraced free end takes Cb = 1.0 (F1: permitted for cantilevers and
 * overhangs whose free end is unbraced); so does a segment without moment.
 *
 * @param equation the equation that gave Cb, as the package prints it; null when worked for
 *                 {@link Detail#VALUES}
 */
public record MomentGradient(double from, double to, double cb, double mMax, double atMax, double mA, double mB,
                             double mC, boolean freeEnd, Equation equation) {

    public static Clause clause(Edition edition) {
        return Clause.of(edition, "F1", "F1-1");
    }

    /** The unbraced length Lb = to - from (m). */
    public double lb() {
        return to - from;
    }

    /**
     * @param moment the moment field of one combination (N*m)
     * @param endsAtFreeEnd whether one end of the segment is an unbraced free end
     */
    public static MomentGradient of(Field moment, double from, double to, boolean endsAtFreeEnd) {
        return of(moment, from, to, endsAtFreeEnd, Detail.PRINTED);
    }

    /** As {@link #of(Field, double, double, boolean)}; worked for {@link Detail#VALUES}, its {@code equation} is null. */
    public static MomentGradient of(Field moment, double from, double to, boolean endsAtFreeEnd, Detail detail) {
        if (!(to > from)) {
            throw new IllegalArgumentException("an unbraced segment needs to > from, got [" + from + ", " + to + "]");
        }
        double[] max = absoluteMaximum(moment, from, to);
        double quarter = (to - from) / 4;
        Work w = new Work(detail).given("Mmax", max[0], Kind.MOMENT)
                .given("MA", absoluteAt(moment, from + quarter), Kind.MOMENT)
                .given("MB", absoluteAt(moment, from + 2 * quarter), Kind.MOMENT)
                .given("MC", absoluteAt(moment, from + 3 * quarter), Kind.MOMENT);
        double cb;
        if (endsAtFreeEnd) {
            cb = w.eq("F1 (free end unbraced)", "Cb", Kind.NUMBER, "1.0");
        } else if (max[0] == 0) {
            cb = w.eq("F1 (no moment)", "Cb", Kind.NUMBER, "1.0");
        } else {
            cb = w.eq("F1-1", "Cb", Kind.NUMBER, "12.5 * {Mmax} / (2.5 * {Mmax} + 3 * {MA} + 4 * {MB} + 3 * {MC})");
        }
        List<Equation> eqs = w.equations();
        return new MomentGradient(from, to, cb, max[0], max[1], w.value("MA").value(), w.value("MB").value(),
                w.value("MC").value(), endsAtFreeEnd, eqs.isEmpty() ? null : eqs.get(eqs.size() - 1));
    }

    /** The largest |M| on [from, to] and where, from the pieces' end values and stationary points. */
    static double[] absoluteMaximum(Field moment, double from, double to) {
        double best = 0;
        double at = from;
        for (int i = 0; i < moment.size(); i++) {
            double lo = Math.max(from, moment.start(i));
            double hi = Math.min(to, moment.end(i));
            if (hi <= lo) {
                continue;
            }
            Polynomial p = moment.piece(i);
            double s0 = lo - moment.start(i);
            double s1 = hi - moment.start(i);
            double[] ends = {s0, s1};
            for (double s : ends) {
                double v = Math.abs(p.at(s));
                if (v > best) {
                    best = v;
                    at = moment.start(i) + s;
                }
            }
            for (double s : Roots.in(p.derivative(), s0, s1)) {
                double v = Math.abs(p.at(s));
                if (v > best) {
                    best = v;
                    at = moment.start(i) + s;
                }
            }
        }
        return new double[] {best, at};
    }

    private static double absoluteAt(Field moment, double x) {
        return Math.max(Math.abs(moment.leftOf(x)), Math.abs(moment.at(x)));
    }
}
