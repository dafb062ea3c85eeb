package org.beamfolio.checks;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.beamfolio.TestJobs;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.checks.CheckOutcome;
import org.beamfolio.units.Measure;
import org.junit.jupiter.api.Test;

/** Fibre, shear and deflection checks against values worked by hand in the test. */
class StressChecksTest {
    /** A tee of flange 200 x 20 mm on a 10 x 180 mm stem, stem up (flipped), worked in SectionCalculatorTest. */
    static final String TEE = "  tee: { shape: tee, d: 200 mm, bf: 200 mm, tf: 20 mm, tw: 10 mm, flip: true }\n";

    static CheckOutcome find(List<CheckOutcome> checks, String id) {
        return checks.stream().filter(c -> c.id().equals(id)).findFirst()
                .orElseThrow(() -> new AssertionError("no check " + id + " in " + checks));
    }

    @Test
    void unsymmetricSectionTakesItsTensionAtTheTopOverTheSupport() {
        // Two equal spans l = 3 m, w = 10 kN/m: support moment -wl^2/8 = -11.25 kN*m, largest
        // sagging 9wl^2/128 = 6.328 kN*m (AISC Manual Table 3-23, two equal spans). With the stem
        // up, c_top = y (158.97 mm, the flange-down centroid) and c_bottom = 200 - y = 41.03 mm:
        // hogging gives top tension 11.25e3 * 0.15897 / I; sagging gives bottom tension only
        // 6.328e3 * 0.04103 / I, so the governing tension is at the top fibre over the support.
        String text = TestJobs.text("6 m", "    - { at: 0 m, type: pin }\n    - { at: 3 m, type: roller }\n    - { at: 6 m, type: roller }\n",
                        "  - { case: D, type: uniform, w: 10 kN/m }\n")
                .replace("  section: s\n", "  section: tee\n").replace("sections:\n", "sections:\n" + TEE)
                + "checks:\n  stress: true\n";
        AnalysisResult r = TestJobs.solve(text);
        List<CheckOutcome> checks = Checks.run(r);
        double y = (1800 * 90.0 + 4000 * 190.0) / 5800 * 1e-3;
        double i = (10 * Math.pow(180, 3) / 12 + 1800 * Math.pow(90 - y * 1e3, 2) + 200 * Math.pow(20, 3) / 12
                + 4000 * Math.pow(190 - y * 1e3, 2)) * 1e-12;
        double hogging = 10e3 * 3 * 3 / 8;
        CheckOutcome tension = find(checks, "stress-tension");
        assertEquals(hogging * y / i, tension.demand(), 1e-9 * tension.demand(), "Pa, M c_top / I");
        assertEquals(Measure.STRESS, tension.measure(), "reported as a stress (MPa in this job)");
        assertEquals(3.0, tension.at(), 1e-12, "over the interior support");
        assertTrue(tension.description().contains("top fibre, hogging moment"), tension.description());
        assertEquals(tension.demand() / 165e6, tension.ratio(), 1e-12, "against the 165 MPa allowable of the test material");
        // compression: sagging at the top fibre, 6.328 * 0.15897 = 1.006, beats hogging at the
        // bottom fibre, 11.25 * 0.04103 = 0.4616 (kN*m * m, both over I)
        CheckOutcome compression = find(checks, "stress-compression");
        assertTrue(compression.description().contains("top fibre, sagging moment"), compression.description());
        double sagging = 9 * 10e3 * 3 * 3 / 128;
        assertEquals(sagging * y / i, compression.demand(), 1e-9 * compression.demand());
        assertEquals(3 * 3.0 / 8, Math.min(compression.at(), 6 - compression.at()), 1e-9, "3l/8 from an end support");
    }

