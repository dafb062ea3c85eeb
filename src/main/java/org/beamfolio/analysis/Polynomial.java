package org.beamfolio.analysis;

import java.util.Arrays;

/** A real polynomial c0 + c1 s + c2 s^2 + ..., immutable. Beam fields are polynomials of degree five or less. */
public final class Polynomial {
    private static final Polynomial ZERO = new Polynomial(new double[] {0});

    private final double[] c;

    private Polynomial(double[] coefficients) {
        int n = coefficients.length;
        while (n > 1 && coefficients[n - 1] == 0) {
            n--;
        }
        this.c = Arrays.copyOf(coefficients, Math.max(n, 1));
    }

    public static Polynomial of(double... coefficients) {
        return new Polynomial(coefficients.length == 0 ? new double[] {0} : coefficients);
    }

    public int degree() {
        return c.length - 1;
    }

    public double coefficient(int i) {
        return i < c.length ? c[i] : 0;
    }

    /** Horner's rule. */
    public double at(double s) {
        return horner(c, 0, c.length - 1, s);
    }

    /** Horner's rule on the coefficients c[base] (constant) to c[base + degree], at s. */
    static double horner(double[] c, int base, int degree, double s) {
        double v = 0;
        for (int k = degree; k >= 0; k--) {
            v = v * s + c[base + k];
        }
        return v;
    }

    public Polynomial plus(Polynomial o) {
        double[] r = new double[Math.max(c.length, o.c.length)];
        for (int i = 0; i < r.length; i++) {
            r[i] = coefficient(i) + o.coefficient(i);
        }
        return new Polynomial(r);
    }

    public Polynomial times(double k) {
        double[] r = new double[c.length];
        for (int i = 0; i < r.length; i++) {
            r[i] = c[i] * k;
        }
        return new Polynomial(r);
    }

    public Polynomial times(Polynomial o) {
        double[] r = new double[c.length + o.c.length - 1];
        for (int i = 0; i < c.length; i++) {
            for (int j = 0; j < o.c.length; j++) {
                r[i + j] += c[i] * o.c[j];
            }
        }
        return new Polynomial(r);
    }

    public Polynomial derivative() {
        if (c.length == 1) {
            return ZERO;
        }
        double[] r = new double[c.length - 1];
        for (int i = 1; i < c.length; i++) {
            r[i - 1] = i * c[i];
        }
        return new Polynomial(r);
    }

    /** The antiderivative that is {@code constant} at s = 0. */
    public Polynomial integral(double constant) {
        double[] r = new double[c.length + 1];
        r[0] = constant;
        for (int i = 0; i < c.length; i++) {
            r[i + 1] = c[i] / (i + 1);
        }
        return new Polynomial(r);
    }

    @Override
    public String toString() {
        return Arrays.toString(c);
    }
}
