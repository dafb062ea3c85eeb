package org.beamfolio.model;

import java.util.List;

/**
 * A deflection limit on the sum of the named unfactored cases: either span over a ratio
 * ({@code L/360}) or an absolute maximum in metres.
 */
public record DeflectionLimit(List<String> cases, Double spanRatio, Double maximum) {
    public DeflectionLimit {
        cases = List.copyOf(cases);
        if ((spanRatio == null) == (maximum == null)) {
            throw new IllegalArgumentException("a deflection limit needs a ratio or a maximum, not both");
        }
    }
}
