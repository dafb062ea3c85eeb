package org.beamfolio.units;

/**
 * A unit of measure: its symbol, its dimension and the factor that takes a value in it to the
 * internal SI unit of that dimension (N, m, Pa and their products).
 */
public record Unit(String symbol, Dimension dimension, double toSi) {
    public Unit {
        if (!(toSi > 0) || !Double.isFinite(toSi)) {
            throw new IllegalArgumentException("unit " + symbol + ": factor must be positive, got " + toSi);
        }
    }

    /** Internal SI value of {@code value} given in this unit. */
    public double toSi(double value) {
        return value * toSi;
    }

    /** Value in this unit of an internal SI value. */
    public double fromSi(double si) {
        return si / toSi;
    }
}
