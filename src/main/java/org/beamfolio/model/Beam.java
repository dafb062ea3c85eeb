package org.beamfolio.model;

import java.util.List;

/** The member: length, default section and material, supports, hinges and segments (SI). */
public record Beam(double length, String section, String material, List<Support> supports,
                   List<Hinge> hinges, List<Segment> segments, String selfWeightCase) {
    public Beam {
        if (!(length > 0)) {
            throw new IllegalArgumentException("beam length must be positive");
        }
        supports = List.copyOf(supports);
        hinges = List.copyOf(hinges);
        segments = List.copyOf(segments);
    }
}
