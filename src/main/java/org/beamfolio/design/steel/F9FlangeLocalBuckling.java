package org.beamfolio.design.steel;

import static org.beamfolio.catalogue.ShapeProperty.BF_2TF;
import static org.beamfolio.catalogue.ShapeProperty.IX;
import static org.beamfolio.catalogue.ShapeProperty.SX;
import static org.beamfolio.catalogue.ShapeProperty.Y_BAR;
import static org.beamfolio.catalogue.ShapeProperty.ZX;

/**
 * Flange local buckling of tees with the flange in compression (stem in tension), AISC 360-16 F9.3:
 * noncompact flanges by Eq. F9-14 (no more than 1.6 My), slender flanges by Eq. F9-15, with Sxc =
 * Ix / y referred to the compression flange; flange limits of Table B4.1b case 10. It does not
 * apply with the flange in tension.
 */
public final class F9FlangeLocalBuckling implements FlexuralLimitState {
    @Override
    public String name() {
        return "flange local buckling";
    }

    @Override
    public Clause clause(Edition edition) {
        return Clause.of(edition, "F9.3", "F9-14", "F9-15");
    }

    @Override
    public LimitStateResult evaluate(SteelMember m, FlexureCase bending, Work work) {
        var s = m.shape();
        String note = TeeNote.of(m.edition());
        Work w = work.given("Fy", m.fy(), Kind.STRESS).given("E", m.e(), Kind.STRESS)
                .given("Zx", s.get(ZX), Kind.MODULUS).given("Sx", s.get(SX), Kind.MODULUS)
                .given("Ix", s.get(IX), Kind.INERTIA).given("y", s.get(Y_BAR), Kind.LENGTH)
                .given("lambda", s.get(BF_2TF), Kind.NUMBER);
        if (bending.stemInCompression()) {
            return LimitStateResult.doesNotApply(name(), clause(m.edition()), w, "flange in tension: does not apply" + note);
        }
        double lpf = w.eq("Table B4.1b case 10", "lambda_pf", Kind.NUMBER, "0.38 * sqrt({E} / {Fy})");
        double lrf = w.eq("Table B4.1b case 10", "lambda_rf", Kind.NUMBER, "1.0 * sqrt({E} / {Fy})");
        double lambda = s.get(BF_2TF);
        if (lambda <= lpf) {
            return LimitStateResult.doesNotApply(name(), clause(m.edition()), w, "compact flange: does not apply" + note);
        }
        w.eq("F9.3", "Sxc", Kind.MODULUS, "{Ix} / {y}");
        if (lambda <= lrf) {
            w.eq("F9-3", "My", Kind.MOMENT, "{Fy} * {Sx}");
            w.eqCapped("F9-2", "Mp", Kind.MOMENT, "{Fy} * {Zx}", "1.6 My", "1.6 * {My}");
            double mn = w.eqCapped("F9-14", "Mn", Kind.MOMENT,
                    "{Mp} - ({Mp} - 0.7 * {Fy} * {Sxc}) * (({lambda} - {lambda_pf}) / ({lambda_rf} - {lambda_pf}))",
                    "1.6 My", "1.6 * {My}");
            return LimitStateResult.governs(name(), clause(m.edition()), mn, w, "noncompact flange" + note);
        }
        double mn = w.eq("F9-15", "Mn", Kind.MOMENT, "0.7 * {E} * {Sxc} / {lambda}^2");
        return LimitStateResult.governs(name(), clause(m.edition()), mn, w, "slender flange" + note);
    }
}
