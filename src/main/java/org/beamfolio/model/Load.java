package org.beamfolio.model;

import org.beamfolio.job.Location;

/**
 * A load of one case. Forces are positive downward (gravity); couples positive counter-clockwise.
 * SI units inside: N, N*m, N/m, m.
 */
public sealed interface Load {
    String loadCase();

    String note();

    Location where();

    record Point(String loadCase, double P, double at, String note, Location where) implements Load {}

    /** A concentrated couple, counter-clockwise positive. */
    record Couple(String loadCase, double M, double at, String note, Location where) implements Load {}

    /** A line load varying linearly from wStart at {@code from} to wEnd at {@code to}. */
    record Distributed(String loadCase, double wStart, double wEnd, double from, double to, boolean uniform,
                       String note, Location where) implements Load {
        public Distributed {
            if (!(to > from)) {
                throw new IllegalArgumentException("a line load must run left to right");
            }
        }

        /** Intensity at x (within the load's range). */
        public double intensityAt(double x) {
            return wStart + (wEnd - wStart) * (x - from) / (to - from);
        }

        public double resultant() {
            return 0.5 * (wStart + wEnd) * (to - from);
        }
    }
}
