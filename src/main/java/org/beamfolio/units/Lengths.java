package org.beamfolio.units;

import java.util.Locale;

/** Positions in messages, in the job's own units, so that the user reads back what was typed. */
public final class Lengths {
    private static final int SIXTEENTHS_PER_FOOT = 12 * 16;

    private Lengths() {}

    /** How a job writes its lengths. */
    public enum Style {
        /** Feet and inches to a sixteenth where the length falls on one; decimal feet otherwise. */
        FEET_AND_INCHES,
        METRES
    }

    public static String describe(double metres, Style style) {
        return style == Style.METRES ? trim(metres) + " m" : feetAndInches(metres);
    }

    private static String feetAndInches(double metres) {
        double sixteenths = metres / Units.INCH * 16;
        long whole = Math.round(sixteenths);
        if (Math.abs(sixteenths - whole) > 1e-6 * Math.max(1, Math.abs(sixteenths))) {
            return trim(metres / Units.FOOT) + " ft";
        }
        String sign = whole < 0 ? "-" : "";
        whole = Math.abs(whole);
        long feet = whole / SIXTEENTHS_PER_FOOT;
        long rest = whole % SIXTEENTHS_PER_FOOT;
        StringBuilder out = new StringBuilder(sign);
        if (feet > 0 || rest == 0) {
            out.append(feet).append(" ft");
        }
        if (rest > 0) {
            if (feet > 0) {
                out.append(' ');
            }
            long inches = rest / 16;
            long numerator = rest % 16;
            long denominator = 16;
            while (numerator > 0 && numerator % 2 == 0) {
                numerator /= 2;
                denominator /= 2;
            }
            if (inches > 0 || numerator == 0) {
                out.append(inches);
            }
            if (numerator > 0) {
                out.append(inches > 0 ? " " : "").append(numerator).append('/').append(denominator);
            }
            out.append(" in");
        }
        return out.toString();
    }

    private static String trim(double v) {
        String s = String.format(Locale.ROOT, "%.4f", v).replaceAll("0+$", "");
        s = s.endsWith(".") ? s.substring(0, s.length() - 1) : s;
        return s.equals("-0") ? "0" : s;
    }
}
