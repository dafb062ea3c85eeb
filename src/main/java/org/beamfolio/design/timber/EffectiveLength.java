package org.beamfolio.design.timber;

import java.util.Locale;

/**
 * Effective length le of a bending member from its unbraced length lu, NDS 2018 Table 3.3.3.
 * Each constant is one row of the table; {@link #ANY} is the table's footnote rule for single
 * span or cantilever beams with any loading, the conservative choice when the loading matches no
 * other row.
 */
public enum EffectiveLength {
    CANTILEVER_UNIFORM("cantilever, uniformly distributed load"),
    CANTILEVER_END_LOAD("cantilever, concentrated load at the unsupported end"),
    UNIFORM("single span, uniformly distributed load"),
    CENTRE_LOAD("single span, concentrated load at the centre, no intermediate lateral support"),
    CENTRE_LOAD_BRACED("single span, concentrated load at the centre, lateral support at the centre"),
    EQUAL_END_MOMENTS("equal end moments"),
    ANY("single span or cantilever, any loading");

    public static final String CLAUSE = "NDS 2018 3.3.3, Table 3.3.3";

    private final String description;

    EffectiveLength(String description) {
        this.description = description;
    }

    public String description() {
        return description;
    }

    /** le for this row, and the equation used, with lu and d in consistent units (m). */
    public Worked of(double lu, double d) {
        double ratio = lu / d;
        return switch (this) {
            case CANTILEVER_UNIFORM -> new Worked(1.33 * lu, "le = 1.33 lu");
            case CANTILEVER_END_LOAD -> new Worked(1.87 * lu, "le = 1.87 lu");
            case UNIFORM -> ratio < 7 ? new Worked(2.06 * lu, "le = 2.06 lu (lu/d < 7)")
                    : new Worked(1.63 * lu + 3 * d, "le = 1.63 lu + 3 d (lu/d >= 7)");
            case CENTRE_LOAD -> ratio < 7 ? new Worked(1.80 * lu, "le = 1.80 lu (lu/d < 7)")
                    : new Worked(1.37 * lu + 3 * d, "le = 1.37 lu + 3 d (lu/d >= 7)");
            case CENTRE_LOAD_BRACED -> new Worked(1.11 * lu, "le = 1.11 lu");
            case EQUAL_END_MOMENTS -> new Worked(1.84 * lu, "le = 1.84 lu");
            case ANY -> ratio < 7 ? new Worked(2.06 * lu, "le = 2.06 lu (lu/d < 7)")
                    : ratio <= 14.3 ? new Worked(1.63 * lu + 3 * d, "le = 1.63 lu + 3 d (7 <= lu/d <= 14.3)")
                    : new Worked(1.84 * lu, "le = 1.84 lu (lu/d > 14.3)");
        };
    }

    /** The effective length and the row's equation. */
    public record Worked(double le, String equation) {
        public String describe(double lu, double d, double unit, String symbol) {
            return String.format(Locale.ROOT, "%s with lu = %.4g %s, d = %.4g %s: le = %.4g %s",
                    equation, lu / unit, symbol, d / unit, symbol, le / unit, symbol);
        }
    }
}
