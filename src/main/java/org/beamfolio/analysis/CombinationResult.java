package org.beamfolio.analysis;

import java.util.List;
import java.util.Map;
import org.beamfolio.model.Purpose;
import java.util.function.Supplier;

/**
 * One combination (or one pattern arrangement of it) solved: its factors, where it comes from,
 * its extremes, and its response. The response's diagrams are summed from the load cases the
 * first time they are asked for and kept: most combinations of a large beam are only ever read
 * for their extremes, which are found without them.
 */
public final class CombinationResult {
    private final String name;
    private final Map<String, Double> factors;
    private final String reference;
    private final Purpose purpose;
    private final String arrangement;
    private final List<Integer> loadedRegions;
    private final Extremes extremes;
    private Supplier<Response> pending;
    private Response response;

    /**
     * @param reference the clause of the built-in set, or "job file" for an explicit combination
     * @param purpose what the combination is for (strength, allowable stress, service)
     * @param arrangement the loaded spans of the pattern cases, empty when all spans carry them
     * @param loadedRegions for an arrangement, the indices (into the spans) that carry the pattern cases
     * @param response makes the response when first needed
     */
    public CombinationResult(String name, Map<String, Double> factors, String reference, Purpose purpose, String arrangement,
                             List<Integer> loadedRegions, Supplier<Response> response, Extremes extremes) {
        this.name = name;
        this.factors = factors;
        this.reference = reference;
        this.purpose = purpose;
        this.arrangement = arrangement;
        this.loadedRegions = List.copyOf(loadedRegions);
        this.pending = response;
        this.extremes = extremes;
    }

    public String name() {
        return name;
    }

    public Map<String, Double> factors() {
        return factors;
    }

    public String reference() {
        return reference;
    }

    public Purpose purpose() {
        return purpose;
    }

    public String arrangement() {
        return arrangement;
    }

    public List<Integer> loadedRegions() {
        return loadedRegions;
    }

    public Extremes extremes() {
        return extremes;
    }

    public synchronized Response response() {
        if (response == null) {
            response = pending.get();
            pending = null;
        }
        return response;
    }
}
