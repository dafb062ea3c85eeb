package org.beamfolio.derivation;

import java.util.ArrayList;
import java.util.List;
import org.beamfolio.model.Load;

/**
 * The loads of a combination as terms of the equilibrium equations: each load's resultant and
 * where it acts, written out term by term when there are few, summed when there are many.
 */
final class LoadTerms {
    static final int WRITTEN_OUT = 12;

    private final List<Load> loads;
    private final Notation n;

    LoadTerms(List<Load> loads, Notation n) {
        this.loads = loads;
        this.n = n;
    }

    boolean writtenOut() {
        return loads.size() <= WRITTEN_OUT;
    }

    /** A step giving each line load's resultant and centroid; returns the step numbers used. */
    List<Integer> resultantSteps(Steps steps) {
        List<Integer> used = new ArrayList<>();
        if (!writtenOut()) {
            return used;
        }
        int i = 1;
        for (Load l : loads) {
            if (l instanceof Load.Distributed d && d.resultant() != 0) {
                used.add(steps.add("Resultant of line load " + i + " (" + d.loadCase() + ", as combined), from " + Steps.n(n.x(d.from()), n.xu())
                                + " to " + Steps.n(n.x(d.to()), n.xu()),
                        "F = (w1 + w2) / 2 × (x2 − x1), acting at x = x1 + (x2 − x1)(w1 + 2 w2) / (3 (w1 + w2))",
                        "F = (" + Steps.n(n.w(d.wStart()), n.wu()) + " + " + Steps.n(n.w(d.wEnd()), n.wu()) + ") / 2 × ("
                                + Steps.n(n.x(d.to()), n.xu()) + " − " + Steps.n(n.x(d.from()), n.xu()) + ")",
                        n.f(d.resultant()), n.fu(), "resultant of a trapezoidal load (statics)"));
            }
            i++;
        }
        return used;
    }

    double totalForce() {
        return loads.stream().mapToDouble(FactoredLoads::force).sum();
    }

    /** Sum of F (x - x0) minus the counter-clockwise couples: the loads' clockwise moment about x0. */
    double momentAbout(double x0) {
        double sum = 0;
        for (Load l : loads) {
            sum += FactoredLoads.force(l) * (FactoredLoads.position(l) - x0) - FactoredLoads.couple(l);
        }
        return sum;
    }

    String forceSum() {
        if (!writtenOut()) {
            return "ΣF of the " + loads.size() + " loads of the combination (each case times its factor)";
        }
        List<String> terms = new ArrayList<>();
        for (Load l : loads) {
            if (!(l instanceof Load.Couple)) {
                terms.add(Steps.n(n.f(FactoredLoads.force(l)), n.fu()));
            }
        }
        return terms.isEmpty() ? "0" : String.join(" + ", terms);
    }

    /** The terms of F (x - x0) - M, in report units, each with its lever arm. */
    String momentSum(double x0) {
        if (!writtenOut()) {
            return "Σ[F (x − x0) − M] of the " + loads.size() + " loads of the combination (each case times its factor)";
        }
        List<String> terms = new ArrayList<>();
        for (Load l : loads) {
            if (l instanceof Load.Couple c) {
                terms.add("− " + Steps.n(n.m(c.M()), n.mu()));
            } else {
                terms.add("+ " + Steps.n(n.f(FactoredLoads.force(l)), n.fu()) + " × " + Steps.n(n.x(FactoredLoads.position(l) - x0), n.xu()));
            }
        }
        String joined = String.join(" ", terms);
        return joined.startsWith("+ ") ? joined.substring(2) : "0 " + joined;
    }
}
