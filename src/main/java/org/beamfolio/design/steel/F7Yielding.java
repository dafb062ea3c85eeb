package org.beamfolio.design.steel;

import static org.beamfolio.catalogue.ShapeProperty.ZX;

/** Yielding of square and rectangular HSS bent about the major axis: Mn = Mp = Fy Zx, AISC 360 F7.1, Eq. F7-1. */
public final class F7Yielding implements FlexuralLimitState {
    @Override
    public String name() {
        return "yielding";
    }

    @Override
    public Clause clause(Edition edition) {
        return Clause.of(edition, "F7.1", "F7-1");
    }

    @Override
    public LimitStateResult evaluate(SteelMember m, FlexureCase bending, Work work) {
        Work w = work.given("Fy", m.fy(), Kind.STRESS).given("Zx", m.shape().get(ZX), Kind.MODULUS);
        double mn = w.eq("F7-1", "Mn", Kind.MOMENT, "{Fy} * {Zx}");
        return LimitStateResult.governs(name(), clause(m.edition()), mn, w, "Mn = Mp");
    }
}
