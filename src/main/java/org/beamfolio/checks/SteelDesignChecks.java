package org.beamfolio.checks;

import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.design.steel.Method;
import org.beamfolio.units.Numbers;
import org.beamfolio.units.Unit;
import org.beamfolio.units.UnitSystem;
import org.beamfolio.units.Units;

/**
 * What the steel design checks share: the units of their demands and limits (kip*ft and kips for
 * US reports, kN*m and kN for SI: the units of the specification's worked examples, not the
 * report's lb) and how they name the method.
 */
final class SteelDesignChecks {
    /** AISC 360 as an authority; each outcome cites the edition and clause of the job's design. */
    static final String STANDARD = "AISC 360";

    private SteelDesignChecks() {}

    static boolean si(AnalysisResult result) {
        return result.job().report().units() == UnitSystem.SI;
    }

    static Unit moment(AnalysisResult result) {
        return Units.of(si(result) ? "kN*m" : "kip*ft");
    }

    static Unit force(AnalysisResult result) {
        return Units.of(si(result) ? "kN" : "kip");
    }

    static String method(Method method) {
        return method == Method.LRFD ? "LRFD, phi Rn" : "ASD, Rn/Omega";
    }

    static String number(double v) {
        return Numbers.format(v).replace(",", "");
    }
}
