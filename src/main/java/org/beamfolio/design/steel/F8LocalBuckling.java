package org.beamfolio.design.steel;

import static org.beamfolio.catalogue.ShapeProperty.D_T;
import static org.beamfolio.catalogue.ShapeProperty.SX;

/**
 * Local buckling of round HSS and pipe, AISC 360 F8.2: noncompact walls by Eq. F8-2, slender walls
 * by Eq. F8-3 with Fcr by Eq. F8-4; limits of Table B4.1b case 20 (D/t with the design wall
 * thickness). F8 applies for D/t below 0.45 E/Fy only.
 */
public final class F8LocalBuckling implements FlexuralLimitState {
    @Override
    public String name() {
        return "local buckling";
    }

    @Override
    public Clause clause(Edition edition) {
        return Clause.of(edition, "F8.2", "F8-2", "F8-3", "F8-4");
    }

    @Override
    public LimitStateResult evaluate(SteelMember m, FlexureCase bending, Work work) {
        var s = m.shape();
        Work w = work.given("Fy", m.fy(), Kind.STRESS).given("E", m.e(), Kind.STRESS)
                .given("S", s.get(SX), Kind.MODULUS).given("D/t", s.get(D_T), Kind.NUMBER);
        double lp = w.eq("Table B4.1b case 20", "lambda_p", Kind.NUMBER, "0.07 * {E} / {Fy}");
        double lr = w.eq("Table B4.1b case 20", "lambda_r", Kind.NUMBER, "0.31 * {E} / {Fy}");
        double lambda = s.get(D_T);
        if (lambda <= lp) {
            return LimitStateResult.doesNotApply(name(), clause(m.edition()), w, "compact wall: does not apply");
        }
        if (lambda <= lr) {
            double mn = w.eq("F8-2", "Mn", Kind.MOMENT, "(0.021 * {E} / {D/t} + {Fy}) * {S}");
            return LimitStateResult.governs(name(), clause(m.edition()), mn, w, "noncompact wall");
        }
        w.eq("F8-4", "Fcr", Kind.STRESS, "0.33 * {E} / {D/t}");
        double mn = w.eq("F8-3", "Mn", Kind.MOMENT, "{Fcr} * {S}");
        return LimitStateResult.governs(name(), clause(m.edition()), mn, w, "slender wall");
    }
}
