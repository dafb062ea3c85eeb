package org.beamfolio.analysis;

import java.util.List;

/**
 * Which combinations an allowable-stress check compares with the allowables: those of an
 * allowable-stress set (ASCE 7 2.4), the characteristic (service) combinations of EN 1990, or
 * every combination the engineer listed; never the factored strength combinations.
 */
public final class StressCombinations {
    private StressCombinations() {}

    public static List<CombinationResult> of(List<CombinationResult> combinations) {
        return combinations.stream().filter(StressCombinations::comparesWithAllowables).toList();
    }

    public static boolean comparesWithAllowables(CombinationResult c) {
        return c.purpose().comparedWithAllowables();
    }
}
