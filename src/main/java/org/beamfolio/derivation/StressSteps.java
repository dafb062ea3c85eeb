package org.beamfolio.derivation;

import java.util.ArrayList;
import java.util.List;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.CombinationResult;
import org.beamfolio.analysis.Extreme;
import org.beamfolio.analysis.Extremes;
import org.beamfolio.results.ReportUnits;
import org.beamfolio.section.SectionProperties;
import org.beamfolio.units.Unit;
import org.beamfolio.units.Units;

/**
 * The governing stresses worked out: sigma = M c / I at the extreme fibre of the largest tension
 * and of the largest compression over the envelope, and tau = V Q / (I t) where the shear stress
 * is largest, with the conversion of the moment to the section's units shown (lb*ft to lb*in,
 * kN*m to N*mm).
 */
public final class StressSteps {
    private final AnalysisResult result;
    private final ReportUnits u;
    private final boolean us;

    private StressSteps(AnalysisResult result) {
        this.result = result;
        this.u = ReportUnits.of(result.job().report().units());
        this.us = u.length().symbol().equals("ft");
    }

    public static List<Step> of(AnalysisResult result) {
        return new StressSteps(result).steps();
    }

    private List<Step> steps() {
        Steps steps = new Steps();
        Extremes e = result.envelope();
        if (e == null) {
            return steps.list();
        }
        boolean topTension = e.stressTopMax().value() > e.stressBottomMax().value();
        Extreme tension = topTension ? e.stressTopMax() : e.stressBottomMax();
        boolean topCompression = e.stressTopMin().value() < e.stressBottomMin().value();
        Extreme compression = topCompression ? e.stressTopMin() : e.stressBottomMin();
        if (tension.value() > 0) {
            fibre(steps, "Largest tension", tension, topTension);
        }
        if (compression.value() < 0) {
            fibre(steps, "Largest compression", compression, topCompression);
        }
        if (e.shearStressMax() != null && e.shearStressMax().value() > 0) {
            shear(steps, e.shearStressMax());
        }
        return steps.list();
    }

    private CombinationResult combination(String name) {
        return result.combinations().stream().filter(c -> c.name().equals(name)).findFirst().orElseThrow();
    }

    private void fibre(Steps steps, String what, Extreme stress, boolean top) {
        CombinationResult c = combination(stress.combination());
        double x = stress.at();
        int element = result.model().elementAt(x);
        var field = c.response().moment();
        double m = field.piece(element).at(x - field.start(element));
        SectionProperties s = result.model().section(element);
        double cFibre = top ? s.cTop() : s.cBottom();
        Unit small = u.sectionLength();
        Unit stressUnit = us ? Units.of("psi") : Units.of("MPa");
        String conversion = us ? " × 12 [in/ft]" : " × 1e6 [N·mm per kN·m]";
        double sigma = (top ? -1 : 1) * m * cFibre / s.inertia();
        String fibre = top ? "top" : "bottom";
        String sense = m >= 0 ? "sagging" : "hogging";
        steps.add(what + ": " + fibre + " fibre at x = " + Steps.n(u.length().fromSi(x), Notation.sym(u.length())) + " under " + c.name()
                        + ", " + sense + " moment, section " + result.model().sectionId(element),
                "σ = " + (top ? "−" : "") + "M·c_" + fibre + " / I",
                "σ = " + (top ? "−" : "") + "(" + Steps.n(u.moment().fromSi(m), Notation.sym(u.moment())) + conversion + ") × "
                        + Steps.n(small.fromSi(cFibre), Notation.sym(small)) + " / " + Steps.n(u.secondMoment().fromSi(s.inertia()),
                        Notation.sym(u.secondMoment())),
                stressUnit.fromSi(sigma), Notation.sym(stressUnit), "flexure formula, elementary beam theory (plane sections)");
    }

    private void shear(Steps steps, Extreme tau) {
        CombinationResult c = combination(tau.combination());
        double x = tau.at();
        int element = result.model().elementAt(x);
        var field = c.response().shear();
        double v = field.piece(element).at(x - field.start(element));
        SectionProperties s = result.model().section(element);
        double q = s.qNeutral();
        double width = s.tNeutral();
        String where = "the neutral axis";
        for (SectionProperties.Junction j : s.junctions()) {
            if (Math.abs(j.q()) / j.width() > q / width) {
                q = Math.abs(j.q());
                width = j.width();
                where = "the junction " + Steps.n(u.sectionLength().fromSi(j.height()), Notation.sym(u.sectionLength())) + " above the bottom";
            }
        }
        Unit force = us ? Units.of("lb") : Units.of("N");
        Unit stressUnit = us ? Units.of("psi") : Units.of("MPa");
        steps.add("Largest shear stress: at " + where + ", x = " + Steps.n(u.length().fromSi(x), Notation.sym(u.length())) + " under " + c.name(),
                "τ = V·Q / (I·t)",
                "τ = " + Steps.n(force.fromSi(Math.abs(v)), Notation.sym(force)) + " × " + Steps.n(u.firstMoment().fromSi(q),
                        Notation.sym(u.firstMoment())) + " / (" + Steps.n(u.secondMoment().fromSi(s.inertia()), Notation.sym(u.secondMoment()))
                        + " × " + Steps.n(u.sectionLength().fromSi(width), Notation.sym(u.sectionLength())) + ")",
                stressUnit.fromSi(Math.abs(v) * q / (s.inertia() * width)), Notation.sym(stressUnit), "shear formula, elementary beam theory");
    }
}
