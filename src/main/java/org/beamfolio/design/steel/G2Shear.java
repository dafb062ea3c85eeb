package org.beamfolio.design.steel;

import static org.beamfolio.catalogue.ShapeProperty.D;
import static org.beamfolio.catalogue.ShapeProperty.H_TW;
import static org.beamfolio.catalogue.ShapeProperty.TW;

import org.beamfolio.catalogue.ShapeFamily;

/**
 * Shear strength of the webs of I-shapes and channels, AISC 360 G2.1: Vn = 0.6 Fy Aw Cv1
 * (Eq. G2-1), Aw = d tw. Rolled I-shapes with h/tw <= 2.24 sqrt(E/Fy) take Cv1 = 1.0 (Eq. G2-2)
 * with phi_v = 1.00 and Omega_v = 1.50 (G2.1(a)); other webs take kv = 5.34 (no transverse
 * stiffeners) and Cv1 by Eq. G2-3 or G2-4, with phi_v = 0.90 and Omega_v = 1.67 (G1).
 */
public final class G2Shear {
    private G2Shear() {}

    public static Strength strength(SteelMember m) {
        var s = m.shape();
        Work w = new Work().given("Fy", m.fy(), Kind.STRESS).given("E", m.e(), Kind.STRESS)
                .given("d", s.get(D), Kind.LENGTH).given("tw", s.get(TW), Kind.LENGTH).given("h/tw", s.get(H_TW), Kind.NUMBER);
        w.eq("G2.1", "Aw", Kind.AREA, "{d} * {tw}");
        boolean rolledI = s.family().kind() == ShapeFamily.Kind.I_SHAPE;
        double limitA = w.evaluate("2.24 * sqrt({E} / {Fy})");
        Resistance resistance;
        String note;
        if (rolledI && s.get(H_TW) <= limitA) {
            w.eq("G2-2", "Cv1", Kind.NUMBER, "1.0");
            resistance = new Resistance(1.00, 1.50, Clause.of(m.edition(), "G2.1(a)"));
            note = "rolled I-shape, h/tw <= 2.24 sqrt(E/Fy)";
        } else {
            w.eq("G2.1(b)", "kv", Kind.NUMBER, "5.34");
            if (s.get(H_TW) <= w.evaluate("1.10 * sqrt({kv} * {E} / {Fy})")) {
                w.eq("G2-3", "Cv1", Kind.NUMBER, "1.0");
                note = "h/tw <= 1.10 sqrt(kv E/Fy)";
            } else {
                w.eq("G2-4", "Cv1", Kind.NUMBER, "1.10 * sqrt({kv} * {E} / {Fy}) / {h/tw}");
                note = "h/tw > 1.10 sqrt(kv E/Fy)";
            }
            resistance = new Resistance(0.90, 1.67, Clause.of(m.edition(), "G1"));
        }
        double vn = w.eq("G2-1", "Vn", Kind.FORCE, "0.6 * {Fy} * {Aw} * {Cv1}");
        Clause clause = Clause.of(m.edition(), "G2.1", "G2-1", "G2-2", "G2-3", "G2-4");
        return ShearStrength.single(clause, LimitStateResult.governs("shear yielding and buckling", clause, vn, w, note), resistance);
    }
}
