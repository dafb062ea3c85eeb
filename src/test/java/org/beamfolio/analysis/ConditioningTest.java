package org.beamfolio.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.beamfolio.TestJobs;
import org.beamfolio.model.Job;
import org.beamfolio.model.Load;
import org.junit.jupiter.api.Test;

/**
 * Badly conditioned beams still satisfy equilibrium (statics closes the solution), and the
 * conditioning estimate says when a model is close to singular. Invented test cases.
 */
class ConditioningTest {
    static void balances(AnalysisResult r) {
        Job job = r.job();
        Response all = r.combinations().get(r.combinations().size() - 1).response();
        double[] residual = TestJobs.relativeResiduals(job, all);
        assertEquals(0, residual[0], 1e-12, "vertical equilibrium");
        assertEquals(0, residual[1], 1e-12, "moment equilibrium");
        double m = Math.max(Math.abs(all.moment().max().value()), Math.abs(all.moment().min().value()));
        assertEquals(0, all.moment().leftOf(job.beam().length()) / m, 1e-9, "no moment at the roller end");
    }

    @Test
    void aVeryStiffSpringActsAsARigidSupport() {
        String supports = "    - { at: 0 m, type: pin }\n    - { at: 3 m, type: SPRING }\n    - { at: 6 m, type: roller }\n";
        String loads = "  - { case: D, type: uniform, w: 10 kN/m }\n";
        AnalysisResult stiff = TestJobs.solve(TestJobs.text("6 m", supports.replace("SPRING", "spring, k: 1e12 kN/mm"), loads));
        AnalysisResult rigid = TestJobs.solve(TestJobs.text("6 m", supports.replace("SPRING", "roller"), loads));
        balances(stiff);
        // two equal spans, uniform load: centre reaction 10wl/8 (AISC Manual Table 3-23)
        assertEquals(10 * 10e3 * 3 / 8, stiff.cases().get("D").reactionForce()[1], 1e-6 * 37.5e3);
        assertEquals(rigid.cases().get("D").reactionForce()[1], stiff.cases().get("D").reactionForce()[1], 1e-6 * 37.5e3);
    }

    @Test
    void aVeryShortSpanBesideLongOnes() {
        AnalysisResult r = TestJobs.solve(TestJobs.text("40.01 m", "    - { at: 0 m, type: pin }\n    - { at: 20 m, type: roller }\n"
                + "    - { at: 20.01 m, type: roller }\n    - { at: 40.01 m, type: roller }\n",
                "  - { case: D, type: uniform, w: 10 kN/m }\n  - { case: D, type: point, P: 50 kN, at: 7 m }\n"));
        balances(r);
        // A 10 mm span between two rollers nearly clamps the long spans' ends there, so each long
        // span is close to a propped cantilever: pin at 0, fixed at 20 m (the limit as the short span
        // goes to nothing; propped-cantilever formulas, AISC Manual Table 3-23, from memory):
        // uniform load: R = 3 w L / 8 = 75 kN; P at a = 13 m from the fixed end: R = P a^2 (3L - a) / (2 L^3).
        // The short span's rotational stiffness, about 2EI/0.01 m against 3EI/20 m, leaves the end
        // rotation some 1e-3 of a pinned end's, so the reaction is good to about 0.1 kN.
        double propped = 3 * 10e3 * 20 / 8 + 50e3 * 13 * 13 * (3 * 20 - 13) / (2 * Math.pow(20, 3));
        assertEquals(propped, r.cases().get("D").reactionForce()[0], 0.1e3, "left pin as a propped cantilever's");
        // and the same at the right end, with the uniform load only: 3 w L / 8
        assertEquals(3 * 10e3 * 20 / 8, r.cases().get("D").reactionForce()[3], 0.1e3, "right roller");
    }

    @Test
    void stiffnessVaryingByAMillionBetweenSegments() {
        String text = TestJobs.text("6 m", "    - { at: 0 m, type: fixed }\n    - { at: 6 m, type: roller }\n",
                "  - { case: D, type: uniform, w: 10 kN/m }\n")
                .replace("sections:\n", "sections:\n  soft: { shape: given, I: 100 mm^4, depth: 300 mm, y_bottom: 150 mm }\n")
                .replace("loads:\n", "  segments:\n    - { from: 2 m, to: 4 m, section: soft }\nloads:\n");
        AnalysisResult r = TestJobs.solve(text);
        balances(r);
    }

    @Test
    void theEstimateFlagsANearMechanism() {
        // the part past a hinge held only by a spring a millionth as stiff as the beam
        String text = TestJobs.text("6 m", "    - { at: 0 m, type: fixed }\n    - { at: 3 m, type: roller }\n"
                        + "    - { at: 6 m, type: spring, k: 0.0001 kN/m }\n", "  - { case: D, type: uniform, w: 10 kN/m }\n")
                .replace("loads:\n", "  hinges: [ 4.5 m ]\nloads:\n");
        AnalysisResult poor = TestJobs.solve(text);
        balances(poor);
        assertTrue(poor.pivotRatio() < AnalysisResult.POOR_CONDITIONING, "ratio " + poor.pivotRatio());
        AnalysisResult good = TestJobs.solve(TestJobs.text("6 m", "    - { at: 0 m, type: pin }\n    - { at: 6 m, type: roller }\n",
                "  - { case: D, type: uniform, w: 10 kN/m }\n"));
        assertTrue(good.pivotRatio() > 0.01, "ratio " + good.pivotRatio());
    }

    @Test
    void aNumericallySingularModelIsRefusedWithAReason() {
        // the same, with the spring a further million times softer: below working precision
        String text = TestJobs.text("6 m", "    - { at: 0 m, type: fixed }\n    - { at: 3 m, type: roller }\n"
                        + "    - { at: 6 m, type: spring, k: 1e-10 kN/m }\n", "  - { case: D, type: uniform, w: 10 kN/m }\n")
                .replace("loads:\n", "  hinges: [ 4.5 m ]\nloads:\n");
        UnstableBeamException e = org.junit.jupiter.api.Assertions.assertThrows(UnstableBeamException.class,
                () -> Analysis.run(TestJobs.job(text)));
        assertTrue(e.getMessage().contains("singular"), e.getMessage());
    }
}
