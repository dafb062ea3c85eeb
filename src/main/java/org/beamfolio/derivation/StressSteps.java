package org.beamfolio.derivation;

import java.util.List;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.GoverningStresses;
import org.beamfolio.analysis.StressDemand;
import org.beamfolio.units.ReportUnits;
import org.beamfolio.section.SectionProperties;
import org.beamfolio.units.Unit;

/**
 * The governing stresses worked out, from the same {@link GoverningStresses} the checks read (so
 * the worked result is the checked demand, to the bit): sigma = M c / I at the fibre of the
 * largest tension and of the largest compression, and tau = V Q / (I t) where the shear stress
 * governs, at the combination, position and side of a jump that govern, with the conversion of
 * the moment to the section's units shown (lb*ft to lb*in, kN*m to N*mm).
 */
public final class StressSteps {
    private final AnalysisResult result;
    private final ReportUnits u;
    private final boolean us;

    private StressSteps(AnalysisResult result) {
        this.result = result;
        this.u = ReportUnits.of(result.job().report().units());
        this.us = u.us();
    }

    public static List<Step> of(AnalysisResult result) {
        return new StressSteps(result).steps();
    }

    private List<Step> steps() {
        Steps steps = new Steps();
        GoverningStresses g = result.stresses();
        if (g.tension() != null) {
            fibre(steps, "Largest tension", g.tension(), g.service());
        }
        if (g.compression() != null) {
            fibre(steps, "Largest compression", g.compression(), g.service());
        }
        if (g.shear() != null) {
            shear(steps, g.shear(), g.service());
        }
        return steps.list();
    }

    /** Where the value is taken: at x, or just left or right of x where the field jumps (a couple, a point load). */
    private String place(StressDemand d) {
        String x = "x = " + Steps.n(u.length().fromSi(d.at()), Notation.sym(u.length()));
        return switch (d.side()) {
            case NONE -> "at " + x;
            case LEFT -> "just left of " + x;
            case RIGHT -> "just right of " + x;
        };
    }

    private String which(boolean service) {
        return service ? "" : " (no allowable-stress or service combination in the job: over every combination)";
    }

    private void fibre(Steps steps, String what, StressDemand d, boolean service) {
        if (d.demand() == 0) {
            steps.note(what + ": none, no fibre is in " + (d.kind() == StressDemand.Kind.TENSION ? "tension" : "compression")
                    + " under any combination compared with the allowables" + which(service), "statics");
            return;
        }
        boolean top = d.topFibre();
        double m = d.force();
        SectionProperties s = result.model().section(d.element());
        Unit small = u.sectionLength();
        String conversion = us ? " × 12 [in/ft]" : " × 1e6 [N·mm per kN·m]";
        String fibre = top ? "top" : "bottom";
        String sense = m >= 0 ? "sagging" : "hogging";
        steps.add(what + ": " + fibre + " fibre " + place(d) + " under " + d.combination().name() + ", " + sense
                        + " moment, section " + result.model().sectionId(d.element()) + which(service),
                "σ = " + (top ? "−" : "") + "M·c_" + fibre + " / I",
                "σ = " + (top ? "−" : "") + "(" + Steps.n(u.moment().fromSi(m), Notation.sym(u.moment())) + conversion + ") × "
                        + Steps.n(small.fromSi(d.lever()), Notation.sym(small)) + " / " + Steps.n(u.secondMoment().fromSi(s.inertia()),
                        Notation.sym(u.secondMoment())),
                u.stress().fromSi(d.stress()), Notation.sym(u.stress()), "flexure formula, elementary beam theory (plane sections)");
    }

    private void shear(Steps steps, StressDemand d, boolean service) {
        if (d.demand() == 0) {
            steps.note("Largest shear stress: none, there is no shear under any combination compared with the allowables" + which(service),
                    "statics");
            return;
        }
        SectionProperties s = result.model().section(d.element());
        String where = Double.isNaN(d.cutHeight()) ? "the neutral axis"
                : "the junction " + Steps.n(u.sectionLength().fromSi(d.cutHeight()), Notation.sym(u.sectionLength())) + " above the bottom";
        Unit force = us ? u.force() : org.beamfolio.units.Units.of("N"); // N with mm gives MPa
        steps.add("Largest shear stress: at " + where + ", " + place(d) + " under " + d.combination().name() + which(service),
                "τ = V·Q / (I·t)",
                "τ = " + Steps.n(force.fromSi(Math.abs(d.force())), Notation.sym(force)) + " × " + Steps.n(u.firstMoment().fromSi(d.lever()),
                        Notation.sym(u.firstMoment())) + " / (" + Steps.n(u.secondMoment().fromSi(s.inertia()), Notation.sym(u.secondMoment()))
                        + " × " + Steps.n(u.sectionLength().fromSi(d.width()), Notation.sym(u.sectionLength())) + ")",
                u.stress().fromSi(d.stress()), Notation.sym(u.stress()), "shear formula, elementary beam theory");
    }
}
