package org.beamfolio.design.steel;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.beamfolio.analysis.Field;
import org.beamfolio.analysis.Polynomial;
import org.junit.jupiter.api.Test;

/**
 * Cb by Eq. F1-1 against the AISC Manual's standard cases (Manual Table 3-1, from memory: uniform
 * load 1.14 unbraced, 1.30 braced at midspan, 1.01 for the middle third; a point load at midspan
 * 1.32 unbraced), and the exact largest moment against closed forms.
 */
class MomentGradientTest {
    static final double L = 12.0;
    static final double W = 1000.0;

    /** A simple span under uniform load w: M = w x (L - x) / 2, as two pieces split at {@code split}. */
    static Field uniform(double split) {
        Polynomial m = Polynomial.of(0, W * L / 2, -W / 2);
        Polynomial right = Polynomial.of(m.at(split), W * L / 2 - W * split, -W / 2);
        return new Field(new double[] {0, split}, new double[] {split, L}, new Polynomial[] {m, right});
    }

    @Test
    void uniformLoadUnbraced() {
        MomentGradient g = MomentGradient.of(uniform(5.0), 0, L, false);
        assertEquals(12.5 / 11, g.cb(), 1e-12, "12.5 x 0.125 / (2.5 x 0.125 + 3 x 0.09375 x 2 + 4 x 0.125)");
        assertEquals(1.14, g.cb(), 0.005);
        assertEquals(W * L * L / 8, g.mMax(), 1e-9);
        assertEquals(L / 2, g.atMax(), 1e-9);
    }

    @Test
    void uniformLoadBracedAtMidspan() {
        MomentGradient g = MomentGradient.of(uniform(5.0), 0, L / 2, false);
        assertEquals(1.30, g.cb(), 0.005);
        assertEquals(W * L * L / 8, g.mMax(), 1e-9);
        assertEquals(3 * W * L * L / 32, g.mB(), 1e-9, "MB at L/4 = w (L/4)(3L/4) / 2");
    }

    @Test
    void uniformLoadMiddleThird() {
        MomentGradient g = MomentGradient.of(uniform(5.0), L / 3, 2 * L / 3, false);
        assertEquals(1.01, g.cb(), 0.005);
        assertEquals(1.5625 / 1.541666666666667, g.cb(), 1e-12);
    }

    @Test
    void pointLoadAtMidspanUnbraced() {
        double p = 5000;
        Field f = new Field(new double[] {0, L / 2}, new double[] {L / 2, L},
                new Polynomial[] {Polynomial.of(0, p / 2), Polynomial.of(p * L / 4, -p / 2)});
        MomentGradient g = MomentGradient.of(f, 0, L, false);
        assertEquals(12.5 * 0.25 / 2.375, g.cb(), 1e-12);
        assertEquals(1.32, g.cb(), 0.005);
    }

    @Test
    void theLargestMomentIsFoundBetweenQuarterPoints() {
        // Triangular load rising to w at the right end of a simple span: M = (w L / 6) x (1 - x^2/L^2),
        // largest at x = L / sqrt(3), M = w L^2 / (9 sqrt(3)) (Roark's Formulas, Table 8.1 case 2e).
        Field f = new Field(new double[] {0}, new double[] {L},
                new Polynomial[] {Polynomial.of(0, W * L / 6, 0, -W / (6 * L))});
        MomentGradient g = MomentGradient.of(f, 0, L, false);
        assertEquals(L / Math.sqrt(3), g.atMax(), 1e-9);
        assertEquals(W * L * L / (9 * Math.sqrt(3)), g.mMax(), 1e-9);
    }

    @Test
    void aSegmentEndingAtAnUnbracedFreeEndTakesCbOne() {
        // A cantilever under uniform load: M = -w (L - x)^2 / 2; F1 permits Cb = 1.0
        Field f = new Field(new double[] {0}, new double[] {L},
                new Polynomial[] {Polynomial.of(-W * L * L / 2, W * L, -W / 2)});
        MomentGradient g = MomentGradient.of(f, 0, L, true);
        assertEquals(1.0, g.cb());
        assertEquals(W * L * L / 2, g.mMax(), 1e-9);
        assertTrue(g.equation().number().contains("free end"));
    }

    @Test
    void cbIsAtLeastOneForEverySegmentOfAnyLoading() {
        // Eq. F1-1 gives 1.0 when every quarter point carries Mmax and more otherwise
        java.util.Random random = new java.util.Random(16);
        for (int trial = 0; trial < 500; trial++) {
            double[] c = new double[4];
            for (int k = 0; k < 4; k++) {
                c[k] = random.nextGaussian() * Math.pow(L, -k) * 1e4;
            }
            Field f = new Field(new double[] {0}, new double[] {L}, new Polynomial[] {Polynomial.of(c)});
            double a = random.nextDouble() * L * 0.9;
            double b = a + 0.05 * L + random.nextDouble() * (L - a - 0.05 * L);
            MomentGradient g = MomentGradient.of(f, a, Math.min(b, L), false);
            assertTrue(g.cb() >= 1.0 - 1e-12, "trial " + trial + ": Cb = " + g.cb());
            assertTrue(g.mMax() >= Math.max(g.mA(), Math.max(g.mB(), g.mC())), "trial " + trial);
        }
    }
}
