package org.beamfolio.design.timber;

import org.beamfolio.model.timber.TimberKind;
import org.beamfolio.model.timber.TimberValues;
import org.beamfolio.model.timber.Factor;
import java.util.Locale;

/**
 * Volume factor CV of glulam, NDS 2018 5.3.6, Eq. 5.3-1:
 * CV = (21/L)^(1/x) (12/d)^(1/x) (5.125/b)^(1/x) <= 1.0, with L the length between points of
 * zero moment (ft), d the depth (in), b the width (in, at most 10.75), x = 20 for Southern Pine
 * and 10 otherwise. Applied as the lesser of CV and CL (NDS 5.3.6).
 */
public final class VolumeFactor {
    private VolumeFactor() {}

    private static final double INCH = 0.0254;
    private static final double FOOT = 0.3048;

    public static Factor of(TimberValues v, double lengthBetweenZeroMoments, double b, double d) {
        if (v.kind() != TimberKind.GLULAM) {
            return Factor.unity("CV", "NDS 2018 5.3.6", "volume factor applies to glulam only");
        }
        double lFt = lengthBetweenZeroMoments / FOOT;
        double dIn = d / INCH;
        double bIn = Math.min(b / INCH, 10.75);
        double x = v.volumeExponent();
        double value = Math.min(1.0, Math.pow(21 / lFt, 1 / x) * Math.pow(12 / dIn, 1 / x) * Math.pow(5.125 / bIn, 1 / x));
        return new Factor("CV", value, "NDS 2018 5.3.6, Eq. 5.3-1", String.format(Locale.ROOT,
                "(21 / %.3f)^(1/%.0f) (12 / %.3f)^(1/%.0f) (5.125 / %.3f)^(1/%.0f), not above 1.0",
                lFt, x, dIn, x, bIn, x));
    }
}
