package org.beamfolio.analysis;

import java.util.ArrayList;
import java.util.List;
import java.util.function.UnaryOperator;

/**
 * A field along the beam (shear, moment, slope, deflection, a stress) as polynomial pieces, one
 * per element, each in the local coordinate s = x - start. Jumps between pieces are kept: the
 * value just left and just right of a node are both available.
 */
public final class Field {
    private final double[] starts;
    private final double[] ends;
    private final Polynomial[] pieces;

    public Field(double[] starts, double[] ends, Polynomial[] pieces) {
        this.starts = starts.clone();
        this.ends = ends.clone();
        this.pieces = pieces.clone();
    }

    public int size() {
        return pieces.length;
    }

    public double start(int i) {
        return starts[i];
    }

    public double end(int i) {
        return ends[i];
    }

    public Polynomial piece(int i) {
        return pieces[i];
    }

    /** Value at x; at a node, the value of the piece to the right (the left at the beam's end). */
    public double at(double x) {
        return pieces[indexRightOf(x)].at(x - starts[indexRightOf(x)]);
    }

    /** Value just left of x (the first piece's start value at the beam's left end). */
    public double leftOf(double x) {
        int i = indexLeftOf(x);
        return pieces[i].at(x - starts[i]);
    }

    int indexRightOf(double x) {
        int lo = 0;
        int hi = pieces.length - 1;
        while (lo < hi) {
            int mid = (lo + hi + 1) >>> 1;
            if (starts[mid] <= x) {
                lo = mid;
            } else {
                hi = mid - 1;
            }
        }
        return lo;
    }

    int indexLeftOf(double x) {
        int i = indexRightOf(x);
        return i > 0 && x <= starts[i] ? i - 1 : i;
    }

    public Field plus(Field o) {
        Polynomial[] r = new Polynomial[pieces.length];
        for (int i = 0; i < r.length; i++) {
            r[i] = pieces[i].plus(o.pieces[i]);
        }
        return new Field(starts, ends, r);
    }

    public Field times(double k) {
        return map(p -> p.times(k));
    }

    /** The same pieces, each scaled by its own factor (a stress from a moment, segment by segment). */
    public Field scaledBy(double[] factors) {
        Polynomial[] r = new Polynomial[pieces.length];
        for (int i = 0; i < r.length; i++) {
            r[i] = pieces[i].times(factors[i]);
        }
        return new Field(starts, ends, r);
    }

    public Field map(UnaryOperator<Polynomial> f) {
        Polynomial[] r = new Polynomial[pieces.length];
        for (int i = 0; i < r.length; i++) {
            r[i] = f.apply(pieces[i]);
        }
        return new Field(starts, ends, r);
    }

    public static Field zero(double[] starts, double[] ends) {
        Polynomial[] r = new Polynomial[starts.length];
        java.util.Arrays.fill(r, Polynomial.ZERO);
        return new Field(starts, ends, r);
    }

    /**
     * The largest value and where: every piece's end values and its stationary points (real
     * roots of its derivative) are the candidates, so the result is exact, not sampled.
     */
    public Extreme max() {
        return extreme(1);
    }

    public Extreme min() {
        return extreme(-1);
    }

    /** The largest absolute value, its sign kept. */
    public Extreme maxAbs() {
        Extreme hi = max();
        Extreme lo = min();
        return Math.abs(lo.value()) > Math.abs(hi.value()) ? lo : hi;
    }

    /** The largest (sign 1) or smallest (sign -1) value on one piece, exact as {@link #max()}. */
    public Extreme extremeOf(int piece, int sign) {
        double length = ends[piece] - starts[piece];
        List<Double> candidates = new ArrayList<>();
        candidates.add(0.0);
        candidates.add(length);
        candidates.addAll(Roots.in(pieces[piece].derivative(), 0, length));
        double best = Double.NEGATIVE_INFINITY;
        double at = starts[piece];
        for (double s : candidates) {
            double v = pieces[piece].at(s);
            if (sign * v > best) {
                best = sign * v;
                at = starts[piece] + s;
            }
        }
        return new Extreme(sign * best, at, null);
    }

    private Extreme extreme(int sign) {
        double bestValue = Double.NEGATIVE_INFINITY;
        double bestAt = starts[0];
        double scale = 0;
        for (int i = 0; i < pieces.length; i++) {
            double length = ends[i] - starts[i];
            List<Double> candidates = new ArrayList<>();
            candidates.add(0.0);
            candidates.add(length);
            candidates.addAll(Roots.in(pieces[i].derivative(), 0, length));
            for (double s : candidates) {
                double v = pieces[i].at(s);
                scale = Math.max(scale, Math.abs(v));
                if (sign * v > bestValue) {
                    bestValue = sign * v;
                    bestAt = starts[i] + s;
                }
            }
        }
        double value = sign * bestValue;
        // round-off left by the solution (a moment of 1e-12 at a free end) is reported as zero
        if (Math.abs(value) <= 1e-10 * scale) {
            value = 0.0;
        }
        return new Extreme(value, bestAt, null);
    }
}
