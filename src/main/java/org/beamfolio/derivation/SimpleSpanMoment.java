package org.beamfolio.derivation;

import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;
import org.beamfolio.analysis.Polynomial;
import org.beamfolio.model.Load;

/**
 * The free (simply supported) moment diagram M0 of one span under its own loads, exact as
 * polynomial pieces, with its simple-span reactions and the moment integrals of Clapeyron's
 * three-moment equation: 6 A a / L = (6 / L) * integral of M0 s ds and 6 A b / L =
 * (6 / L) * integral of M0 (L - s) ds, s measured from the span's left support.
 */
final class SimpleSpanMoment {
    final double length;
    final double leftReaction;
    final double rightReaction;
    private final List<double[]> ranges = new ArrayList<>();
    private final List<Polynomial> pieces = new ArrayList<>();

    SimpleSpanMoment(double from, double to, List<Load> loads) {
        length = to - from;
        double momentAboutLeft = 0;
        double total = 0;
        TreeSet<Double> cuts = new TreeSet<>(List.of(0.0, length));
        for (Load l : loads) {
            double f = FactoredLoads.force(l);
            total += f;
            momentAboutLeft += f * (FactoredLoads.position(l) - from) - FactoredLoads.couple(l);
            if (l instanceof Load.Distributed d) {
                cuts.add(d.from() - from);
                cuts.add(d.to() - from);
            } else {
                cuts.add(FactoredLoads.position(l) - from);
            }
        }
        rightReaction = momentAboutLeft / length;
        leftReaction = total - rightReaction;
        Double previous = null;
        for (double cut : cuts) {
            if (previous != null && cut > previous) {
                ranges.add(new double[] {previous, cut});
                pieces.add(pieceOn(previous, cut, from, loads));
            }
            previous = cut;
        }
    }

    /** M0(s) on [a, b] (s from the left support) as a polynomial in s. */
    private Polynomial pieceOn(double a, double b, double from, List<Load> loads) {
        double mid = 0.5 * (a + b);
        Polynomial s = Polynomial.of(0, 1);
        Polynomial m = s.times(leftReaction);
        for (Load l : loads) {
            if (l instanceof Load.Point p && p.at() - from < mid) {
                m = m.plus(s.plus(Polynomial.of(-(p.at() - from))).times(-p.P()));
            } else if (l instanceof Load.Couple c && c.at() - from < mid) {
                m = m.plus(Polynomial.of(-c.M()));
            } else if (l instanceof Load.Distributed d && d.from() - from < mid) {
                double s1 = d.from() - from;
                double s2 = d.to() - from;
                if (s2 <= a + 1e-15 * length) {
                    m = m.plus(s.plus(Polynomial.of(-(FactoredLoads.position(d) - from))).times(-d.resultant()));
                } else {
                    // inside the load: w0 d^2 / 2 + k d^3 / 6 with d = s - s1
                    double k = (d.wEnd() - d.wStart()) / (s2 - s1);
                    Polynomial dd = s.plus(Polynomial.of(-s1));
                    m = m.plus(dd.times(dd).times(-d.wStart() / 2)).plus(dd.times(dd).times(dd).times(-k / 6));
                }
            }
        }
        return m;
    }

    /** (6 / L) * integral over the span of M0(s) * weight(s), weight = s or L - s. */
    private double term(boolean fromLeft) {
        double sum = 0;
        for (int i = 0; i < pieces.size(); i++) {
            Polynomial weight = fromLeft ? Polynomial.of(0, 1) : Polynomial.of(length, -1);
            Polynomial integrand = pieces.get(i).times(weight);
            Polynomial antiderivative = integrand.integral(0);
            sum += antiderivative.at(ranges.get(i)[1]) - antiderivative.at(ranges.get(i)[0]);
        }
        return 6 * sum / length;
    }

    /** 6 A a / L, the centroid distance a measured from the left support: the term at the right support. */
    double termAtRight() {
        return term(true);
    }

    /** 6 A b / L, b measured from the right support: the term at the left support. */
    double termAtLeft() {
        return term(false);
    }
}
