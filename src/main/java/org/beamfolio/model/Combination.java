package org.beamfolio.model;

import java.util.LinkedHashMap;
import java.util.Map;

/** A named linear combination of load cases. */
public record Combination(String name, Map<String, Double> factors) {
    public Combination {
        factors = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(factors));
    }
}
