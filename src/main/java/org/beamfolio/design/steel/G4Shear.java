package org.beamfolio.design.steel;

import static org.beamfolio.catalogue.ShapeProperty.H_FLAT;
import static org.beamfolio.catalogue.ShapeProperty.H_TDES;
import static org.beamfolio.catalogue.ShapeProperty.TDES;

/**
 * Shear strength of rectangular HSS, AISC 360 G4: Vn = 0.6 Fy Aw Cv2 (Eq. G4-1), Aw = 2 h t with
 * the tabulated flat width h (Ht - 3 tdes, the corner radius not being known) and kv = 5, Cv2 of
 * G2.2 (Eq. G2-9 to G2-11); phi_v = 0.90, Omega_v = 1.67 (G1).
 */
public final class G4Shear {
    private G4Shear() {}

    public static Strength strength(SteelMember m) {
        var s = m.shape();
        Work w = new Work().given("Fy", m.fy(), Kind.STRESS).given("E", m.e(), Kind.STRESS)
                .given("h", s.get(H_FLAT), Kind.LENGTH).given("t", s.get(TDES), Kind.LENGTH)
                .given("h/t", s.get(H_TDES), Kind.NUMBER);
        w.eq("G4", "Aw", Kind.AREA, "2 * {h} * {t}");
        w.eq("G4", "kv", Kind.NUMBER, "5");
        String note = ShearStrength.cv2(w);
        double vn = w.eq("G4-1", "Vn", Kind.FORCE, "0.6 * {Fy} * {Aw} * {Cv2}");
        Clause clause = Clause.of(m.edition(), "G4", "G4-1", "G2-9", "G2-10", "G2-11");
        return ShearStrength.single(clause, LimitStateResult.governs("shear yielding and buckling", clause, vn, w, note),
                new Resistance(0.90, 1.67, Clause.of(m.edition(), "G1")));
    }
}
