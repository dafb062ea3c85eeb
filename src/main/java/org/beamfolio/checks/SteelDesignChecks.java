package org.beamfolio.checks;

import org.beamfolio.design.steel.Method;
import org.beamfolio.units.Numbers;

/**
 * What the steel design checks share: the standard they cite, how they name the method, and how
 * a number reads in a description. Their demands and limits are SI, reported as design forces and
 * moments ({@link org.beamfolio.units.Measure#DESIGN_MOMENT}).
 */
final class SteelDesignChecks {
    /** AISC 360 as an authority; each outcome cites the edition and clause of the job's design. */
    static final String STANDARD = "AISC 360";

    private SteelDesignChecks() {}

    static String method(Method method) {
        return method == Method.LRFD ? "LRFD, phi Rn" : "ASD, Rn/Omega";
    }

    static String number(double v) {
        return Numbers.format(v).replace(",", "");
    }
}
