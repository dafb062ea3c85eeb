package org.beamfolio.loads;

import java.util.Locale;

/**
 * Reduction of a roof live load on ordinary flat, pitched and curved roofs, ASCE/SEI 7-22 4.8.2
 * (Eq. 4.8-1): Lr = Lo R1 R2 with 12 psf <= Lr <= 20 psf; R1 = 1 for AT <= 200 ft^2,
 * 1.2 - 0.001 AT for 200 < AT < 600 ft^2, 0.6 for AT >= 600 ft^2 (Eq. 4.8-2); R2 = 1 for F <= 4,
 * 1.2 - 0.05 F for 4 < F < 12, 0.6 for F >= 12 (Eq. 4.8-3), F the rise in inches per foot.
 */
public final class RoofLiveLoadReduction {
    private RoofLiveLoadReduction() {}

    public static final String CLAUSE = "ASCE/SEI 7-22 4.8.2, Eq. 4.8-1 to 4.8-3";

    /**
     * @param tributaryArea AT, m^2
     * @param unreducedPressure Lo, Pa
     * @param risePerFoot F, inches of rise per foot of run
     */
    public static LiveLoadReduction.Reduction of(double tributaryArea, double unreducedPressure, double risePerFoot) {
        double at = tributaryArea / LiveLoadReduction.SQ_FT;
        double r1 = at <= 200 ? 1.0 : at < 600 ? 1.2 - 0.001 * at : 0.6;
        double r2 = risePerFoot <= 4 ? 1.0 : risePerFoot < 12 ? 1.2 - 0.05 * risePerFoot : 0.6;
        double loPsf = unreducedPressure / LiveLoadReduction.PSF;
        if (r1 * r2 >= 1.0 || loPsf <= 12) {
            return new LiveLoadReduction.Reduction(1.0, Double.NaN, at, false, String.format(Locale.ROOT,
                    "R1 = %.3f, R2 = %.3f: not reduced (ASCE/SEI 7-22 4.8.2)", r1, r2));
        }
        double reducedPsf = Math.max(12, loPsf * r1 * r2);
        double factor = reducedPsf / loPsf;
        String basis = String.format(Locale.ROOT,
                "AT = %.4g ft^2: R1 = %.3f; F = %.3g: R2 = %.3f; Lr = Lo R1 R2 = %.4g x %.3f x %.3f = %.4g psf%s",
                at, r1, risePerFoot, r2, loPsf, r1, r2, loPsf * r1 * r2,
                reducedPsf > loPsf * r1 * r2 ? ", not less than 12 psf" : "");
        return new LiveLoadReduction.Reduction(factor, Double.NaN, at, true, basis);
    }
}
