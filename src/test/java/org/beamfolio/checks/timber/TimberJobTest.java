package org.beamfolio.checks.timber;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.beamfolio.TestJobs;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.design.timber.EffectiveLength;
import org.beamfolio.model.timber.LoadDuration;
import org.beamfolio.checks.CheckOutcome;
import org.junit.jupiter.api.Test;

/** Timber design of whole jobs, from the job file to the checks, against published examples and by hand. */
class TimberJobTest {
    static final double PSI = 4.4482216152605 / 0.00064516;
    static final double INCH = 0.0254;
    static final double FOOT = 0.3048;

    static String job(String materials, String sections, String beam, String loads, String rest) {
        return "beamfolio: 1\nproject: { title: Timber test, number: T-9 }\nreport: { units: US, paper: letter }\n"
                + "materials:\n" + materials + "sections:\n" + sections + "beam:\n" + beam + "loads:\n" + loads + rest;
    }

    /**
     * AWC beam design example (from memory of the AWC's published NDS beam example, as in
     * TimberDesignTest): 4x16 Douglas Fir-Larch Select Structural, Fb = 1,500 psi, Emin =
     * 690,000 psi, 20 ft simple span braced at the ends only, one concentrated load at midspan,
     * CD = 1.0: le = 375 in, RB = 21.6, FbE = 1,776 psi, CL = 0.876, Fb' = 1,313 psi. Here the
     * whole job: lumber size read and dressed, the Table 3.3.3 row chosen from the loading.
     */
    @Test
    void awcSawnBeamExampleThroughAWholeJob() {
        AnalysisResult r = TestJobs.solve(job("""
                  dfl:
                    timber: sawn
                    Fb: 1500 psi
                    Fv: 180 psi
                    Fc_perp: 625 psi
                    E: 1900 ksi
                    Emin: 690 ksi
                    size_factor: dimension
                    source: NDS Supplement Table 4A, Douglas Fir-Larch Select Structural
                """, "  b: { lumber: 4x16 }\n", """
                  length: 20 ft
                  section: b
                  material: dfl
                  supports:
                    - { at: 0 ft, type: pin }
                    - { at: 20 ft, type: roller }
                """, "  - { case: L, type: point, P: 1000 lb, at: 10 ft }\n", """
                combinations:
                  - { name: "L", factors: { L: 1.0 } }
                design:
                  timber: NDS-2018
                """));
        TimberDesignResult d = TimberBeamDesign.of(r);
        TimberDesignResult.Bending b = d.governingBending();
        assertEquals(EffectiveLength.CENTRE_LOAD, b.row(), "one load at the centre of a single span");
        assertEquals(375, b.le().le() / INCH, 0.5, "le = 1.37 lu + 3 d = 1.37 (240) + 3 (15.25)");
        assertEquals(21.6, b.adjusted().stability().rb(), 0.05);
        assertEquals(1776, b.adjusted().stability().fbe() / PSI, 1.0);
        assertEquals(0.876, b.adjusted().factor("CL"), 0.0005);
        assertEquals(1313, b.limit() / PSI, 1.0);
        assertEquals(LoadDuration.TEN_YEARS, b.cd());
        // fb = M / S by hand: M = P L / 4 = 1000 (20) / 4 = 5,000 lb ft; S = 3.5 (15.25)^2 / 6 = 135.66 in^3
        assertEquals(5000 * 12 / (3.5 * 15.25 * 15.25 / 6), b.fb() / PSI, 1e-6);
    }

    /**
     * AWC Technical Report 10 glulam example (from memory, as in TimberDesignTest): 6-3/4 x 13-1/2,
     * 24F-V4 (Fbx+ = 2,400 psi), 18 ft simple span, compression edge braced, CD = 1.0: CV = 0.98,
     * Fb' = 2,343 psi. Here the length between zero moments comes from the solved moment.
     */
    @Test
    void technicalReport10GlulamThroughAWholeJob() {
        AnalysisResult r = TestJobs.solve(job("""
                  gl:
                    timber: glulam
                    Fb: 2400 psi
                    Fb_neg: 1450 psi
                    Fv: 265 psi
                    Fc_perp: 650 psi
                    E: 1800 ksi
                    Emin: 950 ksi
                    source: 24F-V4 DF/DF
                """, "  g: { shape: rectangle, b: 6.75 in, h: 13.5 in }\n", """
                  length: 18 ft
                  section: g
                  material: gl
                  supports:
                    - { at: 0 ft, type: pin }
                    - { at: 18 ft, type: roller }
                  bracing: { top: continuous }
                """, "  - { case: L, type: uniform, w: 800 lb/ft }\n", """
                combinations:
                  - { name: "L", factors: { L: 1.0 } }
                design:
                  timber: NDS-2018
                """));
        TimberDesignResult.Bending b = TimberBeamDesign.of(r).governingBending();
        assertEquals(0, b.zeroMomentFrom() / FOOT, 1e-9);
        assertEquals(18, b.zeroMomentTo() / FOOT, 1e-9);
        assertEquals(0.98, b.adjusted().factor("CV"), 0.005);
        assertEquals(1.0, b.adjusted().factor("CL"), 0.0, "top edge braced continuously");
        assertEquals(2343, b.limit() / PSI, 1.0);
        assertNull(b.row(), "no Table 3.3.3 row where the edge is braced");
    }

