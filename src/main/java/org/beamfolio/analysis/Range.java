package org.beamfolio.analysis;

import org.beamfolio.units.RoundOff;

/**
 * The largest and smallest of the values offered and where: the first of equal values wins, and
 * the round-off of a zero ({@link RoundOff}, against the largest magnitude offered) reads as
 * zero. {@link Field#extremes} and the one-pass extremes of a combination ({@link Stresses})
 * both keep theirs here.
 */
final class Range {
    private double max = Double.NEGATIVE_INFINITY;
    private double min = Double.POSITIVE_INFINITY;
    private double atMax;
    private double atMin;
    private double scale;

    /** @param start where both extremes stand until a value is offered */
    Range(double start) {
        atMax = start;
        atMin = start;
    }

    void offer(double value, double x) {
        scale = Math.max(scale, Math.abs(value));
        if (value > max) {
            max = value;
            atMax = x;
        }
        if (value < min) {
            min = value;
            atMin = x;
        }
    }

    Extreme max() {
        return new Extreme(RoundOff.clean(max, scale), atMax, null);
    }

    Extreme min() {
        return new Extreme(RoundOff.clean(min, scale), atMin, null);
    }
}
