package org.beamfolio.derivation;

import java.util.List;

/**
 * One numbered step of a derivation, as a careful engineer writes it by hand: what is found, the
 * equation in symbols, the same equation with the numbers put in (report units in brackets, so
 * conversions are visible), the result, and where the formula comes from. {@code value} keeps
 * the full-precision result in report units: later steps compute from it, never from the
 * rounded text.
 *
 * @param uses the numbers of earlier steps this one takes values from
 */
public record Step(int number, String statement, String symbolic, String substituted, String result, double value,
                   String source, List<Integer> uses) {
    public Step {
        uses = List.copyOf(uses);
    }
}
