package org.beamfolio.model;

/** A range of the beam with its own section and material. */
public record Segment(double from, double to, String section, String material) {
    public Segment {
        if (!(to > from)) {
            throw new IllegalArgumentException("segment must run left to right: " + from + " to " + to);
        }
    }
}
