package org.beamfolio.report.drawing;

import java.util.List;

/**
 * What a loading diagram shows, positions in metres (for scale) and labels as display text.
 */
public record BeamSketch(double length, List<SupportMark> supports, List<Double> hinges, List<LoadMark> loads,
                         String lengthLabel) {
    public BeamSketch {
        supports = List.copyOf(supports);
        hinges = List.copyOf(hinges);
        loads = List.copyOf(loads);
    }

    public enum SupportKind { PIN, ROLLER, FIXED, SPRING }

    public record SupportMark(double at, SupportKind kind, String label) {}

    /** A load: a point force or couple at {@code from}, or a line load from {@code from} to {@code to}. */
    public record LoadMark(Kind kind, double from, double to, double start, double end, String label) {
        public enum Kind { POINT, COUPLE_CCW, COUPLE_CW, LINE }
    }
}