    static final String SAWN_2X10 = """
              dfl2:
                timber: sawn
                Fb: 900 psi
                Fv: 180 psi
                Fc_perp: 625 psi
                E: 1600 ksi
                Emin: 580 ksi
                size_factor: dimension
            """;

    /**
     * Dead load alone governs through CD = 0.9 (NDS Table 2.3.2) although D + S has the larger
     * moment: by hand, D = 100 lb/ft and S = 30 lb/ft on 12 ft under ASCE 7-22 2.4.1 (D, and
     * D + 0.7S), fb is proportional to w, and 100 / 0.9 = 111.1 > 121 / 1.15 = 105.2.
     */
    @Test
    void deadLoadAloneGovernsThroughItsLoadDurationFactor() {
        AnalysisResult r = TestJobs.solve(job(SAWN_2X10, "  j: { lumber: 2x10 }\n", """
                  length: 12 ft
                  section: j
                  material: dfl2
                  supports:
                    - { at: 0 ft, type: pin }
                    - { at: 12 ft, type: roller }
                  bracing: { top: continuous }
                """, "  - { case: D, type: uniform, w: 100 lb/ft }\n  - { case: S, type: uniform, w: 30 lb/ft }\n",
                "combinations: ASCE7-ASD\ndesign:\n  timber: NDS-2018\n"));
        TimberDesignResult d = TimberBeamDesign.of(r);
        TimberDesignResult.Bending governing = d.governingBending();
        assertEquals("D", governing.combination());
        assertEquals(0.9, governing.cd().factor(), 0.0);
        TimberDesignResult.Bending withSnow = d.bending().stream().filter(b -> b.combination().equals("D + 0.7S"))
                .findFirst().orElseThrow(() -> new AssertionError(d.bending().stream().map(TimberDesignResult.Bending::combination).toList()));
        assertEquals(1.15, withSnow.cd().factor(), 0.0);
        assertTrue(Math.abs(withSnow.moment()) > Math.abs(governing.moment()), "D + S has the larger moment");
        // Fb' = 900 CD CF, CF = 1.1 (2x10, NDS Supplement Table 4A); fb = w L^2 / 8 / S, S = 1.5 (9.25)^2 / 6
        double s = 1.5 * 9.25 * 9.25 / 6;
        assertEquals(100 * 144 / 8.0 * 12 / s / (900 * 0.9 * 1.1), governing.ratio(), 1e-9);
        assertEquals(121 * 144 / 8.0 * 12 / s / (900 * 1.15 * 1.1), withSnow.ratio(), 1e-9);
        CheckOutcome bending = TimberChecks.outcomes(r).stream().filter(c -> c.id().equals("nds-bending")).findFirst().orElseThrow();
        assertEquals("D", bending.combination());
        assertEquals(governing.fb(), bending.demand(), 0.0, "the design's own fb, SI");
    }

    /** NDS 3.3.3.7: RB above 50 is refused, located at the beam. */
    @Test
    void slenderBeamIsBadInputAtTheBeam() {
        AnalysisResult r = TestJobs.solve(job(SAWN_2X10, "  j: { lumber: 2x12 }\n", """
                  length: 30 ft
                  section: j
                  material: dfl2
                  supports:
                    - { at: 0 ft, type: pin }
                    - { at: 30 ft, type: roller }
                """, "  - { case: D, type: uniform, w: 10 lb/ft }\n", "design:\n  timber: NDS-2018\n"));
        TimberInputException e = assertThrows(TimberInputException.class, () -> TimberBeamDesign.of(r));
        assertEquals("beam", e.keyPath());
        assertTrue(e.getMessage().contains("exceeds 50"), e.getMessage());
    }

    /**
     * Bearing, NDS 3.10: an interior support 4 in long takes Cb = (4 + 0.375) / 4 (Eq. 3.10-2);
     * an end support does not. Reactions by hand: two equal spans under w, the middle one 1.25 w L.
     */
    @Test
    void bearingAtAnInteriorSupportTakesTheBearingAreaFactor() {
        AnalysisResult r = TestJobs.solve(job(SAWN_2X10, "  j: { lumber: 2x10, plies: 2 }\n", """
                  length: 24 ft
                  section: j
                  material: dfl2
                  supports:
                    - { at: 0 ft, type: pin, bearing: 3 in }
                    - { at: 12 ft, type: roller, bearing: 4 in }
                    - { at: 24 ft, type: roller }
                  bracing: { top: continuous, bottom: continuous }
                """, "  - { case: D, type: uniform, w: 100 lb/ft }\n", "design:\n  timber: NDS-2018\n"));
        List<TimberDesignResult.Bearing> bearing = TimberBeamDesign.of(r).bearing();
        assertEquals(2, bearing.size());
        assertEquals(1.0, bearing.get(0).adjusted().factors().get(0).value(), 0.0, "end bearing: no Cb");
        assertEquals(4.375 / 4, bearing.get(1).adjusted().factors().get(0).value(), 1e-12);
        assertEquals(1.25 * 100 * 12 / (3.0 * 4), bearing.get(1).stress() / PSI, 1e-6, "1.25 w L / (b lb), b = 2 x 1.5 in");
        assertEquals(625 * 4.375 / 4, bearing.get(1).adjusted().value() / PSI, 1e-9);
    }

