package org.beamfolio.derivation;

import java.util.List;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.model.Load;
import org.beamfolio.model.Support;

/**
 * A beam on two vertical supports (a simple span, with or without overhangs): statically
 * determinate. Moments about the left support give the right reaction, vertical equilibrium the
 * left one, and moments about the right support check it.
 */
final class StaticsDerivation {
    private final AnalysisResult result;
    private final LoadTerms terms;
    private final Notation n;
    private final Steps steps;

    StaticsDerivation(AnalysisResult result, List<Load> loads, Notation n, Steps steps) {
        this.result = result;
        this.terms = new LoadTerms(loads, n);
        this.n = n;
        this.steps = steps;
    }

    String write() {
        Support a = result.job().beam().supports().get(0);
        Support b = result.job().beam().supports().get(1);
        double span = b.at() - a.at();
        steps.note("Free body of the whole beam: vertical reactions R_A (" + a.kind().label() + " at " + Steps.n(n.x(a.at()), n.xu())
                + ") and R_B (" + b.kind().label() + " at " + Steps.n(n.x(b.at()), n.xu()) + "). No load has a horizontal component, so ΣFx = 0 "
                + "gives a horizontal reaction of zero. Two unknowns, two equations: statically determinate.", "statics");
        List<Integer> resultants = terms.resultantSteps(steps);
        double rb = terms.momentAbout(a.at()) / span;
        int stepB = steps.add("Right reaction from moments about A (clockwise loads positive)",
                "ΣM_A = 0: R_B = Σ[F (x − x_A) − M_ccw] / (x_B − x_A)",
                "R_B = [" + terms.momentSum(a.at()) + "] / " + Steps.n(n.x(span), n.xu()),
                n.f(rb), n.fu(), "statics: sum of moments about a point", resultants.toArray(Integer[]::new));
        double ra = terms.totalForce() - rb;
        int stepA = steps.add("Left reaction from vertical equilibrium", "ΣFy = 0: R_A = ΣF − R_B",
                "R_A = " + terms.forceSum() + " − " + Steps.n(n.f(rb), n.fu()), n.f(ra), n.fu(), "statics: sum of vertical forces", stepB);
        double check = -terms.momentAbout(b.at()) / span;
        steps.add("Check: left reaction from moments about B, which must agree with step " + stepA,
                "ΣM_B = 0: R_A = −Σ[F (x − x_B) − M_ccw] / (x_B − x_A)",
                "R_A = −[" + terms.momentSum(b.at()) + "] / " + Steps.n(n.x(span), n.xu()),
                n.f(check), n.fu(), "statics: sum of moments about a second point", stepA);
        return "Statics of a statically determinate beam";
    }
}
