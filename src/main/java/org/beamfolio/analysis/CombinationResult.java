package org.beamfolio.analysis;

import java.util.Map;

/**
 * One combination (or one pattern arrangement of it) solved: its factors, where it comes from,
 * the response and its extremes.
 *
 * @param reference the clause of the built-in set, or "job file" for an explicit combination
 * @param arrangement the loaded spans of the pattern cases, empty when all spans carry them
 */
public record CombinationResult(String name, Map<String, Double> factors, String reference, String arrangement,
                                Response response, Extremes extremes) {}
