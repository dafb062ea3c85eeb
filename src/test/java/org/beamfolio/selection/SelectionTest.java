package org.beamfolio.selection;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Comparator;
import java.util.List;
import org.beamfolio.TestJobs;
import org.beamfolio.analysis.Analysis;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.checks.CheckOutcome;
import org.beamfolio.checks.Checks;
import org.beamfolio.model.Job;
import org.beamfolio.model.Load;
import org.beamfolio.model.Section;
import org.beamfolio.model.SectionChoice;
import org.junit.jupiter.api.Test;

/**
 * The search for the lightest section that passes, checked by hand: the chosen candidate passes
 * and the next lighter one fails, by the check and ratio worked out below.
 */
class SelectionTest {
    /**
     * A 20 ft simple span, top flange braced continuously (so sagging flexure is plastic, F2.1),
     * A992 (Fy = 50 ksi), LRFD, D = 0.5 klf and L = 1.5 klf, no self weight:
     * wu = 1.2 (0.5) + 1.6 (1.5) = 3.0 klf and Mu = 3.0 (20)^2 / 8 = 150 kip*ft (by hand).
     */
    private static String steelBeam(String choose, boolean selfWeight) {
        return TestJobs.chosenFloorBeam(choose, selfWeight);
    }

    private static Job resolve(String text) throws Exception {
        return Selection.resolve(TestJobs.job(text));
    }

    private static SectionChoice choiceOf(Job job) {
        return job.sections().get(job.beam().section()).choice();
    }

    private static List<String> names(List<SectionChoice.Trial> tried) {
        return tried.stream().map(t -> t.section().designation()).toList();
    }

    @Test
    void theLightestListedShapeThatPassesIsChosenAndTheNextLighterFailsInFlexure() throws Exception {
        Job job = resolve(steelBeam("[ W12X26, W14X22, W16X26, W18X35 ]", false));
        SectionChoice choice = choiceOf(job);
        // tried by weight, lightest first; W12X26 and W16X26 weigh the same and the shallower goes first;
        // W16X26 passes, so the heavier W18X35 is never tried
        assertEquals(List.of("W14X22", "W12X26", "W16X26"), names(choice.tried()));
        assertEquals("W16X26", job.sections().get("b1").designation());
        // AISC Manual (15th ed.) Table 3-2, Zx from memory: W14X22 33.2 in^3, W12X26 37.2, W16X26 44.2; all compact
        // flanges, so phi Mn = 0.9 x 50 ksi x Zx = 124.5, 139.5 and 165.75 kip*ft (the table's 125, 140, 166)
        SectionChoice.Trial w14 = choice.tried().get(0);
        SectionChoice.Trial w12 = choice.tried().get(1);
        SectionChoice.Trial w16 = choice.tried().get(2);
        assertTrue(w16.pass());
        assertSame(w16, choice.chosen());
        assertTrue(w16.governing().startsWith("flexure"), w16.governing());
        assertEquals(150 / 165.75, w16.ratio(), 1e-9);
        // the next lighter one, W12X26, fails in flexure: 150 / 139.5 = 1.075
        assertFalse(w12.pass());
        assertTrue(w12.governing().startsWith("flexure"), w12.governing());
        assertEquals(150 / 139.5, w12.ratio(), 1e-9);
        assertEquals(150 / 124.5, w14.ratio(), 1e-9);
        // weight per length is the catalogue's W: 26 lb/ft = 26 x 4.4482216152605 N / 0.3048 m
        assertEquals(26 * 4.4482216152605 / 0.3048, w16.weight(), 1e-9);
    }

    @Test
    void whenNothingPassesTheLowestRatioIsUsedAndMarkedFailing() throws Exception {
        Job job = resolve(steelBeam("[ W14X22, W12X26 ]", false));
        SectionChoice choice = choiceOf(job);
        assertEquals(List.of("W14X22", "W12X26"), names(choice.tried()));
        assertFalse(choice.passing());
        // the lowest governing ratio is W12X26's, 150 / 139.5 = 1.075 (by hand, above), 7.5 % over
        assertEquals("W12X26", choice.chosen().section().designation());
        assertEquals("W12X26", job.sections().get("b1").designation());
        assertEquals(150 / 139.5, choice.chosen().ratio(), 1e-9);
    }

