package org.beamfolio.checks.timber;

import java.util.ArrayList;
import java.util.List;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.CombinationResult;
import org.beamfolio.design.timber.EffectiveLength;
import org.beamfolio.model.Load;

/**
 * Which row of NDS Table 3.3.3 an unbraced segment takes, from the loads acting on it under one
 * combination: a uniform load over the whole segment alone, one concentrated load at the centre
 * of a span alone, or (cantilevers) a uniform load or a load at the free end alone; any other
 * loading, or none, takes the table's row for any loading. The table is written for single
 * spans and cantilevers; a span of a continuous beam takes the row of its own loading (common
 * practice).
 */
final class SegmentLoading {
    private SegmentLoading() {}

    static EffectiveLength rowFor(AnalysisResult result, CombinationResult c, UnbracedSegments.Unbraced seg) {
        double tol = 1e-6 * result.job().beam().length();
        List<Load> acting = new ArrayList<>();
        for (Load l : result.loads()) {
            double factor = c.factors().getOrDefault(l.loadCase(), 0.0);
            if (factor == 0 || l.force() == 0 && l.couple() == 0) {
                continue;
            }
            if (result.job().pattern().contains(l.loadCase()) && !c.arrangement().isEmpty()
                    && !c.loadedRegions().contains(seg.region())) {
                continue;
            }
            List<Double> at = l.positions();
            double lo = at.get(0);
            double hi = at.get(at.size() - 1);
            boolean touches = l instanceof Load.Distributed ? hi > seg.from() + tol && lo < seg.to() - tol
                    : lo > seg.from() + tol && lo < seg.to() - tol || seg.cantilever() && freeEnd(result, seg, lo, tol);
            if (touches) {
                acting.add(l);
            }
        }
        if (acting.isEmpty()) {
            return EffectiveLength.ANY;
        }
        boolean allUniform = acting.stream().allMatch(l -> l instanceof Load.Distributed d && d.wStart() == d.wEnd()
                && d.from() <= seg.from() + tol && d.to() >= seg.to() - tol);
        if (seg.cantilever()) {
            if (allUniform) {
                return EffectiveLength.CANTILEVER_UNIFORM;
            }
            boolean endLoads = acting.stream().allMatch(l -> l instanceof Load.Point p && freeEnd(result, seg, p.at(), tol));
            return endLoads ? EffectiveLength.CANTILEVER_END_LOAD : EffectiveLength.ANY;
        }
        if (allUniform) {
            return EffectiveLength.UNIFORM;
        }
        double centre = (seg.from() + seg.to()) / 2;
        if (acting.size() == 1 && acting.get(0) instanceof Load.Point p && Math.abs(p.at() - centre) <= 1e-3 * seg.length()) {
            return EffectiveLength.CENTRE_LOAD;
        }
        return EffectiveLength.ANY;
    }

    /** Whether x is the free end of a cantilever segment (the beam's end that is not a support). */
    private static boolean freeEnd(AnalysisResult result, UnbracedSegments.Unbraced seg, double x, double tol) {
        double length = result.job().beam().length();
        boolean leftFree = seg.from() <= tol && result.job().beam().supports().get(0).at() > tol;
        boolean rightFree = seg.to() >= length - tol;
        return leftFree && Math.abs(x - seg.from()) <= tol || rightFree && !leftFree && Math.abs(x - seg.to()) <= tol;
    }
}
