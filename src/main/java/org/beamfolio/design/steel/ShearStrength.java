package org.beamfolio.design.steel;

import java.util.List;
import java.util.Map;

/** What the shear classes share: the web shear buckling coefficient Cv2 of G2.2 and the one-limit-state result. */
final class ShearStrength {
    private ShearStrength() {}

    /** Cv2 of G2.2 (Eq. G2-9, G2-10, G2-11) from the known h/t and kv. */
    static String cv2(Work w) {
        double ht = w.value("h/t").value();
        if (ht <= w.evaluate("1.10 * sqrt({kv} * {E} / {Fy})")) {
            w.eq("G2-9", "Cv2", Kind.NUMBER, "1.0");
            return "h/t <= 1.10 sqrt(kv E/Fy)";
        }
        if (ht <= w.evaluate("1.37 * sqrt({kv} * {E} / {Fy})")) {
            w.eq("G2-10", "Cv2", Kind.NUMBER, "1.10 * sqrt({kv} * {E} / {Fy}) / {h/t}");
            return "1.10 sqrt(kv E/Fy) < h/t <= 1.37 sqrt(kv E/Fy)";
        }
        w.eq("G2-11", "Cv2", Kind.NUMBER, "1.51 * {kv} * {E} / ({h/t}^2 * {Fy})");
        return "h/t > 1.37 sqrt(kv E/Fy)";
    }

    static Strength single(Clause clause, LimitStateResult result, Resistance resistance) {
        return new Strength("shear", clause, List.of(), List.of(result), resistance, Map.of());
    }
}
