package org.beamfolio.derivation;

import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.CombinationResult;
import org.beamfolio.analysis.Field;
import org.beamfolio.model.Load;
import org.beamfolio.units.Numbers;
import org.beamfolio.units.RoundOff;

/**
 * Shear and moment by the area method between key points: the change in shear over a stretch is
 * the load on it (minus its area), the change in moment the area of the shear diagram, and
 * point loads and reactions step the shear. Each point of zero shear inside a stretch is located
 * by its own equation. The table lets a reviewer re-add the diagram.
 */
final class AreaMethod {
    private static final int ROWS = 40;

    private final AnalysisResult result;
    private final CombinationResult combination;
    private final List<Load> loads;
    private final Notation n;
    private final Steps steps;
    private final List<Double> points;

    AreaMethod(AnalysisResult result, CombinationResult combination, List<Load> loads, Notation n, Steps steps) {
        this.result = result;
        this.combination = combination;
        this.loads = loads;
        this.n = n;
        this.steps = steps;
        TreeSet<Double> xs = new TreeSet<>();
        xs.add(0.0);
        xs.add(result.job().beam().length());
        result.job().beam().supports().forEach(s -> xs.add(s.at()));
        result.job().beam().hinges().forEach(h -> xs.add(h.at()));
        for (Load l : loads) {
            xs.addAll(l.positions());
        }
        xs.addAll(combination.response().shear().zeroesInside());
        points = new ArrayList<>(xs);
    }

    /** Downward line load intensity just right of x, and its slope (the sum of the loads there). */
    private double[] intensity(double x) {
        double w = 0;
        double k = 0;
        for (Load l : loads) {
            if (l instanceof Load.Distributed d && x >= d.from() && x < d.to()) {
                w += d.intensityAt(x);
                k += (d.wEnd() - d.wStart()) / (d.to() - d.from());
            }
        }
        return new double[] {w, k};
    }

    /** A step for each point of zero shear: V1 - w s - k s^2 / 2 = 0 from the key point before it. */
    void zeroShearSteps() {
        Field v = combination.response().shear();
        for (double x0 : v.zeroesInside()) {
            double x1 = points.stream().filter(p -> p < x0).mapToDouble(Double::doubleValue).max().orElse(0);
            double v1 = v.at(x1);
            double[] wk = intensity(x1);
            double s;
            String symbolic;
            String substituted;
            if (Math.abs(wk[1]) < 1e-12 * Math.max(1, Math.abs(wk[0]))) {
                s = v1 / wk[0];
                symbolic = "V1 − w s = 0:  x = x1 + V1 / w";
                substituted = "x = " + Steps.n(n.x(x1), n.xu()) + " + " + Steps.n(n.f(v1), n.fu()) + " / " + Steps.n(n.w(wk[0]), n.wu());
            } else {
                s = (-wk[0] + Math.sqrt(wk[0] * wk[0] + 2 * wk[1] * v1)) / wk[1];
                symbolic = "V1 − w1 s − k s² / 2 = 0:  s = (−w1 + √(w1² + 2 k V1)) / k";
                substituted = "V1 = " + Steps.n(n.f(v1), n.fu()) + ", w1 = " + Steps.n(n.w(wk[0]), n.wu()) + ", k = "
                        + Steps.n(n.w(wk[1]) / n.x(1), n.wu() + " per " + n.xu()) + ", x1 = " + Steps.n(n.x(x1), n.xu());
            }
            steps.add("Point of zero shear after x = " + Steps.n(n.x(x1), n.xu()) + " (a largest moment is there)",
                    symbolic, substituted, n.x(x1 + s), n.xu(), "dV/dx = −w (equilibrium of a beam element)");
        }
    }

    List<String> header() {
        String f = n.fu();
        String m = n.mu();
        return List.of("From (" + n.xu() + ")", "To (" + n.xu() + ")", "Step in V at From (" + f + ")", "V just right (" + f + ")",
                "− load on stretch (" + f + ")", "V just left of To (" + f + ")", "M at From (" + m + ")", "+ area of V (" + m + ")",
                "M at To (" + m + ")");
    }

    List<List<String>> rows() {
        Field v = combination.response().shear();
        Field moment = combination.response().moment();
        double vScale = Math.max(Math.abs(v.max().value()), Math.abs(v.min().value()));
        double mScale = Math.max(Math.abs(moment.max().value()), Math.abs(moment.min().value()));
        List<List<String>> rows = new ArrayList<>();
        for (int i = 0; i + 1 < points.size() && rows.size() < ROWS; i++) {
            double a = points.get(i);
            double b = points.get(i + 1);
            double step = a == 0 ? v.at(a) : v.at(a) - v.leftOf(a);
            double vRight = v.at(a);
            double vLeft = v.leftOf(b);
            double area = shearArea(v, a, b);
            double mA = moment.at(a);
            rows.add(List.of(Numbers.format(n.x(a)), Numbers.format(n.x(b)), fmt(n.f(step), n.f(vScale)), fmt(n.f(vRight), n.f(vScale)),
                    fmt(n.f(vLeft - vRight), n.f(vScale)), fmt(n.f(vLeft), n.f(vScale)), fmt(n.m(mA), n.m(mScale)),
                    fmt(n.m(area), n.m(mScale)), fmt(n.m(mA + area), n.m(mScale))));
        }
        return rows;
    }

    /** The exact area of the shear diagram from a to b, integrating each element's polynomial. */
    static double shearArea(Field v, double a, double b) {
        double area = 0;
        for (int i = 0; i < v.size(); i++) {
            double lo = Math.max(a, v.start(i));
            double hi = Math.min(b, v.end(i));
            if (hi > lo) {
                var integral = v.piece(i).integral(0);
                area += integral.at(hi - v.start(i)) - integral.at(lo - v.start(i));
            }
        }
        return area;
    }

    private static String fmt(double value, double scale) {
        return Numbers.format(RoundOff.clean(value, scale));
    }
}
