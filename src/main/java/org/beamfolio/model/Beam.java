package org.beamfolio.model;

import java.util.List;

/** The member: length, default section and material, supports, hinges, segments and lateral bracing (SI). */
public record Beam(double length, String section, String material, List<Support> supports,
                   List<Hinge> hinges, List<Segment> segments, String selfWeightCase, Bracing bracing) {
    public Beam {
        if (!(length > 0)) {
            throw new IllegalArgumentException("beam length must be positive");
        }
        supports = List.copyOf(supports);
        hinges = List.copyOf(hinges);
        segments = List.copyOf(segments);
        bracing = bracing == null ? Bracing.AT_SUPPORTS : bracing;
    }

    /** A beam braced at its supports only. */
    public Beam(double length, String section, String material, List<Support> supports,
                List<Hinge> hinges, List<Segment> segments, String selfWeightCase) {
        this(length, section, material, supports, hinges, segments, selfWeightCase, Bracing.AT_SUPPORTS);
    }

    /**
     * The borders of the beam's regions for pattern loading, left to right: each span between two
     * supports is a region, and so is an overhang beyond the first or last support (its free end
     * is then a border). A beam on one support has only overhangs (cantilevers).
     */
    public List<Double> regionBorders() {
        double tolerance = 1e-9 * length;
        List<Double> borders = new java.util.ArrayList<>();
        double first = supports.get(0).at();
        double last = supports.get(supports.size() - 1).at();
        if (first > tolerance) {
            borders.add(0.0);
        }
        supports.forEach(s -> borders.add(s.at()));
        if (length - last > tolerance) {
            borders.add(length);
        }
        return borders;
    }

    /** The section at x, strictly inside a stretch without change (the last segment naming x wins). */
    public String sectionAt(double x) {
        String id = section;
        for (Segment s : segments) {
            if (x > s.from() && x < s.to()) {
                id = s.section();
            }
        }
        return id;
    }

    /** The material at x, as {@link #sectionAt}. */
    public String materialAt(double x) {
        String id = material;
        for (Segment s : segments) {
            if (x > s.from() && x < s.to()) {
                id = s.material();
            }
        }
        return id;
    }
}
