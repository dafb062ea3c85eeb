package org.beamfolio.design.steel;

import static org.beamfolio.catalogue.ShapeProperty.SX;
import static org.beamfolio.catalogue.ShapeProperty.ZX;

/**
 * Yielding of tees in the plane of symmetry, AISC 360-16 F9.1: Mn = Mp with, for a stem in
 * tension, Mp = Fy Zx no more than 1.6 My (Eq. F9-2) and, for a stem in compression, Mp = My
 * (Eq. F9-4); My = Fy Sx (Eq. F9-3), Sx the tabulated (smaller) elastic modulus, to the stem tip.
 */
public final class F9Yielding implements FlexuralLimitState {
    @Override
    public String name() {
        return "yielding";
    }

    @Override
    public Clause clause(Edition edition) {
        return Clause.of(edition, "F9.1", "F9-1", "F9-2", "F9-3", "F9-4");
    }

    @Override
    public LimitStateResult evaluate(SteelMember m, FlexureCase bending, Work work) {
        var s = m.shape();
        Work w = work.given("Fy", m.fy(), Kind.STRESS).given("Zx", s.get(ZX), Kind.MODULUS)
                .given("Sx", s.get(SX), Kind.MODULUS);
        w.eq("F9-3", "My", Kind.MOMENT, "{Fy} * {Sx}");
        if (bending.stemInCompression()) {
            double mn = w.eq("F9-4", "Mn", Kind.MOMENT, "{My}");
            return LimitStateResult.governs(name(), clause(m.edition()), mn, w, "stem in compression" + TeeNote.of(m.edition()));
        }
        double mn = w.eqCapped("F9-2", "Mn", Kind.MOMENT, "{Fy} * {Zx}", "1.6 My", "1.6 * {My}");
        return LimitStateResult.governs(name(), clause(m.edition()), mn, w, "stem in tension" + TeeNote.of(m.edition()));
    }
}