    @Test
    void theChosenSectionsRatioIsTheOneThePackagesChecksGive() throws Exception {
        Job job = resolve(steelBeam("[ W12X26, W14X22, W16X26, W18X35 ]", true));
        AnalysisResult result = Analysis.run(job);
        List<CheckOutcome> checks = Checks.run(result);
        CheckOutcome governing = checks.stream().max(Comparator.comparingDouble(CheckOutcome::ratio)).orElseThrow();
        SectionChoice.Trial chosen = choiceOf(job).chosen();
        assertEquals(governing.id(), chosen.governing());
        assertEquals(governing.ratio(), chosen.ratio(), 0.0);
        // the self weight is the chosen shape's own tabulated W, added to D
        Load.Distributed selfWeight = result.loads().stream().filter(l -> l instanceof Load.Distributed d && d.note() != null
                && d.note().startsWith("self weight")).map(l -> (Load.Distributed) l).findFirst().orElseThrow();
        assertTrue(selfWeight.note().contains(chosen.section().designation()), selfWeight.note());
        // with the self weight of W16X26 (26 lb/ft): wu = 1.2 (0.526) + 1.6 (1.5) = 3.0312 klf, Mu = 151.56 kip*ft,
        // still under 165.75 kip*ft (by hand), so the same shape is chosen
        assertEquals("W16X26", chosen.section().designation());
        assertEquals(151.56 / 165.75, chosen.ratio(), 1e-9);
    }

    /**
     * A 12 ft simple span of Douglas Fir-Larch No. 2 (Fb 900 psi, NDS Supplement Table 4A, as typed
     * in the job), top edge braced (CL = 1.0), dry, normal temperature, not repetitive, no self
     * weight: D + L = 30 + 85 = 115 plf, CD = 1.0 (live load, ten years), M = 115 (12)^2 / 8 =
     * 2,070 lb*ft = 24,840 lb*in (by hand). Size factors CF for Fb, NDS Supplement Table 4A (from
     * memory): 2x8 1.2, 2x10 1.1, 2x12 1.0. S = b d^2 / 6 with b = 1.5 in: 2x8 13.14, 2x10 21.39,
     * 2x12 31.64 in^3.
     */
    @Test
    void theSmallestLumberThatPassesIsChosenAndTheNextSmallerFailsInBending() throws Exception {
        String text = """
                beamfolio: 1
                project: { title: Test joist, number: T-42 }
                report: { units: US }
                materials:
                  dfl2: { timber: sawn, Fb: 900 psi, Fv: 180 psi, Fc_perp: 625 psi, E: 1600 ksi, Emin: 580 ksi }
                sections:
                  j1: { choose: { lumber: [ 2x12, 2x8, 2x10 ] } }
                beam:
                  length: 12 ft
                  section: j1
                  material: dfl2
                  bracing: { top: continuous }
                  supports:
                    - { at: 0 ft, type: pin }
                    - { at: 12 ft, type: roller }
                loads:
                  - { case: D, type: uniform, w: 30 lb/ft }
                  - { case: L, type: uniform, w: 85 lb/ft }
                combinations: ASCE7-ASD
                design:
                  timber: NDS-2018
                  timber_service: { wet: false, temperature: normal, repetitive: false, incised: false }
                """;
        Job job = resolve(text);
        SectionChoice choice = choiceOf(job);
        // tried by area, smallest first, whatever order they are listed in
        assertEquals(List.of("2x8", "2x10", "2x12"), choice.tried().stream().map(t -> t.section().lumber().designation()).toList());
        Section chosen = job.sections().get("j1");
        assertEquals("2x12", chosen.lumber().designation());
        double m = 24_840;
        SectionChoice.Trial s2x10 = choice.tried().get(1);
        SectionChoice.Trial s2x12 = choice.tried().get(2);
        // 2x10 fails in bending: fb = 24,840 / 21.39 = 1,161 psi against Fb' = 900 x 1.1 = 990 psi, ratio 1.173
        assertFalse(s2x10.pass());
        assertEquals("nds-bending", s2x10.governing());
        assertEquals(m / 21.390625 / 990, s2x10.ratio(), 1e-9);
        // 2x12 passes: fb = 24,840 / 31.64 = 785 psi against Fb' = 900 psi, ratio 0.872
        assertTrue(s2x12.pass());
        assertEquals("nds-bending", s2x12.governing());
        assertEquals(m / 31.640625 / 900, s2x12.ratio(), 1e-9);
        // 2x8: 24,840 / 13.14 / 1,080 = 1.750
        assertEquals(m / 13.140625 / 1080, choice.tried().get(0).ratio(), 1e-9);
        // no density: the weight is unknown, the area is b x d (1.5 x 11.25 in)
        assertTrue(Double.isNaN(s2x12.weight()));
        assertEquals(1.5 * 11.25 * 0.0254 * 0.0254, s2x12.area(), 1e-15);
    }

