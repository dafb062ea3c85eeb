package org.beamfolio.model;

import java.util.LinkedHashMap;
import java.util.Map;

/** A named linear combination of load cases, and what it is for. */
public record Combination(String name, Map<String, Double> factors, Purpose purpose) {
    public Combination {
        factors = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(factors));
    }

    /** A combination the engineer lists in the job: an allowable-stress combination (see {@link Purpose}). */
    public Combination(String name, Map<String, Double> factors) {
        this(name, factors, Purpose.ALLOWABLE_STRESS);
    }
}
