package org.beamfolio.units;

/**
 * The one rule for round-off: a value within 1e-10 of the largest of its kind (the largest value
 * of a diagram, the terms summed to a residual, a section's I) is the round-off of a zero and
 * stands as zero. Double precision carries about 16 digits, so ten digits below the largest
 * value leave a wide margin over the error of the sums behind it (common practice).
 */
public final class RoundOff {
    /** How far below the largest of its kind a value is taken as zero. */
    public static final double RELATIVE = 1e-10;

    private RoundOff() {}

    /** The value, or zero where it lies within {@link #RELATIVE} of {@code largest}. */
    public static double clean(double value, double largest) {
        return Math.abs(value) <= RELATIVE * largest ? 0.0 : value;
    }
}