    /**
     * A 20 ft simple span of 24F-V4 glulam (Fb 2,400 psi, NDS Supplement Table 5A, as typed in the
     * job), 5-1/8 in wide, depths of 1-1/2 in laminations from 9 to 12 in; top edge braced (CL =
     * 1.0); CV = (21/20)^0.1 (12/d)^0.1 (5.125/5.125)^0.1 is above 1.0 for d of 12 in or less, so
     * 1.0 (NDS 5.3.6); no self weight. D + L = 100 + 340 = 440 plf, CD = 1.0, M = 440 (20)^2 / 8 =
     * 22,000 lb*ft = 264,000 lb*in (by hand). S = 5.125 d^2 / 6: 69.19, 94.17 and 123.0 in^3.
     */
    @Test
    void theShallowestGlulamThatPassesIsChosenAndTheNextShallowerFailsInBending() throws Exception {
        String text = """
                beamfolio: 1
                project: { title: Test glulam beam, number: T-45 }
                report: { units: US }
                materials:
                  gl: { timber: glulam, Fb: 2400 psi, Fv: 265 psi, Fc_perp: 650 psi, E: 1800 ksi, Emin: 950 ksi }
                sections:
                  g1: { choose: { widths: [ 5-1/8 in ], depth_min: 9 in, depth_max: 12 in } }
                beam:
                  length: 20 ft
                  section: g1
                  material: gl
                  bracing: { top: continuous }
                  supports:
                    - { at: 0 ft, type: pin }
                    - { at: 20 ft, type: roller }
                loads:
                  - { case: D, type: uniform, w: 100 lb/ft }
                  - { case: L, type: uniform, w: 340 lb/ft }
                combinations: ASCE7-ASD
                design: { timber: NDS-2018 }
                """;
        Job job = resolve(text);
        SectionChoice choice = choiceOf(job);
        assertEquals(3, choice.tried().size());
        double inch = 0.0254;
        assertEquals(12 * inch, ((org.beamfolio.model.SectionShape.Rectangle) job.sections().get("g1").shape()).h(), 1e-12);
        // 10-1/2 in fails in bending: 264,000 / 94.17 = 2,803 psi against 2,400 psi, ratio 1.168
        SectionChoice.Trial d105 = choice.tried().get(1);
        assertFalse(d105.pass());
        assertEquals("nds-bending", d105.governing());
        assertEquals(264_000 / (5.125 * 10.5 * 10.5 / 6) / 2400, d105.ratio(), 1e-9);
        // 12 in passes: 264,000 / 123.0 = 2,146 psi, ratio 0.894
        SectionChoice.Trial d12 = choice.tried().get(2);
        assertTrue(d12.pass());
        assertEquals(264_000 / 123.0 / 2400, d12.ratio(), 1e-9);
    }

    @Test
    void aJobThatNamesItsSectionIsLeftAsItIs() throws Exception {
        Job named = TestJobs.job(steelBeam("[ W16X26 ]", false).replace("{ choose: [ W16X26 ] }", "{ designation: W16X26 }"));
        assertSame(named, Selection.resolve(named));
    }
}
