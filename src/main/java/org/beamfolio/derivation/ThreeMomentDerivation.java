package org.beamfolio.derivation;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealVector;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.Spans;
import org.beamfolio.model.Load;
import org.beamfolio.model.Support;
import org.beamfolio.model.SupportKind;

/**
 * Continuous beams on rigid supports with constant EI, by Clapeyron's three-moment equation
 * (e.g. Timoshenko and Young, Theory of Structures, the three-moment equation for continuous
 * beams): at each interior support j between spans j and j+1,
 * M_{j-1} L_j + 2 M_j (L_j + L_{j+1}) + M_{j+1} L_{j+1} = -6 A_j a_j / L_j - 6 A_{j+1} b_{j+1} / L_{j+1},
 * with A the area of a span's free moment diagram and a, b its centroid's distances from the
 * span's left and right supports. A fixed end is a support beside an imaginary span of zero
 * length; an overhang gives its support a known moment. The support moments then give the span
 * end forces, F_left = R0_left + (M_right - M_left) / L, and the reactions.
 */
final class ThreeMomentDerivation {
    private final AnalysisResult result;
    private final List<Load> loads;
    private final Notation n;
    private final Steps steps;

    ThreeMomentDerivation(AnalysisResult result, List<Load> loads, Notation n, Steps steps) {
        this.result = result;
        this.loads = loads;
        this.n = n;
        this.steps = steps;
    }

    /** Support moments (internal, sagging positive) and reactions, SI: what the tests compare with the solver. */
    record Solution(double[] supportMoments, double[] reactions) {}

    private Solution solution;

    Solution solution() {
        return solution;
    }

