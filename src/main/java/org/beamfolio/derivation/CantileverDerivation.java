package org.beamfolio.derivation;

import java.util.List;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.model.Load;
import org.beamfolio.model.Support;

/** A cantilever from one fixed support: the support takes the whole load and its moment. */
final class CantileverDerivation {
    private final AnalysisResult result;
    private final LoadTerms terms;
    private final Notation n;
    private final Steps steps;

    CantileverDerivation(AnalysisResult result, List<Load> loads, Notation n, Steps steps) {
        this.result = result;
        this.terms = new LoadTerms(loads, n);
        this.n = n;
        this.steps = steps;
    }

    String write() {
        Support s = result.job().beam().supports().get(0);
        steps.note("Free body of the whole beam: the fixed support at " + Steps.n(n.x(s.at()), n.xu())
                + " gives a vertical reaction R and a moment M_R (counter-clockwise positive). Statically determinate.", "statics");
        List<Integer> resultants = terms.resultantSteps(steps);
        steps.add("Vertical reaction", "ΣFy = 0: R = ΣF", "R = " + terms.forceSum(), n.f(terms.totalForce()), n.fu(),
                "statics: sum of vertical forces", resultants.toArray(Integer[]::new));
        steps.add("Support moment from moments about the support", "ΣM = 0: M_R = Σ[F (x − x_s) − M_ccw]",
                "M_R = " + terms.momentSum(s.at()), n.m(terms.momentAbout(s.at())), n.mu(), "statics: sum of moments about a point");
        return "Statics of a cantilever";
    }
}
