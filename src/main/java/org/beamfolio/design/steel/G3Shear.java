package org.beamfolio.design.steel;

import static org.beamfolio.catalogue.ShapeProperty.D;
import static org.beamfolio.catalogue.ShapeProperty.D_T;
import static org.beamfolio.catalogue.ShapeProperty.TW;

/**
 * Shear strength of tees, AISC 360 G3: Vn = 0.6 Fy Aw Cv2 (Eq. G3-1), Aw = d tw, with Cv2 of G2.2
 * (Eq. G2-9 to G2-11) for h/t = d/tw and kv = 1.2; phi_v = 0.90, Omega_v = 1.67 (G1).
 */
public final class G3Shear {
    private G3Shear() {}

    public static Strength strength(SteelMember m) {
        var s = m.shape();
        Work w = new Work().given("Fy", m.fy(), Kind.STRESS).given("E", m.e(), Kind.STRESS)
                .given("d", s.get(D), Kind.LENGTH).given("tw", s.get(TW), Kind.LENGTH).given("h/t", s.get(D_T), Kind.NUMBER);
        w.eq("G3", "Aw", Kind.AREA, "{d} * {tw}");
        w.eq("G3", "kv", Kind.NUMBER, "1.2");
        String note = ShearStrength.cv2(w);
        double vn = w.eq("G3-1", "Vn", Kind.FORCE, "0.6 * {Fy} * {Aw} * {Cv2}");
        Clause clause = Clause.of(m.edition(), "G3", "G3-1", "G2-9", "G2-10", "G2-11");
        return ShearStrength.single(clause, LimitStateResult.governs("shear yielding and buckling", clause, vn, w, note),
                new Resistance(0.90, 1.67, Clause.of(m.edition(), "G1")));
    }
}
