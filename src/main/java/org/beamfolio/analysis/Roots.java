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
        if (p.degree() == 0) {
            return roots;
        }
        if (p.degree() == 1) {
            add(roots, -p.coefficient(0) / p.coefficient(1), a, b);
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

    private static double bisect(Polynomial p, double lo, double hi, double flo) {
        for (int i = 0; i < 200 && hi - lo > 0; i++) {
            double mid = 0.5 * (lo + hi);
            if (mid <= lo || mid >= hi) {
                break;
            }
            double fm = p.at(mid);
            if (fm == 0) {
                return mid;
            }
            if (Math.signum(fm) == Math.signum(flo)) {
                lo = mid;
                flo = fm;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
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
