package org.beamfolio.model;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import org.beamfolio.model.timber.LoadDuration;
import org.beamfolio.model.timber.TimberService;
import org.beamfolio.model.Location;

/**
 * Timber design asked for by the job ({@code design.timber}): the standard, the service
 * conditions, the load duration of every case used, and where the beam stands in the job file
 * (for messages that arise only once the beam is solved, such as RB above 50).
 *
 * @param durations every load case the job uses, with its duration (given or by default)
 * @param given the cases whose duration the job states (the rest are defaults)
 */
public record TimberDesign(String standard, TimberService service, Map<String, LoadDuration> durations,
                           java.util.Set<String> given, Location beamAt) {
    public TimberDesign {
        durations = Collections.unmodifiableMap(new LinkedHashMap<>(durations));
        given = java.util.Set.copyOf(given);
    }

    /** The load-duration factor of a combination: that of its shortest-duration case (NDS 2.3.2). */
    public LoadDuration durationOf(Map<String, Double> factors) {
        LoadDuration shortest = null;
        for (Map.Entry<String, Double> f : factors.entrySet()) {
            LoadDuration d = durations.get(f.getKey());
            if (d != null && f.getValue() != 0) {
                shortest = shortest == null ? d : shortest.shorter(d);
            }
        }
        return shortest == null ? LoadDuration.PERMANENT : shortest;
    }

    /** The case that sets a combination's duration (the first of the shortest). */
    public String governingCase(Map<String, Double> factors) {
        LoadDuration d = durationOf(factors);
        for (Map.Entry<String, Double> f : factors.entrySet()) {
            if (durations.get(f.getKey()) == d && f.getValue() != 0) {
                return f.getKey();
            }
        }
        return null;
    }
}
