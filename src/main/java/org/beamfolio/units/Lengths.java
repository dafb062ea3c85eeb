package org.beamfolio.units;

import java.util.Locale;

/** Positions in messages, in metres and feet, so a user of either system can read them. */
public final class Lengths {
    private Lengths() {}

    public static String describe(double metres) {
        return trim(metres) + " m (" + trim(metres / Units.FOOT) + " ft)";
    }

    private static String trim(double v) {
        String s = String.format(Locale.ROOT, "%.4f", v).replaceAll("0+$", "");
        return s.endsWith(".") ? s.substring(0, s.length() - 1) : s;
    }
}
