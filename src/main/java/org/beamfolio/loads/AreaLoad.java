package org.beamfolio.loads;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.Map;
import java.util.Set;

/**
 * A load spread over an area, as the job names it under {@code area_loads}: a pressure per load
 * case (Pa, down positive), the cases whose live load may be reduced, whether the floor is an
 * assembly use (ASCE/SEI 7-22 4.7.6 forbids the reduction there), and the engineer's note.
 */
public record AreaLoad(String name, Map<String, Double> pressures, Set<String> reducible, boolean assembly, String note) {
    public AreaLoad {
        pressures = Collections.unmodifiableMap(new LinkedHashMap<>(pressures));
        reducible = Collections.unmodifiableSet(new LinkedHashSet<>(reducible));
    }
}
