package org.beamfolio.loads;

import java.util.Locale;

/**
 * Reduction of a uniformly distributed floor live load by the member's influence area, ASCE/SEI
 * 7-22 4.7.2 (Eq. 4.7-1): L = Lo (0.25 + 15 / sqrt(KLL AT)) with AT in ft^2 (4.57 with AT in m^2),
 * permitted when KLL AT >= 400 ft^2 (37.16 m^2), and not less than 0.50 Lo for members supporting
 * one floor or 0.40 Lo for members supporting two or more floors. Not reduced: live loads over
 * 100 psf (4.7.3, whose two-floor 20 % exception is not taken: the conservative reading), assembly
 * occupancies (4.7.6), and loads the engineer does not mark reducible.
 */
public final class LiveLoadReduction {
    private LiveLoadReduction() {}

    public static final String CLAUSE = "ASCE/SEI 7-22 4.7.2, Eq. 4.7-1";
    static final double SQ_FT = 0.3048 * 0.3048;
    static final double PSF = 4.4482216152605 / SQ_FT;
    static final double THRESHOLD_SQ_FT = 400;

    /** KLL of ASCE 7-22 Table 4.7-1 takes these values only. */
    public static boolean validKll(double kll) {
        return kll == 1 || kll == 2 || kll == 3 || kll == 4;
    }

    /**
     * @param kll live load element factor, Table 4.7-1
     * @param tributaryArea AT, m^2
     * @param unreducedPressure Lo, Pa
     * @param floors floors the member supports (1 unless the job says more)
     * @param assembly whether the occupancy is an assembly use
     */
    public static Reduction of(double kll, double tributaryArea, double unreducedPressure, int floors,
                               boolean assembly) {
        if (!validKll(kll)) {
            throw new IllegalArgumentException("KLL must be 1, 2, 3 or 4 (ASCE 7-22 Table 4.7-1), got " + kll);
        }
        double atSqFt = tributaryArea / SQ_FT;
        double influence = kll * atSqFt;
        if (assembly) {
            return Reduction.none("assembly occupancy: not reduced (ASCE/SEI 7-22 4.7.6)", kll, atSqFt);
        }
        if (unreducedPressure > 100 * PSF * (1 + 1e-12)) {
            return Reduction.none(String.format(Locale.ROOT,
                    "Lo = %.1f psf exceeds 100 psf: not reduced (ASCE/SEI 7-22 4.7.3)", unreducedPressure / PSF), kll, atSqFt);
        }
        if (influence < THRESHOLD_SQ_FT) {
            return Reduction.none(String.format(Locale.ROOT,
                    "KLL AT = %.4g x %.4g = %.4g ft^2 is less than 400 ft^2: not reduced (ASCE/SEI 7-22 4.7.2)",
                    kll, atSqFt, influence), kll, atSqFt);
        }
        double raw = 0.25 + 15 / Math.sqrt(influence);
        double floor = floors >= 2 ? 0.40 : 0.50;
        double factor = Math.min(1.0, Math.max(raw, floor));
        String basis = String.format(Locale.ROOT, "L / Lo = 0.25 + 15 / sqrt(KLL AT) = 0.25 + 15 / sqrt(%.4g x %.4g) = %.4f",
                kll, atSqFt, raw);
        if (raw < floor) {
            basis += String.format(Locale.ROOT, ", not less than %.2f for a member supporting %s", floor,
                    floors >= 2 ? "two or more floors" : "one floor");
        }
        return new Reduction(factor, kll, atSqFt, true, basis);
    }

    /**
     * The outcome for one member and one live load.
     *
     * @param factor L / Lo
     * @param atSqFt AT in ft^2 as printed
     * @param applied whether a reduction was taken
     * @param basis the equation with its numbers, or why no reduction applies
     */
    public record Reduction(double factor, double kll, double atSqFt, boolean applied, String basis) {
        static Reduction none(String why, double kll, double atSqFt) {
            return new Reduction(1.0, kll, atSqFt, false, why);
        }
    }
}
