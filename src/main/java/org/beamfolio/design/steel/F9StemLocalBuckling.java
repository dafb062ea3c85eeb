package org.beamfolio.design.steel;

import static org.beamfolio.catalogue.ShapeProperty.D_T;
import static org.beamfolio.catalogue.ShapeProperty.SX;

/**
 * Local buckling of tee stems in flexural compression, AISC 360-16 F9.4: Mn = Fcr Sx (Eq. F9-16),
 * Sx to the stem tip, with Fcr = Fy for d/tw up to 0.84 sqrt(E/Fy) (Eq. F9-17), the linear
 * transition of Eq. F9-18 up to 1.52 sqrt(E/Fy), and 1.52 E / (d/tw)^2 beyond (Eq. F9-19). It
 * does not apply with the stem in tension.
 */
public final class F9StemLocalBuckling implements FlexuralLimitState {
    @Override
    public String name() {
        return "stem local buckling";
    }

    @Override
    public Clause clause(Edition edition) {
        return Clause.of(edition, "F9.4", "F9-16", "F9-17", "F9-18", "F9-19");
    }

    @Override
    public LimitStateResult evaluate(SteelMember m, FlexureCase bending, Work work) {
        var s = m.shape();
        String note = TeeNote.of(m.edition());
        Work w = work.given("Fy", m.fy(), Kind.STRESS).given("E", m.e(), Kind.STRESS)
                .given("Sx", s.get(SX), Kind.MODULUS).given("d/tw", s.get(D_T), Kind.NUMBER);
        if (!bending.stemInCompression()) {
            return LimitStateResult.doesNotApply(name(), clause(m.edition()), w, "stem in tension: does not apply" + note);
        }
        double compact = w.evaluate("0.84 * sqrt({E} / {Fy})");
        double slender = w.evaluate("1.52 * sqrt({E} / {Fy})");
        double lambda = s.get(D_T);
        String range;
        if (lambda <= compact) {
            w.eq("F9-17", "Fcr", Kind.STRESS, "{Fy}");
            range = "d/tw <= 0.84 sqrt(E/Fy)";
        } else if (lambda <= slender) {
            w.eq("F9-18", "Fcr", Kind.STRESS, "(1.43 - 0.515 * {d/tw} * sqrt({Fy} / {E})) * {Fy}");
            range = "0.84 sqrt(E/Fy) < d/tw <= 1.52 sqrt(E/Fy)";
        } else {
            w.eq("F9-19", "Fcr", Kind.STRESS, "1.52 * {E} / {d/tw}^2");
            range = "d/tw > 1.52 sqrt(E/Fy)";
        }
        double mn = w.eq("F9-16", "Mn", Kind.MOMENT, "{Fcr} * {Sx}");
        return LimitStateResult.governs(name(), clause(m.edition()), mn, w, range + note);
    }
}
