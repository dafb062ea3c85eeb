package org.beamfolio.design.steel;

import static org.beamfolio.catalogue.ShapeProperty.ZX;

/** Yielding of round HSS and pipe: Mn = Mp = Fy Z, AISC 360 F8.1, Eq. F8-1. */
public final class F8Yielding implements FlexuralLimitState {
    @Override
    public String name() {
        return "yielding";
    }

    @Override
    public Clause clause(Edition edition) {
        return Clause.of(edition, "F8.1", "F8-1");
    }

    @Override
    public LimitStateResult evaluate(SteelMember m, FlexureCase bending, Work work) {
        Work w = work.given("Fy", m.fy(), Kind.STRESS).given("Z", m.shape().get(ZX), Kind.MODULUS);
        double mn = w.eq("F8-1", "Mn", Kind.MOMENT, "{Fy} * {Z}");
        return LimitStateResult.governs(name(), clause(m.edition()), mn, w, "Mn = Mp");
    }
}
