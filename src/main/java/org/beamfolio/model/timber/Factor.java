package org.beamfolio.model.timber;

/**
 * One adjustment factor as the package prints it: its NDS symbol, its value, the clause or table
 * it comes from, and why it has that value (with the numbers substituted where it is computed).
 */
public record Factor(String symbol, double value, String clause, String basis) {
    public Factor {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(symbol + ": factor must be positive and finite, got " + value);
        }
    }

    public static Factor unity(String symbol, String clause, String basis) {
        return new Factor(symbol, 1.0, clause, basis);
    }
}
