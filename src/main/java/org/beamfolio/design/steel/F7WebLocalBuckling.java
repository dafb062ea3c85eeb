package org.beamfolio.design.steel;

import static org.beamfolio.catalogue.ShapeProperty.H_TDES;
import static org.beamfolio.catalogue.ShapeProperty.SX;
import static org.beamfolio.catalogue.ShapeProperty.ZX;

/**
 * Web local buckling of square and rectangular HSS bent about the major axis, AISC 360 F7.3:
 * noncompact webs by Eq. F7-6; web limits of Table B4.1b case 19. Slender webs (F7.3(c)) are out
 * of scope: no catalogue HSS has one at the grades offered (h/t at most 89 against 5.70 sqrt(E/Fy)
 * = 137 for Fy = 50 ksi).
 */
public final class F7WebLocalBuckling implements FlexuralLimitState {
    @Override
    public String name() {
        return "web local buckling";
    }

    @Override
    public Clause clause(Edition edition) {
        return Clause.of(edition, "F7.3", "F7-6");
    }

    @Override
    public LimitStateResult evaluate(SteelMember m, FlexureCase bending, Work work) {
        var s = m.shape();
        Work w = work.given("Fy", m.fy(), Kind.STRESS).given("E", m.e(), Kind.STRESS)
                .given("Zx", s.get(ZX), Kind.MODULUS).given("Sx", s.get(SX), Kind.MODULUS)
                .given("h/t", s.get(H_TDES), Kind.NUMBER);
        w.eq("F7-1", "Mp", Kind.MOMENT, "{Fy} * {Zx}");
        double lp = w.eq("Table B4.1b case 19", "lambda_p", Kind.NUMBER, "2.42 * sqrt({E} / {Fy})");
        double lr = w.eq("Table B4.1b case 19", "lambda_r", Kind.NUMBER, "5.70 * sqrt({E} / {Fy})");
        double lambda = s.get(H_TDES);
        if (lambda <= lp) {
            return LimitStateResult.doesNotApply(name(), clause(m.edition()), w, "compact webs: does not apply");
        }
        if (lambda > lr) {
            throw new OutOfScopeException(s.designation() + ": slender web (h/t > 5.70 sqrt(E/Fy)), "
                    + m.edition().label() + " F7.3(c) is not implemented");
        }
        double mn = w.eqCapped("F7-6", "Mn", Kind.MOMENT,
                "{Mp} - ({Mp} - {Fy} * {Sx}) * (0.305 * {h/t} * sqrt({Fy} / {E}) - 0.738)", "Mp");
        return LimitStateResult.governs(name(), clause(m.edition()), mn, w, "noncompact webs");
    }
}
