package org.beamfolio.model;

import org.beamfolio.model.Location;

/**
 * A load of one case. Forces are positive downward (gravity); couples positive counter-clockwise.
 * SI units inside: N, N*m, N/m, m.
 */
public sealed interface Load {
    String loadCase();

    String note();

    Location where();

    /** The resultant force, down positive (zero for a couple). */
    double force();

    /** Where the resultant acts: the point, or the centroid of a line load's diagram. */
    double centroid();

    /** The counter-clockwise couple (zero for a force). */
    default double couple() {
        return 0;
    }

    /** The positions that bound the load: its point, or its start and end. */
    java.util.List<Double> positions();

    /** The same load times a factor. */
    Load scaled(double factor);

    /** A concentrated force; {@code bearing} (m), when the job gives it, the length it bears on along the beam, else null. */
    record Point(String loadCase, double P, double at, String note, Location where, Double bearing) implements Load {
        public Point(String loadCase, double P, double at, String note, Location where) {
            this(loadCase, P, at, note, where, null);
        }

        public double force() {
            return P;
        }

        public double centroid() {
            return at;
        }

        public java.util.List<Double> positions() {
            return java.util.List.of(at);
        }

        public Load scaled(double factor) {
            return new Point(loadCase, factor * P, at, note, where, bearing);
        }
    }

    /** A concentrated couple, counter-clockwise positive. */
    record Couple(String loadCase, double M, double at, String note, Location where) implements Load {
        public double force() {
            return 0;
        }

        public double centroid() {
            return at;
        }

        @Override
        public double couple() {
            return M;
        }

        public java.util.List<Double> positions() {
            return java.util.List.of(at);
        }

        public Load scaled(double factor) {
            return new Couple(loadCase, factor * M, at, note, where);
        }
    }

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

        public double force() {
            return resultant();
        }

        /** The centroid of the trapezoid (its middle when the intensities cancel). */
        public double centroid() {
            double sum = wStart + wEnd;
            return sum == 0 ? (from + to) / 2 : from + (to - from) * (wStart + 2 * wEnd) / (3 * sum);
        }

        public java.util.List<Double> positions() {
            return java.util.List.of(from, to);
        }

        public Load scaled(double factor) {
            return new Distributed(loadCase, factor * wStart, factor * wEnd, from, to, uniform, note, where);
        }
    }
}
