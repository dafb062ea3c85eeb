package org.beamfolio.units;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.text.DecimalFormat;
import java.text.DecimalFormatSymbols;
import java.util.Locale;

/**
 * Numbers as printed on the page: four significant figures, whole numbers from 1,000 up (with
 * thousands separators). Rounding happens here and only here; full precision stays in the results.
 */
public final class Numbers {
    private Numbers() {}

    public static String format(double value) {
        if (!Double.isFinite(value)) {
            return Double.toString(value);
        }
        if (value == 0 || Math.abs(value) < 1e-300) {
            return "0";
        }
        if (Math.abs(value) < 1e-4) {
            // a residual or other tiny value: scientific notation rather than a row of zeros
            return String.format(Locale.US, "%.3e", value);
        }
        if (Math.abs(value) >= 999.95) {
            DecimalFormat grouped = new DecimalFormat("#,##0", DecimalFormatSymbols.getInstance(Locale.US));
            grouped.setRoundingMode(RoundingMode.HALF_EVEN);
            String s = grouped.format(value);
            return s.equals("-0") ? "0" : s;
        }
        BigDecimal rounded = new BigDecimal(value).round(new MathContext(4, RoundingMode.HALF_EVEN));
        String s = rounded.stripTrailingZeros().toPlainString();
        return s.equals("-0") ? "0" : s;
    }

    /** A value with its unit, separated by a space. */
    public static String format(double value, String unit) {
        return format(value) + " " + unit;
    }
}
