package org.beamfolio.analysis;

/**
 * Solves K d = f for a symmetric positive definite matrix stored as its upper band, by Cholesky
 * factorisation restricted to the band: O(n b^2) work for n unknowns and half-bandwidth b. A beam's
 * stiffness matrix, numbered left to right, has a half-bandwidth of three or four, so the solve is
 * linear in the number of nodes.
 */
final class BandedSolver implements CaseSolver.Assembly {
    private final int n;
    private final int bandwidth;
    /** band[i][k] holds K[i][i + k]; after {@link #solve} it holds the Cholesky factor. */
    private final double[][] band;
    /** The matrix as assembled, kept for the residuals of iterative refinement. */
    private double[][] original;
    private final boolean[] restrained;

    BandedSolver(int n, int bandwidth) {
        this.n = n;
        this.bandwidth = bandwidth;
        this.band = new double[n][bandwidth + 1];
        this.restrained = new boolean[n];
    }

    @Override
    public void add(int i, int j, double value) {
        int r = Math.min(i, j);
        int k = Math.abs(i - j);
        if (k > bandwidth) {
            throw new IllegalArgumentException("entry outside the band: " + i + ", " + j);
        }
        band[r][k] += value;
    }

    /** Replaces row and column i by a diagonal entry alone, so that d[i] = 0: a restrained displacement. */
    @Override
    public void restrain(int i) {
        restrained[i] = true;
        for (int k = 0; k <= bandwidth; k++) {
            if (i + k < n) {
                band[i][k] = 0;
            }
            if (i - k >= 0) {
                band[i - k][k] = 0;
            }
        }
    }

    /** Thrown when a pivot is not positive: the structure is unstable or numerically singular. */
    static final class NotPositiveDefinite extends Exception {
        final int index;

        NotPositiveDefinite(int index) {
            super("stiffness matrix is singular at unknown " + index);
            this.index = index;
        }
    }

    /**
     * A refined solution, kept as {@code high + low}, and the smallest ratio of a pivot to its
     * unknown's own diagonal stiffness: a scale-free estimate of how close the model is to
     * singular (its reciprocal estimates the condition).
     */
    record Solution(double[] high, double[] low, double pivotRatio) {}

    /** Factorises in place and solves; the matrix cannot be reused. */
    Solution solve(double[] f) throws NotPositiveDefinite {
        double maxDiagonal = 0;
        for (int i = 0; i < n; i++) {
            maxDiagonal = Math.max(maxDiagonal, band[i][0]);
        }
        if (!(maxDiagonal > 0)) {
            maxDiagonal = 1;
        }
        f = f.clone();
        for (int i = 0; i < n; i++) {
            if (restrained[i]) {
                // scaled like the rest of the matrix, so the pivot test below is not misled
                band[i][0] = maxDiagonal;
                f[i] = 0;
            }
        }
        original = new double[n][];
        for (int i = 0; i < n; i++) {
            original[i] = band[i].clone();
        }
        double minPivot = 1;
        // L^T L = K with L^T upper banded, stored over the band
        for (int i = 0; i < n; i++) {
            double diagonal = band[i][0];
            for (int k = 1; k <= bandwidth && i - k >= 0; k++) {
                diagonal -= band[i - k][k] * band[i - k][k];
            }
            if (!(diagonal > 1e-14 * original[i][0])) {
                throw new NotPositiveDefinite(i);
            }
            // how much of the unknown's own stiffness is left once the earlier unknowns are
            // eliminated: near 1 for a well-posed model, tiny near a mechanism (scale-free)
            minPivot = Math.min(minPivot, diagonal / original[i][0]);
            double pivot = Math.sqrt(diagonal);
            band[i][0] = pivot;
            for (int j = 1; j <= bandwidth && i + j < n; j++) {
                double sum = band[i][j];
                for (int k = 1; k <= bandwidth && i - k >= 0; k++) {
                    int offset = j + k;
                    if (offset <= bandwidth) {
                        sum -= band[i - k][k] * band[i - k][offset];
                    }
                }
                band[i][j] = sum / pivot;
            }
        }
        double[] hi = substitute(f);
        double[] lo = new double[n];
        // Iterative refinement with residuals in double-double precision, the solution kept as
        // hi + lo: a short, stiff element beside long ones makes the matrix ill-conditioned, and
        // refinement recovers the digits the factorisation loses; lo keeps the digits that the
        // element end forces need where nearly equal displacements are subtracted.
        for (int pass = 0; pass < 4; pass++) {
            double[] correction = substitute(residual(f, hi, lo));
            for (int i = 0; i < n; i++) {
                double small = lo[i] + correction[i];
                double sum = hi[i] + small;
                lo[i] = small - (sum - hi[i]);
                hi[i] = sum;
            }
        }
        return new Solution(hi, lo, minPivot);
    }

    /** r = f - K (hi + lo), each row accumulated exactly (two-product and two-sum) and rounded once. */
    private double[] residual(double[] f, double[] hi, double[] lo) {
        double[] r = new double[n];
        for (int i = 0; i < n; i++) {
            Compensated sum = new Compensated(f[i]);
            for (int j = Math.max(0, i - bandwidth); j <= Math.min(n - 1, i + bandwidth); j++) {
                double k = j >= i ? original[i][j - i] : original[j][i - j];
                sum.addProduct(-k, hi[j]);
                sum.add(-k * lo[j]);
            }
            r[i] = restrained[i] ? 0 : sum.value();
        }
        return r;
    }

    /** Forward and back substitution with the factor. */
    private double[] substitute(double[] f) {
        double[] y = f.clone();
        for (int i = 0; i < n; i++) {
            double sum = y[i];
            for (int k = 1; k <= bandwidth && i - k >= 0; k++) {
                sum -= band[i - k][k] * y[i - k];
            }
            y[i] = sum / band[i][0];
        }
        for (int i = n - 1; i >= 0; i--) {
            double sum = y[i];
            for (int k = 1; k <= bandwidth && i + k < n; k++) {
                sum -= band[i][k] * y[i + k];
            }
            y[i] = sum / band[i][0];
        }
        return y;
    }
}
