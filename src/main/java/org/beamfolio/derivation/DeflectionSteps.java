package org.beamfolio.derivation;

import java.util.ArrayList;
import java.util.List;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.CombinationResult;
import org.beamfolio.analysis.Extreme;
import org.beamfolio.analysis.Field;
import org.beamfolio.analysis.Polynomial;
import org.beamfolio.analysis.Response;
import org.beamfolio.model.Load;
import org.beamfolio.model.Material;
import org.beamfolio.model.Support;
import org.beamfolio.units.ReportUnits;
import org.beamfolio.units.Unit;
import org.beamfolio.units.Units;

/**
 * Deflections a reviewer can follow. For a simple span carrying only full-length uniform loads
 * and point loads (and constant EI), the deflection at the middle by the handbook closed forms
 * added by superposition: 5 w L^4 / (384 E I) for the uniform load and P b (3 L^2 - 4 b^2) /
 * (48 E I) for a point load b from the nearer support (common practice; e.g. AISC Steel
 * Construction Manual, Table 3-23, cases 1 and 8). Elsewhere, and for the largest deflection of
 * every region, the elastic curve EI v'' = -M integrated twice over the element that holds the
 * point, with its two integration constants from the solution at the element's start. The
 * working is in the section's units (in, lb / mm, N) so the deflection comes out in in or mm.
 * Every result is the exact elastic curve's value, the one the diagrams and checks print.
 */
final class DeflectionSteps {
    private final AnalysisResult result;
    private final CombinationResult combination;
    private final List<Load> loads;
    private final Notation n;
    private final Steps steps;
    private final Unit small;
    private final Unit force;
    private final Unit stress;
    private final Unit perLength;
    private final Unit secondMoment;
    private final String d;

    DeflectionSteps(AnalysisResult result, CombinationResult combination, List<Load> loads, Notation n, Steps steps) {
        this.result = result;
        this.combination = combination;
        this.loads = loads;
        this.n = n;
        this.steps = steps;
        ReportUnits u = ReportUnits.of(result.job().report().units());
        boolean us = u.us();
        small = u.sectionLength();
        force = us ? Units.of("lb") : Units.of("N");
        stress = us ? Units.of("psi") : Units.of("MPa");
        perLength = us ? Units.of("lb/in") : Units.of("N/mm");
        secondMoment = u.secondMoment();
        d = Notation.sym(n.deflection);
    }

    void write() {
        Response r = combination.response();
        Field deflection = r.deflection();
        for (AnalysisResult.Span span : result.spans()) {
            double mid = 0.5 * (span.from() + span.to());
            if (!closedForm(span, mid, deflection.at(mid))) {
                steps.note("Deflection in " + span.label() + ": no closed form covers this loading and support, so the elastic curve is "
                        + "integrated below at the point of the largest deflection", "exact integration of the elastic curve");
            }
            Extreme worst = deflection.largestWithin(span.from(), span.to());
            elasticCurve("Largest deflection in " + span.label() + ", where the slope is zero (a root of the slope polynomial) or at an end",
                    worst.at(), span);
        }
    }

    /** The handbook closed forms at the middle of a simple span, when they apply. */
    private boolean closedForm(AnalysisResult.Span span, double mid, double value) {
        List<Support> supports = result.job().beam().supports();
        if (Derivations.methodFor(result) != Derivations.Method.STATICS || span.overhang()
                || supports.get(0).at() != span.from() || supports.get(1).at() != span.to()) {
            return false;
        }
        int first = result.model().elementAt(span.from());
        int last = result.model().elementAt(Math.nextDown(span.to()));
        for (int e = first; e <= last; e++) {
            if (result.model().ei(e) != result.model().ei(first)) {
                return false;
            }
        }
        double length = span.to() - span.from();
        List<String> uniform = new ArrayList<>();
        List<String> points = new ArrayList<>();
        for (Load load : loads) {
            if (load instanceof Load.Distributed w && w.uniform() && w.from() == span.from() && w.to() == span.to()) {
                uniform.add(Steps.n(perLength.fromSi(w.wStart()), Notation.sym(perLength)));
            } else if (load instanceof Load.Point p && p.at() > span.from() && p.at() < span.to()) {
                double b = Math.min(p.at() - span.from(), span.to() - p.at());
                String bText = Steps.n(small.fromSi(b), Notation.sym(small));
                points.add(Steps.n(force.fromSi(p.P()), Notation.sym(force)) + " × " + bText + " × (3 × " + lengthText(length) + "² − 4 × "
                        + bText + "²)");
            } else if (load.force() != 0 || load.couple() != 0) {
                return false;
            }
        }
        Material m = result.job().materials().get(result.model().materialId(first));
        String ei = Steps.n(stress.fromSi(m.elasticModulus()), Notation.sym(stress)) + " × "
                + Steps.n(secondMoment.fromSi(result.model().section(first).inertia()), Notation.sym(secondMoment));
        List<String> symbolic = new ArrayList<>();
        List<String> numbers = new ArrayList<>();
        if (!uniform.isEmpty()) {
            symbolic.add("5 w L⁴ / (384 E I)");
            numbers.add("5 × (" + String.join(" + ", uniform) + ") × " + lengthText(length) + "⁴ / (384 × " + ei + ")");
        }
        if (!points.isEmpty()) {
            symbolic.add("Σ P b (3 L² − 4 b²) / (48 E I)");
            numbers.add("[" + String.join(" + ", points) + "] / (48 × " + ei + ")");
        }
        if (symbolic.isEmpty()) {
            return false;
        }
        steps.add("Deflection at the middle of " + span.label() + " (x = " + Steps.n(n.x(mid), n.xu()) + "), simple span, by superposition of "
                        + "closed forms (w: the full-length uniform loads; P: each point load, b from the nearer support)",
                "δ = " + String.join(" + ", symbolic), "δ = " + String.join(" + ", numbers), n.deflection.fromSi(value), d,
                "simple-beam closed forms, common practice (e.g. AISC Steel Construction Manual Table 3-23, cases 1 and 8)");
        return true;
    }

