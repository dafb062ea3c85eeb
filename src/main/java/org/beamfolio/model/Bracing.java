package org.beamfolio.model;

import java.util.List;

/**
 * Where each flange (or edge) of the beam is held laterally: continuously (a deck, a sheathing),
 * or at the supports and at the listed points (m from the left end). Supports brace both flanges
 * against twist except at a cantilever's free end, which no support stands at. Without
 * {@code beam.bracing}, both flanges are braced at the supports only.
 */
public record Bracing(Lateral top, Lateral bottom) {
    /** The two flanges; the top one is in compression where the moment sags (M > 0). */
    public enum Flange {
        TOP("top"), BOTTOM("bottom");

        private final String label;

        Flange(String label) {
            this.label = label;
        }

        public String label() {
            return label;
        }

        /** Whether a moment of this sign (sagging positive) puts the flange in compression. */
        public boolean compressedBy(double moment) {
            return this == TOP ? moment > 0 : moment < 0;
        }
    }

    /** The bracing of one flange: continuous, or at the supports plus the points (sorted, m). */
    public record Lateral(boolean continuous, List<Double> points) {
        public static final Lateral AT_SUPPORTS = new Lateral(false, List.of());
        public static final Lateral CONTINUOUS = new Lateral(true, List.of());

        public Lateral {
            points = List.copyOf(points);
            if (continuous && !points.isEmpty()) {
                throw new IllegalArgumentException("a continuously braced flange lists no points");
            }
        }
    }

    /** Both flanges braced at the supports only: what a job without {@code beam.bracing} means. */
    public static final Bracing AT_SUPPORTS = new Bracing(Lateral.AT_SUPPORTS, Lateral.AT_SUPPORTS);

    public Lateral of(Flange flange) {
        return flange == Flange.TOP ? top : bottom;
    }
}
