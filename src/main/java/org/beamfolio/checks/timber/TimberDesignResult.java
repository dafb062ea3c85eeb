package org.beamfolio.checks.timber;

import java.util.List;
import org.beamfolio.design.timber.AdjustedValues;
import org.beamfolio.design.timber.EffectiveLength;
import org.beamfolio.model.timber.Factor;
import org.beamfolio.model.timber.LoadDuration;
import org.beamfolio.model.timber.TimberValues;

/**
 * The NDS design of a timber beam, combination by combination, found once and read by the
 * checks, the results file and the timber design sheet. Stresses and lengths in SI.
 *
 * @param bending the governing bending row of each allowable-stress combination, in order
 * @param shear the governing shear row of each combination, in order
 * @param bearing one row per support with a bearing length
 * @param deflection long-term deflections with creep, one per deflection limit and region
 * @param kcr the creep factor used (NDS 3.5.2)
 */
public record TimberDesignResult(TimberValues values, List<Bending> bending, List<Shear> shear, List<Bearing> bearing,
                                 List<LongTerm> deflection, Factor kcr, AdjustedValues.Adjusted modulus) {
    public TimberDesignResult {
        bending = List.copyOf(bending);
        shear = List.copyOf(shear);
        bearing = List.copyOf(bearing);
        deflection = List.copyOf(deflection);
    }

    public Bending governingBending() {
        return governing(bending);
    }

    public Shear governingShear() {
        return governing(shear);
    }

    /** The largest ratio; the first of equal ratios. */
    static <T extends Rated> T governing(List<T> rows) {
        T best = null;
        for (T row : rows) {
            if (best == null || row.ratio() > best.ratio()) {
                best = row;
            }
        }
        return best;
    }

    public interface Rated {
        double ratio();
    }

    /**
     * Bending under one combination at its governing point.
     *
     * @param durationCase the case whose duration sets CD
     * @param moment M at the point (sagging positive), N m
     * @param s section modulus S = b d^2 / 6, m^3
     * @param fb the actual stress M / S, Pa
     * @param segment the unbraced segment of the compression edge holding the point
     * @param row the row of NDS Table 3.3.3 taken for the segment, or null where CL = 1.0 by bracing
     * @param le the effective length worked, or null
     * @param zeroMomentFrom, zeroMomentTo the points of zero moment around the point (CV), m
     */
    public record Bending(String combination, LoadDuration cd, String durationCase, double at, double moment, double s,
                          double fb, AdjustedValues.Bending adjusted, UnbracedSegments.Unbraced segment,
                          EffectiveLength row, EffectiveLength.Worked le, double zeroMomentFrom, double zeroMomentTo,
                          double b, double d) implements Rated {
        public double limit() {
            return adjusted.value();
        }

        @Override
        public double ratio() {
            return fb / adjusted.value();
        }

        public boolean hogging() {
            return moment < 0;
        }
    }

    /**
     * Shear under one combination: fv = 1.5 V / A (NDS 3.4.2, Eq. 3.4-2).
     *
     * @param nearSupportsReduced whether the loads within d of the bearings were left out (NDS 3.4.3.1(a))
     */
    public record Shear(String combination, LoadDuration cd, String durationCase, double at, double v, double area,
                        double fv, AdjustedValues.Adjusted adjusted, boolean nearSupportsReduced) implements Rated {
        @Override
        public double ratio() {
            return fv / adjusted.value();
        }
    }

    /** Bearing at one support: fc_perp = R / (b lb) against Fc_perp' (NDS 3.10.2). */
    public record Bearing(int support, double at, double reaction, String combination, double b, double length,
                          double stress, AdjustedValues.Adjusted adjusted) implements Rated {
        @Override
        public double ratio() {
            return stress / adjusted.value();
        }
    }

    /**
     * Long-term deflection, delta_T = Kcr delta_LT + delta_ST (NDS 3.5.2, Eq. 3.5-1).
     *
     * @param longTermCases the cases of permanent duration, multiplied by Kcr
     * @param allowed the job's limit for the region, m
     */
    public record LongTerm(String limitCases, List<String> longTermCases, List<String> shortTermCases, String region,
                           String limitText, double at, double deflection, double allowed) implements Rated {
        @Override
        public double ratio() {
            return deflection / allowed;
        }
    }
}
