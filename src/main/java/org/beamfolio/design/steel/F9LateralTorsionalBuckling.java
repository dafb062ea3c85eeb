package org.beamfolio.design.steel;

import static org.beamfolio.catalogue.ShapeProperty.D;
import static org.beamfolio.catalogue.ShapeProperty.IY;
import static org.beamfolio.catalogue.ShapeProperty.J;
import static org.beamfolio.catalogue.ShapeProperty.RY;
import static org.beamfolio.catalogue.ShapeProperty.SX;
import static org.beamfolio.catalogue.ShapeProperty.ZX;

/**
 * Lateral-torsional buckling of tees, AISC 360-16 F9.2 (equation numbers from memory). Stem in
 * tension: Lp by Eq. F9-8, Lr by Eq. F9-9; inelastic Mn = Mp - (Mp - My)(Lb - Lp)/(Lr - Lp)
 * (Eq. F9-6); elastic Mn = Mcr (Eq. F9-7) with Mcr by Eq. F9-10 and B = 2.3 (d/Lb) sqrt(Iy/J)
 * (Eq. F9-11). Stem in compression: Mn = Mcr no more than My (Eq. F9-12), Mcr by Eq. F9-10 with
 * B = -2.3 (d/Lb) sqrt(Iy/J) (Eq. F9-13). The equations carry no Cb: it is taken as 1.0 here.
 */
public final class F9LateralTorsionalBuckling implements FlexuralLimitState {
    @Override
    public String name() {
        return "lateral-torsional buckling";
    }

    @Override
    public Clause clause(Edition edition) {
        return Clause.of(edition, "F9.2", "F9-6", "F9-7", "F9-8", "F9-9", "F9-10", "F9-11", "F9-12", "F9-13");
    }

    @Override
    public LimitStateResult evaluate(SteelMember m, FlexureCase bending, Work work) {
        var s = m.shape();
        Work w = work.given("Fy", m.fy(), Kind.STRESS).given("E", m.e(), Kind.STRESS)
                .given("Zx", s.get(ZX), Kind.MODULUS).given("Sx", s.get(SX), Kind.MODULUS)
                .given("Iy", s.get(IY), Kind.INERTIA).given("J", s.get(J), Kind.INERTIA)
                .given("ry", s.get(RY), Kind.LENGTH).given("d", s.get(D), Kind.LENGTH)
                .given("Lb", bending.lb(), Kind.LENGTH);
        w.eq("F9-3", "My", Kind.MOMENT, "{Fy} * {Sx}");
        String note = TeeNote.of(m.edition());
        if (bending.lb() == 0) {
            return LimitStateResult.doesNotApply(name(), clause(m.edition()), w, "braced continuously: does not apply" + note);
        }
        if (bending.stemInCompression()) {
            w.eq("F9-13", "B", Kind.NUMBER, "-2.3 * ({d} / {Lb}) * sqrt({Iy} / {J})");
            w.eq("F9-10", "Mcr", Kind.MOMENT, "1.95 * {E} / {Lb} * sqrt({Iy} * {J}) * ({B} + sqrt(1 + {B}^2))");
            double mn = w.eqCapped("F9-12", "Mn", Kind.MOMENT, "{Mcr}", "My");
            return LimitStateResult.governs(name(), clause(m.edition()), mn, w, "stem in compression" + note);
        }
        w.eqCapped("F9-2", "Mp", Kind.MOMENT, "{Fy} * {Zx}", "1.6 My", "1.6 * {My}");
        double lp = w.eq("F9-8", "Lp", Kind.LENGTH, "1.76 * {ry} * sqrt({E} / {Fy})");
        double lr = w.eq("F9-9", "Lr", Kind.LENGTH,
                "1.95 * ({E} / {Fy}) * sqrt({Iy} * {J}) / {Sx} * sqrt(2.36 * ({Fy} / {E}) * {d} * {Sx} / {J} + 1)");
        double lb = bending.lb();
        if (lb <= lp) {
            return LimitStateResult.doesNotApply(name(), clause(m.edition()), w, "Lb <= Lp: does not apply" + note);
        }
        if (lb <= lr) {
            double mn = w.eq("F9-6", "Mn", Kind.MOMENT, "{Mp} - ({Mp} - {My}) * (({Lb} - {Lp}) / ({Lr} - {Lp}))");
            return LimitStateResult.governs(name(), clause(m.edition()), mn, w, "stem in tension, Lp < Lb <= Lr" + note);
        }
        w.eq("F9-11", "B", Kind.NUMBER, "2.3 * ({d} / {Lb}) * sqrt({Iy} / {J})");
        w.eq("F9-10", "Mcr", Kind.MOMENT, "1.95 * {E} / {Lb} * sqrt({Iy} * {J}) * ({B} + sqrt(1 + {B}^2))");
        double mn = w.eq("F9-7", "Mn", Kind.MOMENT, "{Mcr}");
        return LimitStateResult.governs(name(), clause(m.edition()), mn, w, "stem in tension, Lb > Lr" + note);
    }
}
