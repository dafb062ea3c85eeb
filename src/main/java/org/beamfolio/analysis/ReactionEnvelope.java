package org.beamfolio.analysis;

import java.util.ArrayList;
import java.util.List;

/**
 * The largest and smallest vertical reaction at each support over every combination and pattern
 * arrangement, with the one that gives it: what the supporting structure must be designed for,
 * and where it must hold the beam down (a smallest reaction below zero is uplift).
 */
public final class ReactionEnvelope {
    /** A reaction (N, up positive) and the combination or arrangement that gives it. */
    public record Bound(double force, String combination) {}

    /** The extremes at one support. */
    public record AtSupport(Bound max, Bound min) {
        /** The smallest reaction pulls the beam down by more than round-off of the largest. */
        public boolean uplift() {
            return min.force() < -1e-9 * Math.abs(max.force());
        }
    }

    private final double[] max;
    private final double[] min;
    private final String[] maxBy;
    private final String[] minBy;

    ReactionEnvelope(int supports) {
        max = new double[supports];
        min = new double[supports];
        maxBy = new String[supports];
        minBy = new String[supports];
    }

    /** Takes one combination's reactions; on a tie the earlier one is kept (a combination before its arrangements). */
    void accept(String combination, double[] forces) {
        for (int i = 0; i < forces.length; i++) {
            if (maxBy[i] == null || forces[i] > max[i]) {
                max[i] = forces[i];
                maxBy[i] = combination;
            }
            if (minBy[i] == null || forces[i] < min[i]) {
                min[i] = forces[i];
                minBy[i] = combination;
            }
        }
    }

    /** Per support in order along the beam; empty when nothing was accepted. */
    public List<AtSupport> supports() {
        List<AtSupport> out = new ArrayList<>();
        for (int i = 0; i < max.length && maxBy[i] != null; i++) {
            out.add(new AtSupport(new Bound(max[i], maxBy[i]), new Bound(min[i], minBy[i])));
        }
        return out;
    }
}