    /**
     * Long-term deflection, NDS 3.5.2: Kcr = 1.5 on D (permanent), L short-term; by hand the
     * midspan deflection 5 w L^4 / (384 E I) with w = 1.5 wD + wL.
     */
    @Test
    void longTermDeflectionAppliesCreepToThePermanentPart() {
        AnalysisResult r = TestJobs.solve(job(SAWN_2X10, "  j: { lumber: 2x10 }\n", """
                  length: 12 ft
                  section: j
                  material: dfl2
                  supports:
                    - { at: 0 ft, type: pin }
                    - { at: 12 ft, type: roller }
                  bracing: { top: continuous }
                """, "  - { case: D, type: uniform, w: 20 lb/ft }\n  - { case: L, type: uniform, w: 50 lb/ft }\n",
                "design:\n  timber: NDS-2018\nchecks:\n  deflection:\n    - { cases: [ D, L ], limit: L/240 }\n"));
        TimberDesignResult.LongTerm lt = TimberBeamDesign.of(r).deflection().get(0);
        assertEquals(List.of("D"), lt.longTermCases());
        double w = (1.5 * 20 + 50) / 12.0; // lb/in
        double l = 144;
        double i = 1.5 * Math.pow(9.25, 3) / 12;
        assertEquals(5 * w * Math.pow(l, 4) / (384 * 1.6e6 * i), lt.deflection() / INCH, 1e-9);
        assertEquals(l / 240, lt.allowed() / INCH, 1e-12);
    }

    /** Glulam in hogging takes Fb- (the compression zone stressed in tension): a cantilever. */
    @Test
    void glulamCantileverUsesFbNegative() {
        AnalysisResult r = TestJobs.solve(job("""
                  gl:
                    timber: glulam
                    Fb: 2400 psi
                    Fb_neg: 1450 psi
                    Fv: 265 psi
                    Fc_perp: 650 psi
                    E: 1800 ksi
                    Emin: 950 ksi
                """, "  g: { shape: rectangle, b: 5.125 in, h: 12 in }\n", """
                  length: 6 ft
                  section: g
                  material: gl
                  supports:
                    - { at: 0 ft, type: fixed }
                  bracing: { bottom: continuous }
                """, "  - { case: D, type: uniform, w: 100 lb/ft }\n", "design:\n  timber: NDS-2018\n"));
        TimberDesignResult.Bending b = TimberBeamDesign.of(r).governingBending();
        assertTrue(b.hogging());
        assertEquals(1450 * PSI, b.adjusted().reference(), 1e-6);
        assertNotNull(b.adjusted());
    }

    /**
     * NDS 2018 3.4.3.1(a), by hand: a 2x10 (d = 9.25 in) on 12 ft with 3.5 in bearings; the
     * uniform load within d of each face (11 in from each support's centre) is left out, and a
     * 200 lb load 6 in from the left support's centre (x = 4.25 in from the face) counts
     * x / d of itself. The largest shear is then the left reaction of what remains.
     */
    @Test
    void shearLeavesOutTheLoadsWithinDOfTheBearings() {
        AnalysisResult r = TestJobs.solve(job(SAWN_2X10, "  j: { lumber: 2x10 }\n", """
                  length: 12 ft
                  section: j
                  material: dfl2
                  supports:
                    - { at: 0 ft, type: pin, bearing: 3.5 in }
                    - { at: 12 ft, type: roller, bearing: 3.5 in }
                  bracing: { top: continuous }
                """, "  - { case: D, type: uniform, w: 120 lb/ft }\n  - { case: D, type: point, P: 200 lb, at: 6 in }\n",
                "design:\n  timber: NDS-2018\n"));
        TimberDesignResult.Shear s = TimberBeamDesign.of(r).governingShear();
        assertTrue(s.nearSupportsReduced());
        double w = 10; // lb/in
        double loaded = 144 - 2 * 11;
        double p = 200 * 4.25 / 9.25;
        double left = w * loaded / 2 + p * (144 - 6) / 144;
        assertEquals(left, Math.abs(s.v()) / 4.4482216152605, 1e-6, "V = w (144 - 22) / 2 + P (x/d) (138/144), lb");
        assertEquals(1.5 * left / (1.5 * 9.25), s.fv() / PSI, 1e-6);
        // the bending check keeps every load: M at midspan from the whole uniform load and the whole point load
        TimberDesignResult.Bending b = TimberBeamDesign.of(r).governingBending();
        assertTrue(Math.abs(b.moment()) / (4.4482216152605 * 0.0254) > w * 144 * 144 / 8, "bending is not reduced");
    }
}