    @Test
    void shearStressAtTheNeutralAxisOfTheTeeAgainstTheShearAllowable() {
        // The same two spans, l = 3 m, w = 10 kN/m: the largest shear is 5wl/8 = 18.75 kN each side
        // of the interior support (AISC Manual Table 3-23, two equal spans). Shear formula
        // f_v = V Q / (I t) (elementary beam theory, common practice) at the neutral axis, which
        // lies y = 158.97 mm from the stem's free end (flange-down centroid, as above). Q is the
        // first moment of the stem below it about it: t y^2 / 2 = 10 mm * (158.97 mm)^2 / 2;
        // t = 10 mm, the stem. Against the test material's shear allowable of 100 MPa (its tension
        // allowable is 165 MPa: the ratio tells which one the check used).
        String text = TestJobs.text("6 m", "    - { at: 0 m, type: pin }\n    - { at: 3 m, type: roller }\n    - { at: 6 m, type: roller }\n",
                        "  - { case: D, type: uniform, w: 10 kN/m }\n")
                .replace("  section: s\n", "  section: tee\n").replace("sections:\n", "sections:\n" + TEE)
                + "checks:\n  stress: true\n";
        List<CheckOutcome> checks = Checks.run(TestJobs.solve(text));
        double y = (1800 * 90.0 + 4000 * 190.0) / 5800 * 1e-3;
        double i = (10 * Math.pow(180, 3) / 12 + 1800 * Math.pow(90 - y * 1e3, 2) + 200 * Math.pow(20, 3) / 12
                + 4000 * Math.pow(190 - y * 1e3, 2)) * 1e-12;
        double q = 0.010 * y * y / 2;
        double v = 5 * 10e3 * 3 / 8;
        double fv = v * q / (i * 0.010);
        CheckOutcome shear = find(checks, "stress-shear");
        assertEquals(fv, shear.demand(), 1e-9 * fv, "Pa, V Q / (I t)");
        assertEquals(100e6, shear.limit(), 1e-6, "the shear allowable, not the tension or compression one");
        assertEquals(fv / 100e6, shear.ratio(), 1e-12);
        assertEquals(3.0, shear.at(), 1e-9, "beside the interior support");
    }

    @Test
    void steppedCantileverDeflectionByTheUnitLoadMethod() {
        // Cantilever L = 6 m fixed at 0, EI1 over [0, 2 m], EI2 over [2 m, 6 m], P at the tip.
        // Unit load method by hand: delta = P (L^3 - (L - a)^3) / (3 EI1) + P (L - a)^3 / (3 EI2).
        String text = TestJobs.text("6 m", "    - { at: 0 m, type: fixed }\n", "  - { case: D, type: point, P: 25 kN, at: 6 m }\n")
                .replace("sections:\n", "sections:\n  stiff: { shape: given, I: 3e8 mm^4, depth: 300 mm, y_bottom: 150 mm }\n")
                .replace("loads:\n", "  segments:\n    - { from: 0 m, to: 2 m, section: stiff }\nloads:\n");
        AnalysisResult r = TestJobs.solve(text);
        double ei1 = 200e9 * 3e-4;
        double ei2 = TestJobs.EI;
        double expected = 25e3 * (216 - 64) / (3 * ei1) + 25e3 * 64 / (3 * ei2);
        assertEquals(expected, r.cases().get("D").deflection().max().value(), 1e-9 * expected);
    }

    @Test
    void deflectionLimitPerSpanAndForACantilever() {
        // Cantilever 6 m with w = 10 kN/m: tip deflection wL^4/(8EI) (AISC Table 3-23, case 18);
        // limit L/180 with twice the cantilever length (common practice): 2 * 6 m / 180
        String text = TestJobs.text("6 m", "    - { at: 0 m, type: fixed }\n", "  - { case: D, type: uniform, w: 10 kN/m }\n")
                + "checks:\n  deflection:\n    - { cases: [ D ], limit: L/180 }\n    - { cases: [ D ], max: 50 mm }\n";
        List<CheckOutcome> checks = Checks.run(TestJobs.solve(text));
        double tip = 10e3 * Math.pow(6, 4) / (8 * TestJobs.EI);
        CheckOutcome ratio = find(checks, "deflection-D-right-cantilever");
        assertEquals(tip, ratio.demand(), 1e-12, "metres");
        assertEquals(Measure.DEFLECTION, ratio.measure(), "reported as a deflection (mm in this job)");
        assertEquals(2 * 6.0 / 180, ratio.limit(), 1e-12);
        assertEquals(tip / (12.0 / 180), ratio.ratio(), 1e-12);
        CheckOutcome max = find(checks, "deflection-D-max");
        assertEquals(0.050, max.limit(), 1e-15);
        assertEquals(tip > 0.050, !max.pass());
    }
}
