package org.beamfolio.analysis;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Random;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.LUDecomposition;
import org.junit.jupiter.api.Test;

/** Root finding and the banded solver against independent references. */
class NumericsTest {
    @Test
    void rootsOfAQuarticWithKnownRoots() {
        // (s - 0.5)(s - 1.25)(s - 2)(s + 1): three roots in [0, 3], one outside
        Polynomial check = Polynomial.of(-0.5, 1).times(Polynomial.of(-1.25, 1)).times(Polynomial.of(-2, 1)).times(Polynomial.of(1, 1));
        List<Double> roots = Roots.in(check, 0, 3);
        assertEquals(3, roots.size());
        assertEquals(0.5, roots.get(0), 1e-14);
        assertEquals(1.25, roots.get(1), 1e-14);
        assertEquals(2.0, roots.get(2), 1e-14);
    }

    @Test
    void bandedSolverAgreesWithCommonsMathLu() {
        Random random = new Random(7);
        int n = 40;
        int band = 4;
        double[][] dense = new double[n][n];
        BandedSolver banded = new BandedSolver(n, band);
        for (int i = 0; i < n; i++) {
            for (int j = i; j <= Math.min(n - 1, i + band); j++) {
                double v = i == j ? 10 + random.nextDouble() : random.nextDouble() - 0.5;
                dense[i][j] = v;
                dense[j][i] = v;
                banded.add(i, j, v);
            }
        }
        double[] f = random.doubles(n).toArray();
        double[] expected = new LUDecomposition(new Array2DRowRealMatrix(dense)).getSolver().solve(new ArrayRealVector(f)).toArray();
        double[] actual;
        try {
            actual = banded.solve(f).high();
        } catch (BandedSolver.NotPositiveDefinite e) {
            throw new AssertionError(e);
        }
        assertArrayEquals(expected, actual, 1e-12);
    }
}
