package org.beamfolio.checks;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.beamfolio.TestJobs;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.checks.CheckOutcome;
import org.junit.jupiter.api.Test;

/**
 * Deflection checks under pattern loading and on spring supports, against values worked by hand.
 * Test data (invented): w = 10 kN/m, spans of 6 m, EI = 2e7 N*m^2 ({@link TestJobs}).
 */
class PatternDeflectionTest {
    static final double W = 10e3;
    static final double L = 6;

    @Test
    void oneSpanOfTwoLoadedGovernsTheDeflectionCheck() {
        // Two equal continuous spans: with one span loaded the largest deflection is 0.0092 w L^4 / EI,
        // with both loaded 0.0054 w L^4 / EI (common practice; the coefficients of the two-span
        // diagrams of AISC Manual Table 3-23, from memory, rounded to two figures).
        String text = TestJobs.text("12 m", "    - { at: 0 m, type: pin }\n    - { at: 6 m, type: roller }\n"
                        + "    - { at: 12 m, type: roller }\n", "  - { case: L, type: uniform, w: 10 kN/m }\n")
                + "combinations:\n  - { name: L, factors: { L: 1.0 } }\npattern: [ L ]\n"
                + "checks:\n  deflection:\n    - { cases: [ L ], limit: L/360 }\n";
        List<CheckOutcome> checks = Checks.run(TestJobs.solve(text));
        double unit = W * Math.pow(L, 4) / TestJobs.EI; // m
        CheckOutcome span1 = find(checks, "deflection-L-span1");
        CheckOutcome span2 = find(checks, "deflection-L-span2");
        assertEquals(0.0092, span1.demand() / unit, 5e-5, "one span of two loaded");
        assertEquals("L (L on span 1)", span1.combination());
        assertEquals("L (L on span 2)", span2.combination());
        assertTrue(span1.description().startsWith("Deflection under L (L on span 1) in span 1"), span1.description());
        // By hand, exactly: span 1 as a simple span under w less the end moment M = w L^2 / 16 at the
        // middle support (three-moment equation with span 2 unloaded): y = w x (L^3 - 2 L x^2 + x^3) / 24EI
        // - M x (L^2 - x^2) / 6EIL, largest where y' = 0.
        double m = W * L * L / 16;
        DoubleUnaryOperator y = x -> (W * x * (L * L * L - 2 * L * x * x + x * x * x) / 24
                - m * x * (L * L - x * x) / (6 * L)) / TestJobs.EI;
        double largest = maximum(y, 0, L);
        assertEquals(largest, span1.demand(), 1e-9 * largest);
        assertTrue(largest / unit > 0.0054 + 0.003, "larger than both spans loaded (0.0054 w L^4 / EI)");
    }

    @Test
    void springSupportsAreCheckedOnTheDeflectionRelativeToTheirMovement() {
        // Pin at 0 and a spring k = 5000 kN/m at L = 6 m, w = 10 kN/m: the spring carries w L / 2 = 30 kN and
        // settles 30 / 5000 m = 6 mm; relative to the line between the supports the beam deflects as on rigid
        // supports, 5 w L^4 / (384 EI) = 8.4375 mm at midspan (AISC Manual Table 3-23, simple beam, uniform
        // load, from memory); the absolute deflection adds the chord 6 mm * x / L (by hand).
        String beam = TestJobs.text("6 m", "    - { at: 0 m, type: pin }\n    - { at: 6 m, type: spring, k: 5000 kN/m }\n",
                "  - { case: D, type: uniform, w: 10 kN/m }\n") + "combinations:\n  - { name: D, factors: { D: 1.0 } }\n";
        double settlement = W * L / 2 / 5e6;
        double relativeByHand = 5 * W * Math.pow(L, 4) / (384 * TestJobs.EI);
        CheckOutcome relative = Checks.run(TestJobs.solve(beam + "checks:\n  deflection:\n    - { cases: [ D ], limit: L/360 }\n")).get(0);
        assertEquals(relativeByHand, relative.demand(), 1e-9 * relativeByHand);
        assertEquals(3.0, relative.at(), 1e-9, "at midspan");
        assertTrue(relative.description().contains("relative to the supports' movement"), relative.description());
        assertTrue(relative.description().contains("absolute deflection"), relative.description());

        DoubleUnaryOperator absolute = x -> W * x * (L * L * L - 2 * L * x * x + x * x * x) / (24 * TestJobs.EI) + settlement * x / L;
        double absoluteByHand = maximum(absolute, 0, L);
        CheckOutcome asked = Checks.run(TestJobs.solve(beam
                + "checks:\n  deflection:\n    - { cases: [ D ], limit: L/360, relative: false }\n")).get(0);
        assertEquals(absoluteByHand, asked.demand(), 1e-9 * absoluteByHand);
        assertTrue(asked.demand() > relative.demand() + 0.0029, "the settlement adds about half of 6 mm near midspan");
    }

    private static CheckOutcome find(List<CheckOutcome> checks, String id) {
        return checks.stream().filter(c -> c.id().equals(id)).findFirst().orElseThrow(() -> new AssertionError(id + " missing"));
    }

    /** The largest value of a smooth function with one maximum in [a, b], by golden-section search to round-off. */
    static double maximum(DoubleUnaryOperator f, double a, double b) {
        double g = (Math.sqrt(5) - 1) / 2;
        for (int i = 0; i < 200; i++) {
            double c = b - g * (b - a);
            double d = a + g * (b - a);
            if (f.applyAsDouble(c) > f.applyAsDouble(d)) {
                b = d;
            } else {
                a = c;
            }
        }
        return f.applyAsDouble((a + b) / 2);
    }
}
