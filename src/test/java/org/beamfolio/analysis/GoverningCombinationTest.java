package org.beamfolio.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.beamfolio.TestJobs;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The envelope names the combination that governs, on simple spans loaded so that each
 * combination of ASCE/SEI 7-22 2.4.1 governs in turn. Uniform loads on one span scale the same
 * moment diagram, so the governing combination is the one with the largest factored sum, found
 * by hand from the factors (listed in BuiltInSetsTest) for each row.
 */
class GoverningCombinationTest {
    @ParameterizedTest(name = "{0} governs the largest sagging moment")
    @CsvSource(delimiter = '|', value = {
        // expected          | D  | L  | Lr | W    by hand: the largest factored sum
        "D + L               | 2  | 10 | 1  | 0",  // D + L = 12; D + 0.75L + 0.75Lr = 10.25
        "D + Lr              | 2  | 1  | 10 | 0",  // D + Lr = 12; D + 0.75L + 0.75Lr = 10.25
        "D + 0.75L + 0.75Lr  | 2  | 6  | 6  | 0",  // 2 + 4.5 + 4.5 = 11 > D + L = 8
        "D + 0.6W            | 2  | 1  | 1  | 20", // 2 + 12 = 14 > D + 0.75L + 0.45W + 0.75Lr = 12.5
        "D + 0.75L + 0.75(0.6W) + 0.75Lr | 2 | 6 | 6 | 6", // 2 + 4.5 + 2.7 + 4.5 = 13.7
    })
    void governingCombinationIsNamed(String expected, double d, double l, double lr, double w) {
        AnalysisResult r = TestJobs.solve(job(d, l, lr, w));
        assertEquals(expected, r.envelope().momentMax().combination());
    }

    @ParameterizedTest(name = "{0} governs the largest hogging moment under wind uplift")
    @CsvSource(delimiter = '|', value = {
        "0.6D + 0.6W | 2 | 1 | 1 | -20", // 1.2 - 12 = -10.8 < D + 0.6W = -10
    })
    void upliftCombinationGovernsTheReversedMoment(String expected, double d, double l, double lr, double w) {
        AnalysisResult r = TestJobs.solve(job(d, l, lr, w));
        assertEquals(expected, r.envelope().momentMin().combination());
        assertEquals(1.0, r.envelope().momentMin().value() / ((0.6 * d + 0.6 * w) * 1e3 * 36 / 8), 1e-9, "(0.6D + 0.6W) l^2 / 8");
    }

    private static String job(double d, double l, double lr, double w) {
        return TestJobs.text("6 m", "    - { at: 0 m, type: pin }\n    - { at: 6 m, type: roller }\n",
                "  - { case: D, type: uniform, w: " + d + " kN/m }\n"
                        + "  - { case: L, type: uniform, w: " + l + " kN/m }\n"
                        + "  - { case: Lr, type: uniform, w: " + lr + " kN/m }\n"
                        + "  - { case: W, type: uniform, w: " + w + " kN/m }\n")
                + "combinations: ASCE7-ASD\n";
    }
}
