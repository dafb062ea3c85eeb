package org.beamfolio.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.beamfolio.TestJobs;
import org.beamfolio.job.JobReader;
import org.junit.jupiter.api.Test;

/** The largest and smallest reaction at each support over every combination and pattern arrangement, by statics. */
class ReactionEnvelopeTest {
    static final double LB = 4.4482216152605; // N, exact by definition of the pound-force
    static final double FT = 0.3048;

    @Test
    void liveLoadOnTheOverhangAloneLiftsTheBackSpanSupport() {
        // Span 24 ft (pin, roller) and a 10 ft overhang; D 900 lb/ft and 38 kip at the tip; L 1000 lb/ft and
        // 22 kip at the tip. By statics, moments about the roller: R1 * 24 = w 24 * 12 - w 10 * 5 - P * 10
        // for each load on the regions it is on. With L on the overhang only:
        // R1 = (900 (288 - 50) - 380,000 - 1000 * 50 - 220,000) / 24 = -18,158.33 lb.
        String text = """
                beamfolio: 1
                project: { title: Overhang uplift }
                report: { units: US, paper: letter }
                materials: { m: { E: 29000 ksi } }
                sections: { s: { shape: given, I: 5000 in^4, depth: 32 in, y_bottom: 16 in } }
                beam:
                  length: 34 ft
                  section: s
                  material: m
                  supports: [ { at: 0 ft, type: pin }, { at: 24 ft, type: roller } ]
                loads:
                  - { case: D, type: uniform, w: 900 lb/ft }
                  - { case: D, type: point, P: 38 kip, at: 34 ft }
                  - { case: L, type: uniform, w: 1000 lb/ft }
                  - { case: L, type: point, P: 22 kip, at: 34 ft }
                combinations: ASCE7-ASD
                pattern: [ L ]
                """;
        AnalysisResult r = TestJobs.solve(text);
        ReactionEnvelope.AtSupport back = r.reactions().supports().get(0);
        double byHand = (900 * (288 - 50) - 380_000 - 1000 * 50 - 220_000) / 24.0;
        assertEquals(byHand, back.min().force() / LB, 1e-9 * Math.abs(byHand));
        assertEquals("D + L (L on right overhang)", back.min().combination());
        assertTrue(back.uplift());
        // largest at the pin: L on the back span only, R1 = (900 * 238 - 380,000 + 1000 * 288) / 24
        double largest = (900 * 238 - 380_000 + 1000 * 288) / 24.0;
        assertEquals(largest, back.max().force() / LB, 1e-9 * Math.abs(largest));
        assertEquals("D + L (L on span 1)", back.max().combination());
        assertEquals(List.of("span 1", "right overhang"), r.spans().stream().map(AnalysisResult.Span::label).toList());
    }

    @Test
    void transferGirderExampleFindsTheUpliftOfTheIssue() throws Exception {
        // The example with its self weight: plates 16 x 1.25 + 0.5 x 30 + 14 x 1 = 49 in^2 at 490 pcf,
        // w = 490 * 49 / 144 lb/ft, added to D. By statics as above: R1 = ((900 + w) 238 - 380,000 - 270,000) / 24
        // = -16,505 lb, against -4,505 lb with live load on every region.
        Path file = Path.of("example-jobs/transfer-plate-girder-cantilever.yaml");
        AnalysisResult r = Analysis.run(JobReader.read(file.toString(), "transfer", Files.readAllBytes(file)).job());
        double self = 490.0 * 49 / 144;
        double byHand = ((900 + self) * 238 - 380_000 - 270_000) / 24.0;
        assertEquals(-16_505, byHand, 0.5);
        assertEquals(byHand, r.reactions().supports().get(0).min().force() / LB, 1e-6 * Math.abs(byHand));
    }

    @Test
    void twoSpansPatternedGiveTheExtremesOfTheHandbookCoefficients() {
        // Two equal spans L = 6 m: w on both spans gives R = 3/8, 10/8, 3/8 w L; w on span 1 alone gives
        // 7/16, 5/8, -1/16 w L (AISC Manual Table 3-23 two-span diagrams, from memory; by hand from the
        // support moment w L^2 / 16). D = 1 kN/m everywhere, L = 10 kN/m patterned, D + L.
        String text = TestJobs.text("12 m", "    - { at: 0 m, type: pin }\n    - { at: 6 m, type: roller }\n"
                        + "    - { at: 12 m, type: roller }\n",
                "  - { case: D, type: uniform, w: 1 kN/m }\n  - { case: L, type: uniform, w: 10 kN/m }\n")
                + "combinations:\n  - { name: D + L, factors: { D: 1.0, L: 1.0 } }\npattern: [ L ]\n";
        List<ReactionEnvelope.AtSupport> r = TestJobs.solve(text).reactions().supports();
        double d = 1e3 * 6;
        double l = 10e3 * 6;
        near(3.0 / 8 * d + 7.0 / 16 * l, r.get(0).max().force());
        assertEquals("D + L (L on span 1)", r.get(0).max().combination());
        near(10.0 / 8 * (d + l), r.get(1).max().force());
        assertEquals("D + L", r.get(1).max().combination());
        near(3.0 / 8 * d - 1.0 / 16 * l, r.get(2).min().force());
        assertEquals("D + L (L on span 1)", r.get(2).min().combination());
        assertTrue(r.get(2).uplift(), "2.25 - 3.75 kN: uplift at the far end");
        assertFalse(r.get(1).uplift());
    }

    @Test
    void twoCantileversFromOneSupportAreAPattern() {
        // Fixed support at the middle of a 6 m beam, L = 10 kN/m: both cantilevers loaded, R = w * 6 m = 60 kN;
        // one side loaded, R = w * 3 m = 30 kN (statics).
        String text = TestJobs.text("6 m", "    - { at: 3 m, type: fixed }\n", "  - { case: L, type: uniform, w: 10 kN/m }\n")
                + "combinations:\n  - { name: L, factors: { L: 1.0 } }\npattern: [ L ]\n";
        AnalysisResult result = TestJobs.solve(text);
        assertEquals(List.of("left cantilever", "right cantilever"), result.spans().stream().map(AnalysisResult.Span::label).toList());
        ReactionEnvelope.AtSupport r = result.reactions().supports().get(0);
        near(60e3, r.max().force());
        assertEquals("L", r.max().combination());
        near(30e3, r.min().force());
        assertEquals("L (L on left cantilever)", r.min().combination());
        // the hogging moment at the support of one loaded cantilever, w a^2 / 2 = 45 kN*m (statics)
        near(-45e3, result.envelope().momentMin().value());
    }

    private static void near(double expected, double actual) {
        assertEquals(expected, actual, 1e-9 * Math.abs(expected));
    }
}
