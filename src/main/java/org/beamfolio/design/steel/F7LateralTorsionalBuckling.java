package org.beamfolio.design.steel;

import static org.beamfolio.catalogue.ShapeProperty.A;
import static org.beamfolio.catalogue.ShapeProperty.B;
import static org.beamfolio.catalogue.ShapeProperty.HT;
import static org.beamfolio.catalogue.ShapeProperty.J;
import static org.beamfolio.catalogue.ShapeProperty.RY;
import static org.beamfolio.catalogue.ShapeProperty.SX;
import static org.beamfolio.catalogue.ShapeProperty.ZX;

/**
 * Lateral-torsional buckling of rectangular HSS bent about the major axis, AISC 360 F7.4 (360-16
 * and 360-22; equation numbers from memory): Lp by Eq. F7-12, Lr by Eq. F7-13, inelastic buckling
 * by Eq. F7-10, elastic by Eq. F7-11, Mn never above Mp. It does not occur in square sections.
 * Only very deep, narrow sections over long lengths are affected; it seldom governs.
 */
public final class F7LateralTorsionalBuckling implements FlexuralLimitState {
    @Override
    public String name() {
        return "lateral-torsional buckling";
    }

    @Override
    public Clause clause(Edition edition) {
        return Clause.of(edition, "F7.4", "F7-10", "F7-11", "F7-12", "F7-13");
    }

    @Override
    public LimitStateResult evaluate(SteelMember m, FlexureCase bending, Work work) {
        var s = m.shape();
        Work w = work.given("Fy", m.fy(), Kind.STRESS).given("E", m.e(), Kind.STRESS)
                .given("Zx", s.get(ZX), Kind.MODULUS).given("Sx", s.get(SX), Kind.MODULUS)
                .given("ry", s.get(RY), Kind.LENGTH).given("J", s.get(J), Kind.INERTIA).given("Ag", s.get(A), Kind.AREA)
                .given("Lb", bending.lb(), Kind.LENGTH).given("Cb", bending.cb(), Kind.NUMBER);
        w.eq("F7-1", "Mp", Kind.MOMENT, "{Fy} * {Zx}");
        if (s.get(HT) <= s.get(B)) {
            return LimitStateResult.doesNotApply(name(), clause(m.edition()), w, "square section: does not occur");
        }
        double lp = w.eq("F7-12", "Lp", Kind.LENGTH, "0.13 * {E} * {ry} * sqrt({J} * {Ag}) / {Mp}");
        double lr = w.eq("F7-13", "Lr", Kind.LENGTH, "2 * {E} * {ry} * sqrt({J} * {Ag}) / (0.7 * {Fy} * {Sx})");
        double lb = bending.lb();
        if (lb <= lp) {
            return LimitStateResult.doesNotApply(name(), clause(m.edition()), w, "Lb <= Lp: does not apply");
        }
        if (lb <= lr) {
            double mn = w.eqCapped("F7-10", "Mn", Kind.MOMENT,
                    "{Cb} * [{Mp} - ({Mp} - 0.7 * {Fy} * {Sx}) * (({Lb} - {Lp}) / ({Lr} - {Lp}))]", "Mp");
            return LimitStateResult.governs(name(), clause(m.edition()), mn, w, "Lp < Lb <= Lr: inelastic");
        }
        double mn = w.eqCapped("F7-11", "Mn", Kind.MOMENT, "2 * {E} * {Cb} * sqrt({J} * {Ag}) / ({Lb} / {ry})", "Mp");
        return LimitStateResult.governs(name(), clause(m.edition()), mn, w, "Lb > Lr: elastic");
    }
}
