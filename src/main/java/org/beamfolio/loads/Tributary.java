package org.beamfolio.loads;

/**
 * One application of an area load to the member: the tributary width varies linearly from
 * {@code widthStart} at {@code from} to {@code widthEnd} at {@code to} (m; equal for a constant width).
 *
 * @param note the application's own note (which bay, which side), or empty
 */
public record Tributary(AreaLoad load, double widthStart, double widthEnd, double from, double to, String note) {
    public Tributary {
        if (!(to > from)) {
            throw new IllegalArgumentException("a tributary width must run left to right");
        }
    }

    public boolean varying() {
        return widthStart != widthEnd;
    }

    /** The area carried: the integral of the width over the extent, exact for a linear width (trapezoid). */
    public double area() {
        return 0.5 * (widthStart + widthEnd) * (to - from);
    }
}
