package org.beamfolio.design.steel;

import static org.beamfolio.catalogue.ShapeProperty.BF_2TF;
import static org.beamfolio.catalogue.ShapeProperty.H_TW;
import static org.beamfolio.catalogue.ShapeProperty.SX;
import static org.beamfolio.catalogue.ShapeProperty.ZX;

/**
 * Compression flange local buckling of doubly symmetric I-shapes with compact webs and noncompact
 * or slender flanges, AISC 360 F3.2: noncompact flanges by Eq. F3-1, slender flanges by Eq. F3-2
 * with kc = 4 / sqrt(h/tw) kept within 0.35 and 0.76; flange limits of Table B4.1b case 10. The
 * same in 360-16 and 360-22.
 */
public final class F3FlangeLocalBuckling implements FlexuralLimitState {
    @Override
    public String name() {
        return "flange local buckling";
    }

    @Override
    public Clause clause(Edition edition) {
        return Clause.of(edition, "F3.2", "F3-1", "F3-2");
    }

    @Override
    public LimitStateResult evaluate(SteelMember m, FlexureCase bending, Work work) {
        var s = m.shape();
        Work w = work.given("Fy", m.fy(), Kind.STRESS).given("E", m.e(), Kind.STRESS)
                .given("Zx", s.get(ZX), Kind.MODULUS).given("Sx", s.get(SX), Kind.MODULUS)
                .given("lambda", s.get(BF_2TF), Kind.NUMBER);
        w.eq("F2-1", "Mp", Kind.MOMENT, "{Fy} * {Zx}");
        double lpf = w.eq("Table B4.1b case 10", "lambda_pf", Kind.NUMBER, "0.38 * sqrt({E} / {Fy})");
        double lrf = w.eq("Table B4.1b case 10", "lambda_rf", Kind.NUMBER, "1.0 * sqrt({E} / {Fy})");
        double lambda = s.get(BF_2TF);
        if (lambda <= lpf) {
            return LimitStateResult.doesNotApply(name(), clause(m.edition()), w, "compact flange: does not apply");
        }
        if (lambda <= lrf) {
            double mn = w.eq("F3-1", "Mn", Kind.MOMENT,
                    "{Mp} - ({Mp} - 0.7 * {Fy} * {Sx}) * (({lambda} - {lambda_pf}) / ({lambda_rf} - {lambda_pf}))");
            return LimitStateResult.governs(name(), clause(m.edition()), mn, w, "noncompact flange");
        }
        w.given("h/tw", s.get(H_TW), Kind.NUMBER);
        double kc = w.eq("F3.2", "kc", Kind.NUMBER, "4 / sqrt({h/tw})");
        if (kc < 0.35) {
            w.eq("F3.2 lower limit", "kc", Kind.NUMBER, "0.35");
        } else if (kc > 0.76) {
            w.eq("F3.2 upper limit", "kc", Kind.NUMBER, "0.76");
        }
        double mn = w.eq("F3-2", "Mn", Kind.MOMENT, "0.9 * {E} * {kc} * {Sx} / {lambda}^2");
        return LimitStateResult.governs(name(), clause(m.edition()), mn, w, "slender flange");
    }
}