    private String lengthText(double metres) {
        return Steps.n(small.fromSi(metres), Notation.sym(small));
    }

    /**
     * The elastic curve over the element holding x (the one to its left at a node): EI v'' = -M(s),
     * so EI v(s) = C2 + C1 s - J(s), J the double integral of M from the element's start, C1 = EI
     * v'(0) = -EI theta_A and C2 = EI v(0) from the solution.
     */
    private void elasticCurve(String statement, double x, AnalysisResult.Span span) {
        Response r = combination.response();
        int e = result.model().elementAt(x);
        Field deflection = r.deflection();
        if (x == deflection.start(e) && e > 0 && deflection.start(e) > span.from()) {
            e = e - 1;
        }
        double start = deflection.start(e);
        double sSi = x - start;
        double ei = result.model().ei(e);
        double fF = force.fromSi(1);
        double fL = small.fromSi(1);
        Polynomial m = r.moment().piece(e);
        // M(s) in the section's units: coefficient k in force * length^(1 - k)
        double[] c = new double[m.degree() + 1];
        for (int k = 0; k <= m.degree(); k++) {
            c[k] = m.coefficient(k) * fF * Math.pow(fL, 1 - k);
        }
        double s = sSi * fL;
        String sText = Steps.n(s, Notation.sym(small));
        String mu = Notation.sym(force) + "·" + Notation.sym(small);
        String l = Notation.sym(small);
        String eiUnit = Notation.sym(force) + "·" + l + "²";
        List<String> poly = new ArrayList<>();
        List<String> polySym = new ArrayList<>();
        List<String> integral = new ArrayList<>();
        String[] powers = {"²", "³", "⁴", "⁵", "⁶", "⁷"};
        for (int k = 0; k < c.length; k++) {
            if (c[k] == 0) {
                continue;
            }
            String coefficient = plain(c[k]);
            poly.add(coefficient + (k == 0 ? "" : " s" + (k == 1 ? "" : powers[k - 2])));
            polySym.add("m" + k + " s" + powers[k] + " / " + ((k + 1) * (k + 2)));
            integral.add("(" + coefficient + ") × " + sText + powers[k] + " / " + ((k + 1) * (k + 2)));
        }
        double j = 0;
        for (int k = c.length - 1; k >= 0; k--) {
            j += c[k] * Math.pow(s, k + 2) / ((k + 1) * (k + 2));
        }
        double eiShown = ei * fF * fL * fL;
        double theta = r.slope().piece(e).at(0);
        double v0 = r.deflection().piece(e).at(0) * fL;
        double c1 = -eiShown * theta;
        double c2 = eiShown * v0;
        String element = "element from x = " + Steps.n(n.x(start), n.xu()) + " to " + Steps.n(n.x(deflection.end(e)), n.xu());
        int moment = steps.note(statement + ": x = " + Steps.n(n.x(x), n.xu()) + ", in the " + element + ", s = x − x_A = " + sText
                + ". There M(s) = " + (poly.isEmpty() ? "0" : String.join(" + ", poly).replace("+ -", "− ")) + " [" + mu
                + ", s in " + l + "], and EI v'' = −M(s) (v down positive) with EI = " + Steps.n(eiShown, eiUnit) + ".",
                "Euler-Bernoulli beam theory");
        int integrated = steps.add("Moment integrated twice from the element's start",
                "J = ∫∫M ds ds = " + (polySym.isEmpty() ? "0" : String.join(" + ", polySym)),
                "J = " + (integral.isEmpty() ? "0" : String.join(" + ", integral)), j, Notation.sym(force) + "·" + l + "³",
                "exact integration of a polynomial", moment);
        int first = steps.add("First integration constant, from the solved rotation at the element's start",
                "C1 = EI v'(x_A) = −EI θ_A", "C1 = −" + Steps.n(eiShown, eiUnit) + " × " + Steps.n(theta, "rad"), c1, eiUnit,
                "solution of the stiffness equations (the rotation at the node)", moment);
        int second = steps.add("Second integration constant, from the solved deflection at the element's start",
                "C2 = EI v(x_A) = EI δ_A", "C2 = " + Steps.n(eiShown, eiUnit) + " × " + Steps.n(v0, l), c2, Notation.sym(force) + "·" + l + "³",
                "solution of the stiffness equations (the deflection at the node)", moment);
        double value = n.deflection.fromSi(deflection.piece(e).at(sSi));
        steps.add("Deflection at x = " + Steps.n(n.x(x), n.xu()), "δ = v(s) = (C2 + C1 s − J) / EI",
                "δ = (" + Steps.n(c2, "") + " + " + Steps.n(c1, "") + " × " + sText + " − " + Steps.n(j, "") + ") / " + Steps.n(eiShown, eiUnit),
                value, d, "elastic curve, Euler-Bernoulli beam theory", integrated, first, second);
    }

    private static String plain(double v) {
        return org.beamfolio.units.Numbers.format(v);
    }
}
