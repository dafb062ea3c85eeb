package org.beamfolio.design.steel;

import static org.beamfolio.catalogue.ShapeProperty.CW;
import static org.beamfolio.catalogue.ShapeProperty.HO;
import static org.beamfolio.catalogue.ShapeProperty.IY;
import static org.beamfolio.catalogue.ShapeProperty.J;
import static org.beamfolio.catalogue.ShapeProperty.RTS;
import static org.beamfolio.catalogue.ShapeProperty.RY;
import static org.beamfolio.catalogue.ShapeProperty.SX;
import static org.beamfolio.catalogue.ShapeProperty.ZX;

import org.beamfolio.catalogue.ShapeFamily;

/**
 * Lateral-torsional buckling of doubly symmetric I-shapes and channels, AISC 360 F2.2 (also applied
 * by F3.1 to I-shapes with noncompact or slender flanges): Lp by Eq. F2-5, Lr by Eq. F2-6 with c = 1
 * (F2-8a) or, for a channel, c = (ho/2) sqrt(Iy/Cw) (F2-8b); inelastic buckling by Eq. F2-2, elastic
 * by Eq. F2-3 with Fcr by Eq. F2-4; Mn never above Mp. The same in 360-16 and 360-22.
 */
public final class F2LateralTorsionalBuckling implements FlexuralLimitState {
    private final String clause;

    /** @param clause {@code F2.2}, or {@code F3.1} where F3 refers to F2.2 */
    public F2LateralTorsionalBuckling(String clause) {
        this.clause = clause;
    }

    @Override
    public String name() {
        return "lateral-torsional buckling";
    }

    @Override
    public Clause clause(Edition edition) {
        return Clause.of(edition, clause, "F2-2", "F2-3", "F2-4", "F2-5", "F2-6", "F2-8");
    }

    @Override
    public LimitStateResult evaluate(SteelMember m, FlexureCase bending, Work work) {
        var s = m.shape();
        Work w = work.given("Fy", m.fy(), Kind.STRESS).given("E", m.e(), Kind.STRESS)
                .given("Zx", s.get(ZX), Kind.MODULUS).given("Sx", s.get(SX), Kind.MODULUS)
                .given("ry", s.get(RY), Kind.LENGTH).given("rts", s.get(RTS), Kind.LENGTH)
                .given("J", s.get(J), Kind.INERTIA).given("ho", s.get(HO), Kind.LENGTH)
                .given("Lb", bending.lb(), Kind.LENGTH).given("Cb", bending.cb(), Kind.NUMBER);
        w.eq("F2-1", "Mp", Kind.MOMENT, "{Fy} * {Zx}");
        double lp = w.eq("F2-5", "Lp", Kind.LENGTH, "1.76 * {ry} * sqrt({E} / {Fy})");
        if (s.family().kind() == ShapeFamily.Kind.CHANNEL) {
            w.given("Iy", s.get(IY), Kind.INERTIA).given("Cw", s.get(CW), Kind.WARPING);
            w.eq("F2-8b", "c", Kind.NUMBER, "{ho} / 2 * sqrt({Iy} / {Cw})");
        } else {
            w.eq("F2-8a", "c", Kind.NUMBER, "1");
        }
        double lr = w.eq("F2-6", "Lr", Kind.LENGTH, "1.95 * {rts} * {E} / (0.7 * {Fy}) * sqrt({J} * {c} / ({Sx} * {ho})"
                + " + sqrt(({J} * {c} / ({Sx} * {ho}))^2 + 6.76 * (0.7 * {Fy} / {E})^2))");
        double lb = bending.lb();
        if (lb <= lp) {
            return LimitStateResult.doesNotApply(name(), clause(m.edition()), w, "Lb <= Lp: does not apply");
        }
        if (lb <= lr) {
            double mn = w.eqCapped("F2-2", "Mn", Kind.MOMENT,
                    "{Cb} * [{Mp} - ({Mp} - 0.7 * {Fy} * {Sx}) * (({Lb} - {Lp}) / ({Lr} - {Lp}))]", "Mp");
            return LimitStateResult.governs(name(), clause(m.edition()), mn, w, "Lp < Lb <= Lr: inelastic");
        }
        w.eq("F2-4", "Fcr", Kind.STRESS,
                "{Cb} * pi^2 * {E} / ({Lb} / {rts})^2 * sqrt(1 + 0.078 * {J} * {c} / ({Sx} * {ho}) * ({Lb} / {rts})^2)");
        double mn = w.eqCapped("F2-3", "Mn", Kind.MOMENT, "{Fcr} * {Sx}", "Mp");
        return LimitStateResult.governs(name(), clause(m.edition()), mn, w, "Lb > Lr: elastic");
    }
}
