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
     * The job format's default: both edges held laterally at the supports only, so each span and
     * each overhang is one unbraced length of whichever edge is in compression.
     */
    UnbracedSegments SUPPORTS_ONLY = (result, combination, topInCompression) -> {
        List<Unbraced> out = new ArrayList<>();
        List<AnalysisResult.Span> spans = result.spans();
        for (int i = 0; i < spans.size(); i++) {
            AnalysisResult.Span s = spans.get(i);
            out.add(new Unbraced(s.from(), s.to(), i, !s.label().startsWith("span "), false,
                    "braced at the supports only (no beam.bracing)"));
        }
        return out;
    };
}
