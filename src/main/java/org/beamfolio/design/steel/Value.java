package org.beamfolio.design.steel;

/** A named value of a worked equation: its symbol as printed, its SI value and what it measures. */
public record Value(String symbol, double value, Kind kind) {
    public static Value of(String symbol, double value, Kind kind) {
        return new Value(symbol, value, kind);
    }
}
