package org.beamfolio.analysis;

/** A largest or smallest value of a field and where it occurs (SI), with the combination giving it. */
public record Extreme(double value, double at, String combination) {
    public Extreme withCombination(String name) {
        return new Extreme(value, at, name);
    }
}
