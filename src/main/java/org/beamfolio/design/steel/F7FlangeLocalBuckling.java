package org.beamfolio.design.steel;

import static org.beamfolio.catalogue.ShapeProperty.A;
import static org.beamfolio.catalogue.ShapeProperty.B_FLAT;
import static org.beamfolio.catalogue.ShapeProperty.B_TDES;
import static org.beamfolio.catalogue.ShapeProperty.HT;
import static org.beamfolio.catalogue.ShapeProperty.IX;
import static org.beamfolio.catalogue.ShapeProperty.SX;
import static org.beamfolio.catalogue.ShapeProperty.TDES;
import static org.beamfolio.catalogue.ShapeProperty.ZX;

/**
 * Flange local buckling of square and rectangular HSS bent about the major axis, AISC 360 F7.2:
 * noncompact flanges by Eq. F7-2; slender flanges by Eq. F7-3, Mn = Fy Se, with the effective width
 * of the compression flange by Eq. F7-4 (360-16). Se is worked here from the tabulated Ix: the
 * ineffective strip (b - be) t of the compression flange is taken away and the neutral axis moved,
 * Se = Ie over the distance to the farther fibre. Flange limits of Table B4.1b case 17 (the flat
 * width b and the design wall thickness tdes). From memory: 360-22 words the effective width
 * differently; this class applies Eq. F7-4 of 360-16 for both editions until checked against the
 * 360-22 text.
 */
public final class F7FlangeLocalBuckling implements FlexuralLimitState {
    @Override
    public String name() {
        return "flange local buckling";
    }

    @Override
    public Clause clause(Edition edition) {
        return Clause.of(edition, "F7.2", "F7-2", "F7-3", "F7-4");
    }

    @Override
    public LimitStateResult evaluate(SteelMember m, FlexureCase bending, Work work) {
        var s = m.shape();
        Work w = work.given("Fy", m.fy(), Kind.STRESS).given("E", m.e(), Kind.STRESS)
                .given("Zx", s.get(ZX), Kind.MODULUS).given("Sx", s.get(SX), Kind.MODULUS)
                .given("b/t", s.get(B_TDES), Kind.NUMBER);
        w.eq("F7-1", "Mp", Kind.MOMENT, "{Fy} * {Zx}");
        double lp = w.eq("Table B4.1b case 17", "lambda_p", Kind.NUMBER, "1.12 * sqrt({E} / {Fy})");
        double lr = w.eq("Table B4.1b case 17", "lambda_r", Kind.NUMBER, "1.40 * sqrt({E} / {Fy})");
        double lambda = s.get(B_TDES);
        if (lambda <= lp) {
            return LimitStateResult.doesNotApply(name(), clause(m.edition()), w, "compact flanges: does not apply");
        }
        if (lambda <= lr) {
            double mn = w.eqCapped("F7-2", "Mn", Kind.MOMENT,
                    "{Mp} - ({Mp} - {Fy} * {Sx}) * (3.57 * {b/t} * sqrt({Fy} / {E}) - 4.0)", "Mp");
            return LimitStateResult.governs(name(), clause(m.edition()), mn, w, "noncompact flanges");
        }
        w.given("t", s.get(TDES), Kind.LENGTH).given("b", s.get(B_FLAT), Kind.LENGTH)
                .given("Ht", s.get(HT), Kind.LENGTH).given("A", s.get(A), Kind.AREA).given("Ix", s.get(IX), Kind.INERTIA);
        w.eqCapped("F7-4", "be", Kind.LENGTH, "1.92 * {t} * sqrt({E} / {Fy}) * (1 - 0.38 / {b/t} * sqrt({E} / {Fy}))", "b");
        w.eq("F7.2(c)", "Ar", Kind.AREA, "({b} - {be}) * {t}");
        w.eq("F7.2(c)", "yr", Kind.LENGTH, "({Ht} - {t}) / 2");
        w.eq("F7.2(c)", "delta", Kind.LENGTH, "{Ar} * {yr} / ({A} - {Ar})");
        w.eq("F7.2(c)", "Ie", Kind.INERTIA, "{Ix} - {Ar} * {t}^2 / 12 - {Ar} * {yr}^2 - ({A} - {Ar}) * {delta}^2");
        w.eq("F7.2(c)", "Se", Kind.MODULUS, "{Ie} / ({Ht} / 2 + {delta})");
        double mn = w.eq("F7-3", "Mn", Kind.MOMENT, "{Fy} * {Se}");
        return LimitStateResult.governs(name(), clause(m.edition()), mn, w, "slender flanges");
    }
}
