package org.beamfolio.analysis;

import java.util.ArrayList;
import java.util.List;

/**
 * Real roots of a polynomial on a closed interval, to machine precision. Roots of the derivative
 * split the interval into pieces on which the polynomial is monotone (found the same way, one
 * degree down); each piece whose ends differ in sign holds exactly one root, found by bisection.
 */
public final class Roots {
    private Roots() {}

    public static List<Double> in(Polynomial p, double a, double b) {
        List<Double> roots = new ArrayList<>();
        if (p.degree() == 0 || clearOfZero(p, a, b)) {
            return roots;
        }
        if (p.degree() == 1) {
            add(roots, -p.coefficient(0) / p.coefficient(1), a, b);
            return roots;
        }
        if (p.degree() == 2) {
            quadratic(p.coefficient(2), p.coefficient(1), p.coefficient(0), a, b, roots);
            return roots;
        }
        List<Double> breaks = new ArrayList<>();
        breaks.add(a);
        breaks.addAll(in(p.derivative(), a, b));
        breaks.add(b);
        for (int i = 0; i + 1 < breaks.size(); i++) {
            double lo = breaks.get(i);
            double hi = breaks.get(i + 1);
            double flo = p.at(lo);
            double fhi = p.at(hi);
            if (flo == 0) {
                addDistinct(roots, lo);
            } else if (fhi != 0 && Math.signum(flo) != Math.signum(fhi)) {
                addDistinct(roots, bisect(p, lo, hi, flo));
            }
            if (fhi == 0 && i + 2 == breaks.size()) {
                addDistinct(roots, hi);
            }
        }
        return roots;
    }

    /**
     * True when |p| cannot reach zero on [a, b]: |c0| exceeds the sum of |c_k| m^k over k >= 1,
     * m the larger of |a| and |b|. Most pieces of a beam field are settled by this test alone.
     */
    private static boolean clearOfZero(Polynomial p, double a, double b) {
        double m = Math.max(Math.abs(a), Math.abs(b));
        double bound = 0;
        double power = 1;
        for (int k = 1; k <= p.degree(); k++) {
            power *= m;
            bound += Math.abs(p.coefficient(k)) * power;
        }
        return Math.abs(p.coefficient(0)) > bound * (1 + 1e-12);
    }

    /** Real roots of a x^2 + b x + c in [lo, hi], by the cancellation-free form of the formula. */
    private static void quadratic(double a, double b, double c, double lo, double hi, List<Double> roots) {
        double disc = b * b - 4 * a * c;
        if (disc < 0) {
            return;
        }
        double q = -0.5 * (b + Math.copySign(Math.sqrt(disc), b));
        double r1 = q / a;
        double r2 = q != 0 ? c / q : r1;
        double first = Math.min(r1, r2);
        double second = Math.max(r1, r2);
        add(roots, first, lo, hi);
        if (second != first) {
            add(roots, second, lo, hi);
        }
    }

    /**
     * A root in a bracket where the polynomial is monotone: Newton steps kept inside the
     * bracket, falling back to halving, until the bracket or the step vanishes.
     */
    private static double bisect(Polynomial p, double lo, double hi, double flo) {
        Polynomial dp = p.derivative();
        double x = 0.5 * (lo + hi);
        for (int i = 0; i < 200 && hi - lo > 0; i++) {
            double fx = p.at(x);
            if (fx == 0) {
                return x;
            }
            if (Math.signum(fx) == Math.signum(flo)) {
                lo = x;
                flo = fx;
            } else {
                hi = x;
            }
            double slope = dp.at(x);
            double next = slope != 0 ? x - fx / slope : Double.NaN;
            if (!(next > lo && next < hi)) {
                next = 0.5 * (lo + hi);
            }
            if (next == x || next <= lo || next >= hi) {
                break;
            }
            if (Math.abs(next - x) <= 1e-16 * Math.max(Math.abs(lo), Math.abs(hi))) {
                return next;
            }
            x = next;
        }
        return x;
    }

    private static void add(List<Double> roots, double r, double a, double b) {
        if (r >= a && r <= b) {
            roots.add(r);
        }
    }

    private static void addDistinct(List<Double> roots, double r) {
        if (roots.isEmpty() || roots.get(roots.size() - 1) != r) {
            roots.add(r);
        }
    }
}