    String write() {
        List<Support> supports = result.job().beam().supports();
        int count = supports.size();
        double length = result.job().beam().length();
        List<Load> leftOverhang = supports.get(0).at() > 0 ? Spans.within(loads, 0, supports.get(0).at(), false) : List.of();
        List<Load> rightOverhang = supports.get(count - 1).at() < length
                ? Spans.within(loads, supports.get(count - 1).at(), length, true) : List.of();
        steps.note("Method: Clapeyron's three-moment equation for a continuous beam on rigid supports with constant EI. "
                + "Unknowns are the bending moments M_j over the supports (sagging positive, so hogging moments come out negative); "
                + "a pinned or roller end carries no moment unless an overhang gives it one; a fixed end is written against an "
                + "imaginary span of zero length.", "three-moment equation (Clapeyron)");
        int spans = count - 1;
        SimpleSpanMoment[] free = new SimpleSpanMoment[spans];
        double[] lengths = new double[spans];
        List<Integer> termSteps = new ArrayList<>();
        for (int i = 0; i < spans; i++) {
            double a = supports.get(i).at();
            double b = supports.get(i + 1).at();
            lengths[i] = b - a;
            free[i] = new SimpleSpanMoment(a, b, Spans.within(loads, a, b, false));
            // the load term carries force x length^2, i.e. moment x length
            termSteps.add(steps.add("Span " + (i + 1) + ": load terms of the free moment diagram, L = " + Steps.n(n.x(lengths[i]), n.xu()),
                    "6Aa/L = (6/L) ∫ M0(s) s ds ;  6Ab/L = (6/L) ∫ M0(s) (L − s) ds",
                    "6Aa/L = " + Steps.n(n.m(free[i].termAtRight()) * n.x(1), n.mu() + "·" + n.xu())
                            + " ;  6Ab/L = " + Steps.n(n.m(free[i].termAtLeft()) * n.x(1), n.mu() + "·" + n.xu()),
                    n.m(free[i].termAtRight()) * n.x(1), n.mu() + "·" + n.xu(), "exact integration of the span's simple-beam moment diagram"));
        }
        Double[] known = new Double[count];
        for (int j = 0; j < count; j++) {
            if (!(supports.get(j).kind() instanceof SupportKind.Fixed) && (j == 0 || j == count - 1)) {
                known[j] = 0.0;
            }
        }
        if (supports.get(0).at() > 0) {
            known[0] = overhangMoment(leftOverhang, supports.get(0).at(), true);
            steps.add("Moment over the first support from the left overhang (statics of the overhang)", "M_1 = −Σ[F (x_1 − x) ] − ΣM_ccw",
                    "M_1 = " + Steps.n(n.m(known[0]), n.mu()), n.m(known[0]), n.mu(), "statics of the overhang");
        }
        if (supports.get(count - 1).at() < length) {
            known[count - 1] = overhangMoment(rightOverhang, supports.get(count - 1).at(), false);
            steps.add("Moment over the last support from the right overhang (statics of the overhang)", "M_n = −Σ[F (x − x_n)] + ΣM_ccw",
                    "M_n = " + Steps.n(n.m(known[count - 1]), n.mu()), n.m(known[count - 1]), n.mu(), "statics of the overhang");
        }
        List<Integer> unknown = new ArrayList<>();
        for (int j = 0; j < count; j++) {
            if (known[j] == null) {
                unknown.add(j);
            }
        }
        double[] moments = new double[count];
        for (int j = 0; j < count; j++) {
            moments[j] = known[j] == null ? 0 : known[j];
        }
        if (!unknown.isEmpty()) {
            int size = unknown.size();
            double[][] a = new double[size][size];
            double[] rhs = new double[size];
            List<String> lines = new ArrayList<>();
            for (int row = 0; row < size; row++) {
                int j = unknown.get(row);
                double[] coefficient = new double[count];
                double right;
                if (j == 0) {
                    coefficient[0] = 2 * lengths[0];
                    coefficient[1] = lengths[0];
                    right = -free[0].termAtLeft();
                } else if (j == count - 1) {
                    coefficient[j - 1] = lengths[j - 1];
                    coefficient[j] = 2 * lengths[j - 1];
                    right = -free[j - 1].termAtRight();
                } else {
                    coefficient[j - 1] = lengths[j - 1];
                    coefficient[j] = 2 * (lengths[j - 1] + lengths[j]);
                    coefficient[j + 1] = lengths[j];
                    right = -free[j - 1].termAtRight() - free[j].termAtLeft();
                }
                List<String> lhs = new ArrayList<>();
                for (int k = 0; k < count; k++) {
                    if (coefficient[k] == 0) {
                        continue;
                    }
                    if (known[k] != null) {
                        right -= coefficient[k] * known[k];
                    } else {
                        a[row][unknown.indexOf(k)] = coefficient[k];
                    }
                    lhs.add(Steps.n(n.x(coefficient[k]), n.xu()) + " M" + (k + 1));
                }
                rhs[row] = right;
                lines.add(String.join(" + ", lhs) + " = " + Steps.n(n.m(right) * n.x(1), n.mu() + "·" + n.xu()));
            }
            RealVector x = new LUDecomposition(new Array2DRowRealMatrix(a)).getSolver().solve(new ArrayRealVector(rhs));
            for (int row = 0; row < size; row++) {
                moments[unknown.get(row)] = x.getEntry(row);
            }
            steps.add("The three-moment equations, one per unknown support moment (known moments moved to the right)",
                    "M_{j-1} L_j + 2 M_j (L_j + L_{j+1}) + M_{j+1} L_{j+1} = −6A_j a_j/L_j − 6A_{j+1} b_{j+1}/L_{j+1}",
                    String.join(" ;  ", lines), Double.NaN, "", "three-moment equation (Clapeyron)",
                    termSteps.toArray(Integer[]::new));
            for (int row = 0; row < size; row++) {
                int j = unknown.get(row);
                steps.add("Support moment M" + (j + 1) + " at " + Steps.n(n.x(supports.get(j).at()), n.xu()) + ", solving the system",
                        "M" + (j + 1), "M" + (j + 1) + " = " + Steps.n(n.m(moments[j]), n.mu()), n.m(moments[j]), n.mu(),
                        "linear solution of the equations above (LU decomposition)");
            }
        }
        double[] reactions = new double[count];
        for (int i = 0; i < spans; i++) {
            double shift = (moments[i + 1] - moments[i]) / lengths[i];
            double left = free[i].leftReaction + shift;
            double right = free[i].rightReaction - shift;
            reactions[i] += left;
            reactions[i + 1] += right;
            steps.add("Span " + (i + 1) + ": end forces from the simple-span reactions and the support moments",
                    "F_left = R0_left + (M_right − M_left)/L ;  F_right = R0_right − (M_right − M_left)/L",
                    "F_left = " + Steps.n(n.f(free[i].leftReaction), n.fu()) + " + (" + Steps.n(n.m(moments[i + 1]), n.mu()) + " − "
                            + Steps.n(n.m(moments[i]), n.mu()) + ") / " + Steps.n(n.x(lengths[i]), n.xu())
                            + " ;  F_right = " + Steps.n(n.f(free[i].rightReaction), n.fu()) + " − (" + Steps.n(n.m(moments[i + 1]), n.mu())
                            + " − " + Steps.n(n.m(moments[i]), n.mu()) + ") / " + Steps.n(n.x(lengths[i]), n.xu()),
                    n.f(left), n.fu(), "statics of the span as a free body");
        }
        reactions[0] += new LoadTerms(leftOverhang, n).totalForce();
        reactions[count - 1] += new LoadTerms(rightOverhang, n).totalForce();
        for (int j = 0; j < count; j++) {
            steps.add("Reaction R" + (j + 1) + " at " + Steps.n(n.x(supports.get(j).at()), n.xu()),
                    "R = F_right of the span to the left + F_left of the span to the right (+ the overhang's load)",
                    "R" + (j + 1) + " = " + Steps.n(n.f(reactions[j]), n.fu()), n.f(reactions[j]), n.fu(), "statics at the support");
        }
        solution = new Solution(moments, reactions);
        return "Three-moment equation (Clapeyron) for a continuous beam";
    }

    /** The moment over the support at x0 from the loads on an overhang beyond it (sagging positive). */
    private static double overhangMoment(List<Load> overhang, double x0, boolean left) {
        double m = 0;
        for (Load l : overhang) {
            double f = FactoredLoads.force(l);
            double x = FactoredLoads.position(l);
            m += left ? -f * (x0 - x) - FactoredLoads.couple(l) : -f * (x - x0) + FactoredLoads.couple(l);
        }
        return m;
    }
}
