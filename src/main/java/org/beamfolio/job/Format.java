package org.beamfolio.job;

import java.util.Locale;
import org.beamfolio.units.Units;

/** Quantities in messages: the value in feet and metres, so either user can read it. */
final class Format {
    private Format() {}

    static String length(double metres) {
        return String.format(Locale.ROOT, "%s ft (%s m)", trim(metres / Units.FOOT), trim(metres));
    }

    private static String trim(double v) {
        String s = String.format(Locale.ROOT, "%.4f", v);
        s = s.replaceAll("0+$", "");
        return s.endsWith(".") ? s.substring(0, s.length() - 1) : s;
    }
}
