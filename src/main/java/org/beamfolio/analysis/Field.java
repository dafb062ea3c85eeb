package org.beamfolio.analysis;

import java.util.ArrayList;
import java.util.List;

/**
 * A field along the beam (shear, moment, slope, deflection, a stress) as polynomial pieces, one
 * per element, each in the local coordinate s = x - start. Jumps between pieces are kept: the
 * value just left and just right of a node are both available. The coefficients are stored flat,
 * six to a piece (beam fields are of degree five or less), so that sums and multiples of fields,
 * made for every combination, cost array loops and no objects.
 */
public final class Field {
    /** Coefficients per piece: degree five at most. */
    static final int STRIDE = 6;

    private final double[] starts;
    private final double[] ends;
    private final double[] c;

    public Field(double[] starts, double[] ends, Polynomial[] pieces) {
        this.starts = starts.clone();
        this.ends = ends.clone();
        this.c = new double[pieces.length * STRIDE];
        for (int i = 0; i < pieces.length; i++) {
            if (pieces[i].degree() >= STRIDE) {
                throw new IllegalArgumentException("a beam field is of degree five or less, got " + pieces[i].degree());
            }
            for (int k = 0; k <= pieces[i].degree(); k++) {
                c[i * STRIDE + k] = pieces[i].coefficient(k);
            }
        }
    }

    /** A field of flat coefficients, six to a piece; the coefficient array becomes the field's own. */
    static Field of(double[] starts, double[] ends, double[] coefficients) {
        if (coefficients.length != starts.length * STRIDE) {
            throw new IllegalArgumentException("six coefficients a piece");
        }
        return new Field(starts.clone(), ends.clone(), coefficients);
    }

    /** Shares the abscissae of another field: they never change. */
    private Field(double[] starts, double[] ends, double[] coefficients) {
        this.starts = starts;
        this.ends = ends;
        this.c = coefficients;
    }

    public int size() {
        return starts.length;
    }

    public double start(int i) {
        return starts[i];
    }

    public double end(int i) {
        return ends[i];
    }

    public Polynomial piece(int i) {
        double[] k = new double[STRIDE];
        System.arraycopy(c, i * STRIDE, k, 0, STRIDE);
        return Polynomial.of(k);
    }

    /** Piece i at local s, by Horner's rule on the flat coefficients. */
    double value(int i, double s) {
        return Polynomial.horner(c, i * STRIDE, STRIDE - 1, s);
    }

    /** out[k] = out[k] + factor * (coefficient k of piece i), for the six coefficients. */
    void addPieceTimes(int i, double factor, double[] out) {
        int base = i * STRIDE;
        for (int k = 0; k < STRIDE; k++) {
            out[k] = out[k] + factor * c[base + k];
        }
    }

    /** A piece given by its six coefficients at local s, by Horner's rule as {@link #value}. */
    static double value(double[] coefficients, double s) {
        return Polynomial.horner(coefficients, 0, STRIDE - 1, s);
    }

    /** Value at x; at a node, the value of the piece to the right (the left at the beam's end). */
    public double at(double x) {
        int i = indexRightOf(x);
        return value(i, x - starts[i]);
    }

    /** Value just left of x (the first piece's start value at the beam's left end). */
    public double leftOf(double x) {
        int i = indexLeftOf(x);
        return value(i, x - starts[i]);
    }

    int indexRightOf(double x) {
        int lo = 0;
        int hi = starts.length - 1;
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
        double[] r = new double[c.length];
        for (int i = 0; i < r.length; i++) {
            r[i] = c[i] + o.c[i];
        }
        return new Field(starts, ends, r);
    }

    public Field times(double k) {
        double[] r = new double[c.length];
        for (int i = 0; i < r.length; i++) {
            r[i] = c[i] * k;
        }
        return new Field(starts, ends, r);
    }

    /**
     * The sum of factors[t] * fields[t] in one pass, the terms added in order, so each
     * coefficient is the same sum as adding the terms one by one; one array, not one per term.
     * The fields share their pieces; there is at least one.
     */
    static Field linear(Field[] fields, double[] factors, int count) {
        Field first = fields[0];
        double[] r = new double[first.c.length];
        for (int t = 0; t < count; t++) {
            double k = factors[t];
            double[] o = fields[t].c;
            for (int i = 0; i < r.length; i++) {
                r[i] = r[i] + k * o[i];
            }
        }
        return new Field(first.starts, first.ends, r);
    }

    /** The same pieces, each scaled by its own factor (a stress from a moment, segment by segment). */
    public Field scaledBy(double[] factors) {
        double[] r = new double[c.length];
        for (int i = 0; i < r.length; i++) {
            r[i] = c[i] * factors[i / STRIDE];
        }
        return new Field(starts, ends, r);
    }

