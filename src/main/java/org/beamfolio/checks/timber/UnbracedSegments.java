package org.beamfolio.checks.timber;

import java.util.ArrayList;
import java.util.List;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.CombinationResult;

/**
 * The unbraced segments of the compression edge of a beam under one combination: the lengths lu
 * from which NDS Table 3.3.3 gives le.
 */
public interface UnbracedSegments {
    /**
     * @param topInCompression whether the top edge is the one in compression (sagging moment)
     * @return the segments along the beam, left to right, each with its own lu
     */
    List<Unbraced> of(AnalysisResult result, CombinationResult combination, boolean topInCompression);

    /**
     * One unbraced length of the compression edge.
     *
     * @param region index into {@link AnalysisResult#spans()} of the region the segment lies in (pattern loading)
     * @param cantilever whether one end of the segment is a free end
     * @param braced held along its whole length (then CL = 1.0)
     */
    record Unbraced(double from, double to, int region, boolean cantilever, boolean braced, String bracedBy) {
        public double length() {
            return to - from;
        }
    }

    /**
     * The beam's own bracing ({@code beam.bracing}; without it, both edges at the supports only):
     * the edge in compression is cut at the beam's ends, the supports and its bracing points; an
     * edge braced continuously has no unbraced length. A segment touching a free end that no
     * support or point braces is a cantilever's.
     */
    UnbracedSegments BY_BRACING = (result, combination, topInCompression) -> {
        org.beamfolio.model.Beam beam = result.job().beam();
        org.beamfolio.model.Bracing.Flange edge = topInCompression
                ? org.beamfolio.model.Bracing.Flange.TOP : org.beamfolio.model.Bracing.Flange.BOTTOM;
        org.beamfolio.model.Bracing.Lateral lateral = beam.bracing().of(edge);
        List<Double> cuts = org.beamfolio.analysis.UnbracedSegments.cuts(beam, edge);
        List<Unbraced> out = new ArrayList<>();
        for (int k = 0; k + 1 < cuts.size(); k++) {
            double from = cuts.get(k);
            double to = cuts.get(k + 1);
            boolean free = !lateral.continuous() && (isFree(beam, from) || isFree(beam, to));
            String by = lateral.continuous() ? "braced continuously (beam.bracing." + edge.label() + ")"
                    : lateral.points().isEmpty() ? "braced at the supports" + (free ? " (free end unbraced)" : "")
                    : "braced at the supports and the bracing points of beam.bracing." + edge.label();
            out.add(new Unbraced(from, to, regionOf(result, (from + to) / 2), free, lateral.continuous(), by));
        }
        return out;
    };

    private static boolean isFree(org.beamfolio.model.Beam beam, double x) {
        double same = 1e-9 * beam.length();
        boolean end = x <= same || x >= beam.length() - same;
        return end && beam.supports().stream().noneMatch(s -> Math.abs(s.at() - x) <= same);
    }

    /** The region (span or overhang) holding x, for the pattern arrangements' loaded regions. */
    private static int regionOf(AnalysisResult result, double x) {
        List<AnalysisResult.Span> spans = result.spans();
        for (int i = 0; i < spans.size(); i++) {
            if (x >= spans.get(i).from() && x <= spans.get(i).to()) {
                return i;
            }
        }
        return spans.size() - 1;
    }
}
