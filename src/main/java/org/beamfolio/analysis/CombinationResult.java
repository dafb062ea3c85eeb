package org.beamfolio.analysis;

import java.util.Map;

/**
 * One combination (or one pattern arrangement of it) solved: its factors, where it comes from,
 * the response and its extremes.
 *
 * @param reference the clause of the built-in set, or "job file" for an explicit combination
 * @param arrangement the loaded spans of the pattern cases, empty when all spans carry them
 * @param loadedRegions for an arrangement, the indices (into the spans) that carry the pattern cases
 */
public record CombinationResult(String name, Map<String, Double> factors, String reference, String arrangement,
                                java.util.List<Integer> loadedRegions, Response response, Extremes extremes) {
    public CombinationResult {
        loadedRegions = java.util.List.copyOf(loadedRegions);
    }
}