    public static Field zero(double[] starts, double[] ends) {
        return new Field(starts.clone(), ends.clone(), new double[starts.length * STRIDE]);
    }

    /**
     * The largest value and where: every piece's end values and its stationary points (real
     * roots of its derivative) are the candidates, so the result is exact, not sampled.
     */
    public Extreme max() {
        return extremes(null, this, this::candidates)[0];
    }

    public Extreme min() {
        return extremes(null, this, this::candidates)[1];
    }

    /** Where a piece can take its extremes: its two ends and the real roots of its derivative (local s). */
    public double[] candidates(int piece) {
        double[] own = new double[STRIDE];
        System.arraycopy(c, piece * STRIDE, own, 0, STRIDE);
        double[] points = new double[CANDIDATES];
        return java.util.Arrays.copyOf(points, candidates(own, ends[piece] - starts[piece], points));
    }

    /** Room for the candidates of any piece: two ends and up to five roots. */
    static final int CANDIDATES = STRIDE + 1;

    /**
     * The candidates of a piece given by its six coefficients and its length, written to
     * {@code points} (at least {@link #CANDIDATES} long): the start, the end, then the roots in
     * ascending order. Returns how many.
     */
    static int candidates(double[] coefficients, double length, double[] points) {
        points[0] = 0;
        points[1] = length;
        boolean constant = true;
        for (int k = 1; k < STRIDE; k++) {
            constant &= coefficients[k] == 0;
        }
        if (constant) {
            return 2;
        }
        double[] d = new double[STRIDE - 1];
        for (int k = 1; k < STRIDE; k++) {
            d[k - 1] = k * coefficients[k];
        }
        double[] roots = new double[STRIDE];
        int count = Roots.in(d, 0, length, roots);
        System.arraycopy(roots, 0, points, 2, count);
        return count + 2;
    }

    /**
     * The largest and smallest of {@code shape} scaled piece by piece ({@code factors}, or 1),
     * evaluated at the given candidate points of each piece: exact when the candidates are those
     * of {@code shape} (a stress is a scaled moment, and shares the moment's candidates). Values
     * that are the round-off of a zero are reported as zero ({@link Range}).
     */
    public Extreme[] extremes(double[] factors, Field shape, java.util.function.IntFunction<double[]> candidates) {
        Range range = new Range(starts[0]);
        for (int i = 0; i < starts.length; i++) {
            double k = factors == null ? 1 : factors[i];
            for (double sLocal : candidates.apply(i)) {
                range.offer(k * shape.value(i, sLocal), starts[i] + sLocal);
            }
        }
        return new Extreme[] {range.max(), range.min()};
    }

    /**
     * The value of largest magnitude, its sign kept, on the pieces that lie within [from, to]
     * (a span or an overhang), exact as {@link #max()}; the first of equal magnitudes stays, and
     * zero at {@code from} where every value there is zero.
     */
    public Extreme largestWithin(double from, double to) {
        Extreme best = new Extreme(0, from, null);
        for (int i = 0; i < starts.length; i++) {
            if (pieceWithin(i, from, to)) {
                for (int sign : new int[] {1, -1}) {
                    Extreme e = extremeOf(i, sign);
                    if (Math.abs(e.value()) > Math.abs(best.value())) {
                        best = e;
                    }
                }
            }
        }
        return best;
    }

    /** Whether piece i lies within [from, to] (a region's pieces end on its nodes, to round-off). */
    public boolean pieceWithin(int i, double from, double to) {
        return starts[i] >= from - 1e-12 && ends[i] <= to + 1e-12;
    }

    /**
     * Where the field is zero inside its pieces, left to right: the real roots of each piece,
     * leaving out those within 1e-12 of the piece's length of its ends (a node, already a key
     * point, where the root is the round-off of the end).
     */
    public List<Double> zeroesInside() {
        List<Double> out = new ArrayList<>();
        for (int i = 0; i < starts.length; i++) {
            double length = ends[i] - starts[i];
            for (double s : Roots.in(piece(i), 0, length)) {
                if (s > 1e-12 * length && s < length * (1 - 1e-12)) {
                    out.add(starts[i] + s);
                }
            }
        }
        return out;
    }

    /** The largest (sign 1) or smallest (sign -1) value on one piece, exact as {@link #max()}. */
    public Extreme extremeOf(int piece, int sign) {
        double best = Double.NEGATIVE_INFINITY;
        double at = starts[piece];
        for (double s : candidates(piece)) {
            double v = value(piece, s);
            if (sign * v > best) {
                best = sign * v;
                at = starts[piece] + s;
            }
        }
        return new Extreme(sign * best, at, null);
    }
}
