package org.beamfolio.analysis;

/**
 * A sum kept as two doubles (value and the error of every addition and product), so a sum of
 * large terms that nearly cancel comes out right to the last digit: two-sum (Knuth) and
 * two-product by fused multiply-add.
 */
final class Compensated {
    private double hi;
    private double lo;

    Compensated(double start) {
        hi = start;
    }

    void add(double x) {
        double sum = hi + x;
        double back = sum - hi;
        lo += (hi - (sum - back)) + (x - back);
        hi = sum;
    }

    void addProduct(double a, double b) {
        double p = a * b;
        lo += Math.fma(a, b, -p);
        add(p);
    }

    double value() {
        return hi + lo;
    }
}
