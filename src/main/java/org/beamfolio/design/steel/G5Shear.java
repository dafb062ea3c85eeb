package org.beamfolio.design.steel;

import static org.beamfolio.catalogue.ShapeProperty.A;
import static org.beamfolio.catalogue.ShapeProperty.D_T;
import static org.beamfolio.catalogue.ShapeProperty.OD;

/**
 * Shear strength of round HSS and pipe, AISC 360 G5: Vn = Fcr Ag / 2 (Eq. G5-1), Fcr the larger of
 * Eq. G5-2a (needs Lv, the distance from the largest shear to zero shear) and Eq. G5-2b, no more
 * than 0.6 Fy; phi_v = 0.90, Omega_v = 1.67 (G1).
 */
public final class G5Shear {
    private G5Shear() {}

    public static Strength strength(SteelMember m, Double lv) {
        var s = m.shape();
        Work w = new Work().given("Fy", m.fy(), Kind.STRESS).given("E", m.e(), Kind.STRESS)
                .given("D", s.get(OD), Kind.LENGTH).given("D/t", s.get(D_T), Kind.NUMBER).given("Ag", s.get(A), Kind.AREA);
        double b = w.eq("G5-2b", "Fcr,b", Kind.STRESS, "0.78 * {E} / {D/t}^(3/2)");
        String note = "Lv not given: Eq. G5-2b alone";
        String governing = "Fcr,b";
        if (lv != null && lv > 0) {
            w.given("Lv", lv, Kind.LENGTH);
            double a = w.eq("G5-2a", "Fcr,a", Kind.STRESS, "1.60 * {E} / (sqrt({Lv} / {D}) * {D/t}^(5/4))");
            note = "the larger of Eq. G5-2a and G5-2b";
            governing = a > b ? "Fcr,a" : "Fcr,b";
        }
        w.eqCapped("G5-2", "Fcr", Kind.STRESS, "{" + governing + "}", "0.6 Fy", "0.6 * {Fy}");
        double vn = w.eq("G5-1", "Vn", Kind.FORCE, "{Fcr} * {Ag} / 2");
        Clause clause = Clause.of(m.edition(), "G5", "G5-1", "G5-2a", "G5-2b");
        return ShearStrength.single(clause, LimitStateResult.governs("shear yielding and buckling", clause, vn, w, note),
                new Resistance(0.90, 1.67, Clause.of(m.edition(), "G1")));
    }
}
