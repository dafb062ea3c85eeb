package org.beamfolio.design.timber;

import org.beamfolio.model.timber.Factor;
import java.util.Locale;

/**
 * Bearing area factor Cb, NDS 2018 3.10.4 (Eq. 3.10-2): Cb = (lb + 0.375) / lb for bearings
 * shorter than 6 in and not nearer than 3 in to the end of the member; 1.0 otherwise.
 */
public final class BearingAreaFactor {
    private BearingAreaFactor() {}

    private static final double INCH = 0.0254;

    public static Factor of(double bearingLength, boolean nearEnd) {
        String clause = "NDS 2018 3.10.4, Eq. 3.10-2";
        double lb = bearingLength / INCH;
        if (nearEnd) {
            return Factor.unity("Cb", clause, "bearing within 3 in of the member's end");
        }
        if (lb >= 6 - 1e-9) {
            return Factor.unity("Cb", clause, "bearing length 6 in or more");
        }
        return new Factor("Cb", (lb + 0.375) / lb, clause,
                String.format(Locale.ROOT, "(lb + 0.375) / lb = (%.3f + 0.375) / %.3f", lb, lb));
    }
}
