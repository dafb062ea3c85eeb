package org.beamfolio.section;

import java.util.List;

/**
 * Elastic properties of a cross-section about its horizontal centroidal axis (SI: m, m^2, m^3,
 * m^4). Optional values are null where the section does not give them (a {@code given} section
 * without A, Q or t).
 *
 * @param yBottom height of the centroid above the bottom fibre
 * @param qNeutral first moment about the neutral axis of the area above it
 * @param tNeutral width of the section at the neutral axis, for shear stress
 * @param junctions flange-to-web junctions (and other width changes), with Q and width there
 * @param parts the rectangles the section is built from, for the parallel axis table; empty for
 *     round and given sections
 */
public record SectionProperties(Double area, double yBottom, double inertia, double depth,
                                Double qNeutral, Double tNeutral, List<Junction> junctions, List<Part> parts) {
    public SectionProperties {
        junctions = List.copyOf(junctions);
        parts = List.copyOf(parts);
    }

    public double cTop() {
        return depth - yBottom;
    }

    public double cBottom() {
        return yBottom;
    }

    public double sTop() {
        return inertia / cTop();
    }

    public double sBottom() {
        return inertia / cBottom();
    }

    /**
     * The largest Q / (I t) over the neutral axis and the junctions: shear stress per unit shear
     * force. Null without Q or t.
     */
    public Double shearStressFactor() {
        if (qNeutral == null || tNeutral == null) {
            return null;
        }
        double factor = qNeutral / (inertia * tNeutral);
        for (Junction j : junctions) {
            factor = Math.max(factor, Math.abs(j.q()) / (inertia * j.width()));
        }
        return factor;
    }

    /** Where the largest shear stress acts: "neutral axis" or the junction's height. */
    public boolean shearGovernsAtJunction() {
        Double factor = shearStressFactor();
        return factor != null && factor > qNeutral / (inertia * tNeutral);
    }

    /** A horizontal cut where the width changes: its height above the bottom, Q above it and the width. */
    public record Junction(double height, double q, double width) {}

    /** One rectangle of a built-up section, with its parallel axis terms. */
    public record Part(double b, double h, double y, double area, double centroid, double ownInertia,
                       double transferInertia) {}
}
