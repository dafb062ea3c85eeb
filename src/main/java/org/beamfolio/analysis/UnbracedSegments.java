package org.beamfolio.analysis;

import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;
import org.beamfolio.model.Beam;
import org.beamfolio.model.Bracing;
import org.beamfolio.model.Support;

/**
 * The unbraced segments of the flange (or edge) in compression under one moment field: what sets
 * Lb (steel) and le (timber). Each flange is cut at its bracing points: the supports (which brace
 * both flanges against twist), the points the job lists for it, and the beam's ends. A flange
 * braced continuously is cut at the supports and ends only and has no unbraced length. The top
 * flange is in compression where the moment sags (M > 0), the bottom one where it hogs (M < 0);
 * a segment is returned for a flange when that flange is in compression anywhere in it, with the
 * largest compressing moment in it found exactly (piece ends and the real roots of the piece's
 * derivative, as {@link Field#extremeOf}). The compression side may change within a segment (at
 * a root of the moment): then the segment is returned once for each flange, each with its own
 * demand, so both flanges are checked over their own bracing.
 */
public final class UnbracedSegments {
    /** Compressing moments smaller than this fraction of the field's largest |M| are round-off of a zero. */
    static final double ROUND_OFF = 1e-10;

    private UnbracedSegments() {}

    /**
     * One unbraced (or continuously braced) segment of a flange in compression.
     *
     * @param continuouslyBraced the flange is braced along the whole segment (Lb = 0)
     * @param freeEnd the segment ends at a free end that is not braced (a cantilever's tip)
     * @param demand the largest moment of the compressing sign in the segment, signed (N*m), and where
     */
    public record Segment(Bracing.Flange flange, double from, double to, boolean continuouslyBraced,
                          boolean freeEnd, Extreme demand) {
        /** The unbraced length: the segment's length, or 0 when braced continuously. */
        public double lb() {
            return continuouslyBraced ? 0 : to - from;
        }
    }

    /** The segments of both flanges that are in compression somewhere under {@code moment}, left to right, top first at a tie. */
    public static List<Segment> of(Beam beam, Field moment) {
        double scale = 0;
        for (int i = 0; i < moment.size(); i++) {
            scale = Math.max(scale, Math.max(Math.abs(moment.extremeOf(i, 1).value()), Math.abs(moment.extremeOf(i, -1).value())));
        }
        List<Segment> result = new ArrayList<>();
        for (Bracing.Flange flange : Bracing.Flange.values()) {
            boolean continuous = beam.bracing().of(flange).continuous();
            List<Double> cuts = cuts(beam, flange);
            for (int k = 0; k + 1 < cuts.size(); k++) {
                double from = cuts.get(k);
                double to = cuts.get(k + 1);
                Extreme demand = compressing(moment, flange, from, to);
                if (Math.abs(demand.value()) > ROUND_OFF * scale && flange.compressedBy(demand.value())) {
                    boolean free = !continuous && (freeEnd(beam, flange, from) || freeEnd(beam, flange, to));
                    result.add(new Segment(flange, from, to, continuous, free, demand));
                }
            }
        }
        result.sort(java.util.Comparator.comparingDouble(Segment::from).thenComparing(Segment::flange));
        return result;
    }

    /**
     * Where a flange is braced, left to right: the beam's ends, the supports, and (unless it is
     * braced continuously) the job's points for it. Consecutive cuts bound its segments.
     */
    public static List<Double> cuts(Beam beam, Bracing.Flange flange) {
        double same = 1e-9 * beam.length();
        TreeSet<Double> at = new TreeSet<>();
        at.add(0.0);
        at.add(beam.length());
        beam.supports().forEach(s -> at.add(s.at()));
        beam.bracing().of(flange).points().forEach(at::add);
        List<Double> cuts = new ArrayList<>();
        for (double x : at) {
            if (cuts.isEmpty() || x - cuts.get(cuts.size() - 1) > same) {
                cuts.add(x);
            }
        }
        return cuts;
    }

    /** An end of the beam with no support, where the flange has no bracing point. */
    static boolean freeEnd(Beam beam, Bracing.Flange flange, double x) {
        double same = 1e-9 * beam.length();
        boolean end = x <= same || x >= beam.length() - same;
        if (!end) {
            return false;
        }
        for (Support s : beam.supports()) {
            if (Math.abs(s.at() - x) <= same) {
                return false;
            }
        }
        return beam.bracing().of(flange).points().stream().noneMatch(p -> Math.abs(p - x) <= same);
    }

    /** The largest moment of the sign that compresses the flange on [from, to] (exact), or a zero. */
    static Extreme compressing(Field moment, Bracing.Flange flange, double from, double to) {
        int sign = flange == Bracing.Flange.TOP ? 1 : -1;
        Extreme best = new Extreme(0, from, null);
        for (int i = 0; i < moment.size(); i++) {
            double lo = Math.max(from, moment.start(i));
            double hi = Math.min(to, moment.end(i));
            if (hi <= lo) {
                continue;
            }
            Polynomial p = moment.piece(i);
            List<Double> at = new ArrayList<>(List.of(lo - moment.start(i), hi - moment.start(i)));
            at.addAll(Roots.in(p.derivative(), lo - moment.start(i), hi - moment.start(i)));
            for (double s : at) {
                double v = p.at(s);
                if (sign * v > sign * best.value()) {
                    best = new Extreme(v, moment.start(i) + s, null);
                }
            }
        }
        return best;
    }
}
