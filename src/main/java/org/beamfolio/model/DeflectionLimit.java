package org.beamfolio.model;

import java.util.List;

/**
 * A deflection limit on the sum of the named unfactored cases: either span over a ratio
 * ({@code L/360}) or an absolute maximum in metres. {@code relative}: with spring supports, the
 * limit applies to the deflection relative to the line between the supports' movements (the
 * default), or, when false, to the absolute deflection; on rigid supports the two are the same.
 */
public record DeflectionLimit(List<String> cases, Double spanRatio, Double maximum, boolean relative) {
    public DeflectionLimit {
        cases = List.copyOf(cases);
        if ((spanRatio == null) == (maximum == null)) {
            throw new IllegalArgumentException("a deflection limit needs a ratio or a maximum, not both");
        }
    }

    public DeflectionLimit(List<String> cases, Double spanRatio, Double maximum) {
        this(cases, spanRatio, maximum, true);
    }
}
