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
        double[] c = new double[p.degree() + 1];
        for (int k = 0; k < c.length; k++) {
            c[k] = p.coefficient(k);
        }
        double[] found = new double[c.length];
        int n = in(c, a, b, found);
        List<Double> roots = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            roots.add(found[i]);
        }
        return roots;
    }

    /**
     * The same on coefficients {@code c} (c0 first; trailing zeros allowed), without objects: the
     * roots go to {@code out} in ascending order (room for one more than the degree) and their count
     * is returned. Solvers call this for every piece of every combination.
     */
    static int in(double[] c, double a, double b, double[] out) {
        int degree = c.length - 1;
        while (degree > 0 && c[degree] == 0) {
            degree--;
        }
        return in(c, degree, a, b, out);
    }

    private static int in(double[] c, int degree, double a, double b, double[] out) {
        if (degree == 0 || clearOfZero(c, degree, a, b)) {
            return 0;
        }
        if (degree == 1) {
            return add(out, 0, -c[0] / c[1], a, b);
        }
        if (degree == 2) {
            return quadratic(c[2], c[1], c[0], a, b, out);
        }
        double[] slope = derivative(c, degree);
        double[] breaks = new double[degree + 2];
        breaks[0] = a;
        double[] innerRoots = new double[degree];
        int inner = in(slope, degree - 1, a, b, innerRoots);
        System.arraycopy(innerRoots, 0, breaks, 1, inner);
        breaks[inner + 1] = b;
        int size = inner + 2;
        int count = 0;
        for (int i = 0; i + 1 < size; i++) {
            double lo = breaks[i];
            double hi = breaks[i + 1];
            double flo = Polynomial.horner(c, 0, degree, lo);
            double fhi = Polynomial.horner(c, 0, degree, hi);
            if (flo == 0) {
                count = addDistinct(out, count, lo);
            } else if (fhi != 0 && Math.signum(flo) != Math.signum(fhi)) {
                count = addDistinct(out, count, bisect(c, degree, slope, lo, hi, flo));
            }
            if (fhi == 0 && i + 2 == size) {
                count = addDistinct(out, count, hi);
            }
        }
        return count;
    }

    private static double[] derivative(double[] c, int degree) {
        double[] d = new double[degree];
        for (int k = 1; k <= degree; k++) {
            d[k - 1] = k * c[k];
        }
        return d;
    }

    /**
     * True when |p| cannot reach zero on [a, b]: |c0| exceeds the sum of |c_k| m^k over k >= 1,
     * m the larger of |a| and |b|. Most pieces of a beam field are settled by this test alone.
     */
    private static boolean clearOfZero(double[] c, int degree, double a, double b) {
        double m = Math.max(Math.abs(a), Math.abs(b));
        double bound = 0;
        double power = 1;
        for (int k = 1; k <= degree; k++) {
            power *= m;
            bound += Math.abs(c[k]) * power;
        }
        return Math.abs(c[0]) > bound * (1 + 1e-12);
    }

    /** Real roots of a x^2 + b x + c in [lo, hi], by the cancellation-free form of the formula. */
    private static int quadratic(double a, double b, double c, double lo, double hi, double[] roots) {
        double disc = b * b - 4 * a * c;
        if (disc < 0) {
            return 0;
        }
        double q = -0.5 * (b + Math.copySign(Math.sqrt(disc), b));
        double r1 = q / a;
        double r2 = q != 0 ? c / q : r1;
        double first = Math.min(r1, r2);
        double second = Math.max(r1, r2);
        int count = add(roots, 0, first, lo, hi);
        if (second != first) {
            count = add(roots, count, second, lo, hi);
        }
        return count;
    }

    /**
     * A root in a bracket where the polynomial is monotone: Newton steps kept inside the
     * bracket, falling back to halving, until the bracket or the step vanishes.
     */
    private static double bisect(double[] c, int degree, double[] slope, double lo, double hi, double flo) {
        double x = 0.5 * (lo + hi);
        for (int i = 0; i < 200 && hi - lo > 0; i++) {
            double fx = Polynomial.horner(c, 0, degree, x);
            if (fx == 0) {
                return x;
            }
            if (Math.signum(fx) == Math.signum(flo)) {
                lo = x;
                flo = fx;
            } else {
                hi = x;
            }
            double gradient = Polynomial.horner(slope, 0, degree - 1, x);
            double next = gradient != 0 ? x - fx / gradient : Double.NaN;
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

    private static int add(double[] roots, int count, double r, double a, double b) {
        if (r >= a && r <= b) {
            roots[count++] = r;
        }
        return count;
    }

    private static int addDistinct(double[] roots, int count, double r) {
        if (count == 0 || roots[count - 1] != r) {
            roots[count++] = r;
        }
        return count;
    }
}
