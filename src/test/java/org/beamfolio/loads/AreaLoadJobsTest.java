package org.beamfolio.loads;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.beamfolio.TestJobs;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.Response;
import org.beamfolio.model.Job;
import org.beamfolio.model.Load;
import org.beamfolio.units.Units;
import org.junit.jupiter.api.Test;

/**
 * Area loads through a whole job: read, taken off into line loads, reduced, solved. Reactions are
 * checked by statics worked by hand beside each check.
 */
public class AreaLoadJobsTest {
    static final double LB = Units.POUND_FORCE;
    static final double FT = Units.FOOT;

    /** A simple span of the given length (ft) on a pin and a roller, with these area loads, design and loads. */
    public static String job(double spanFt, String areaLoads, String design, String loads) {
        return TestJobs.header()
                + "beam:\n  length: " + spanFt + " ft\n  section: s\n  material: m\n  supports:\n"
                + "    - { at: 0 ft, type: pin }\n    - { at: " + spanFt + " ft, type: roller }\n"
                + "area_loads:\n" + areaLoads + (design.isEmpty() ? "" : "design:\n" + design) + "loads:\n" + loads;
    }

    static double[] reactionsLb(AnalysisResult r, String loadCase) {
        Response c = r.cases().get(loadCase);
        return new double[] {c.reactionForce()[0] / LB, c.reactionForce()[1] / LB};
    }

    @Test
    void aConstantWidthGivesPressureTimesWidthAndHalfTheTotalAtEachSupport() {
        AnalysisResult r = TestJobs.solve(job(24, "  office: { D: 15 psf, L: 50 psf, note: office floor }\n", "",
                "  - { type: area, load: office, width: 10 ft }\n"));
        // by hand, statics: w = 50 psf x 10 ft = 500 lb/ft; R = w L / 2 = 500 x 24 / 2 = 6000 lb each
        assertEquals(6000, reactionsLb(r, "L")[0], 1e-9);
        assertEquals(6000, reactionsLb(r, "L")[1], 1e-9);
        // D: 15 psf x 10 ft = 150 lb/ft; R = 150 x 24 / 2 = 1800 lb
        assertEquals(1800, reactionsLb(r, "D")[0], 1e-9);
        List<Load> loads = r.job().loads();
        assertEquals(2, loads.size());
        Load.Distributed live = (Load.Distributed) loads.get(1);
        assertEquals("L", live.loadCase());
        assertTrue(live.uniform());
        assertEquals(500 * LB / FT, live.wStart(), 1e-9);
        assertEquals("area load office: office floor", live.note());
    }

    @Test
    void aWidthVaryingFromFourToTenFeetGivesATrapezoidAndItsReactions() {
        AnalysisResult r = TestJobs.solve(job(12, "  floor: { L: 50 psf }\n", "",
                "  - { type: area, load: floor, width: [ 4 ft, 10 ft ], from: 0 ft, to: 12 ft }\n"));
        // by hand, statics: w = 50 psf x 4 ft = 200 lb/ft at x = 0 to 50 x 10 = 500 lb/ft at x = 12 ft.
        // Uniform 200 lb/ft: 2400 lb, 1200 lb at each end. Triangle 0 to 300 lb/ft: 1800 lb with its
        // centroid at 2/3 of the span: R_left = 1800 / 3 = 600 lb, R_right = 1200 lb.
        // R_left = 1200 + 600 = 1800 lb, R_right = 1200 + 1200 = 2400 lb.
        assertEquals(1800, reactionsLb(r, "L")[0], 1e-9);
        assertEquals(2400, reactionsLb(r, "L")[1], 1e-9);
        Load.Distributed d = (Load.Distributed) r.job().loads().get(0);
        assertFalse(d.uniform());
        assertEquals(200 * LB / FT, d.wStart(), 1e-9);
        assertEquals(500 * LB / FT, d.wEnd(), 1e-9);
        assertEquals(1, r.job().takeOff().lines().size());
        assertEquals(7 * 12 * FT * FT, r.job().takeOff().lines().get(0).tributary().area(), 1e-12, "(4 + 10) / 2 x 12 = 84 ft^2");
    }

    @Test
    void aPartWidthOverPartOfTheSpanLoadsOnlyThere() {
        AnalysisResult r = TestJobs.solve(job(20, "  strip: { D: 100 psf }\n", "",
                "  - { type: area, load: strip, width: 2 ft, from: 0 ft, to: 10 ft }\n"));
        // by hand, statics: 100 psf x 2 ft = 200 lb/ft over 10 ft = 2000 lb at x = 5 ft;
        // R_right = 2000 x 5 / 20 = 500 lb, R_left = 1500 lb
        assertEquals(1500, reactionsLb(r, "D")[0], 1e-9);
        assertEquals(500, reactionsLb(r, "D")[1], 1e-9);
    }

    @Test
    void theReducedLiveLoadIsWhatTheCaseReactionsCarry() {
        String areas = "  office: { D: 15 psf, L: 50 psf, reducible: [ L ] }\n";
        String loads = "  - { type: area, load: office, width: 10 ft }\n";
        AnalysisResult r = TestJobs.solve(job(30, areas, "  live_load_reduction: { KLL: 2 }\n", loads));
        // AT = 10 ft x 30 ft = 300 ft^2, KLL AT = 600 ft^2 >= 400: L / Lo = 0.25 + 15 / sqrt(600) = 0.8624
        // (ASCE/SEI 7-22 4.7.2, Eq. 4.7-1, by hand). Unreduced R = 500 lb/ft x 30 ft / 2 = 7500 lb.
        double factor = 0.25 + 15 / Math.sqrt(600);
        assertEquals(0.8624, factor, 5e-5);
        assertEquals(7500 * factor, reactionsLb(r, "L")[0], 1e-9);
        assertEquals(7500 * factor, reactionsLb(r, "L")[1], 1e-9);
        assertEquals(2250, reactionsLb(r, "D")[0], 1e-9, "dead load is never reduced: 150 lb/ft x 30 / 2");
        TakeOff t = r.job().takeOff();
        assertEquals(300, t.areas().get(0).area() / (FT * FT), 1e-9);
        assertTrue(t.outcomes().get(0).reduction().applied());
        // the same job without the reduction carries the whole live load
        AnalysisResult unreduced = TestJobs.solve(job(30, areas, "", loads));
        assertEquals(7500, reactionsLb(unreduced, "L")[0], 1e-9);
        assertFalse(unreduced.job().takeOff().outcomes().get(0).reduction().applied());
    }

    @Test
    void theResultsFileCarriesTheReducedLiveLoadInItsReactionsByCase() throws Exception {
        String text = job(30, "  office: { D: 15 psf, L: 50 psf, reducible: [ L ] }\n", "  live_load_reduction: { KLL: 2 }\n",
                "  - { type: area, load: office, width: 10 ft }\n").replace("units: SI", "units: US");
        String json = org.beamfolio.results.ResultsWriter.write(TestJobs.solve(text), List.of());
        com.fasterxml.jackson.databind.JsonNode byCase = new com.fasterxml.jackson.databind.ObjectMapper().readTree(json).get("reactions_by_case");
        // as above: 7500 lb x (0.25 + 15 / sqrt(600)) = 6467.8 lb at each support (ASCE/SEI 7-22 4.7.2, by hand)
        assertEquals(7500 * (0.25 + 15 / Math.sqrt(600)), byCase.get(0).get("cases").get("L").asDouble(), 1e-6);
        assertEquals(6467.8, byCase.get(1).get("cases").get("L").asDouble(), 0.05);
        assertEquals(2250, byCase.get(0).get("cases").get("D").asDouble(), 1e-6);
    }

    @Test
    void widthsOnBothSidesOfTheBeamAddUpToTheTributaryArea() {
        Job j = TestJobs.job(job(20, "  office: { L: 40 psf, reducible: [ L ] }\n", "  live_load_reduction: { KLL: 2 }\n",
                "  - { type: area, load: office, width: 6 ft }\n  - { type: area, load: office, width: [ 6 ft, 2 ft ] }\n"));
        // AT = 6 x 20 + (6 + 2) / 2 x 20 = 120 + 80 = 200 ft^2; KLL AT = 400 ft^2, just permitted:
        // 0.25 + 15 / sqrt(400) = 0.25 + 0.75 = 1.0 (by hand, ASCE/SEI 7-22 4.7.2)
        assertEquals(200, j.takeOff().areas().get(0).area() / (FT * FT), 1e-9);
        assertEquals(1.0, j.takeOff().outcomes().get(0).reduction().factor(), 1e-12);
    }

    @Test
    void anAreaLoadInKilopascalsOverMetresGivesKilonewtonsPerMetre() {
        Job j = TestJobs.job(job(20, "  roof: { D: 1.5 kPa, Lr: 0.96 kPa }\n", "",
                "  - { type: area, load: roof, width: 3 m }\n"));
        // 1.5 kPa x 3 m = 4.5 kN/m; 0.96 x 3 = 2.88 kN/m (by hand)
        assertEquals(4500, ((Load.Distributed) j.loads().get(0)).wStart(), 1e-9);
        assertEquals(2880, ((Load.Distributed) j.loads().get(1)).wStart(), 1e-9);
    }

    @Test
    void theRoofLiveLoadIsReducedByR1AndR2() {
        Job j = TestJobs.job(job(40, "  roof: { D: 15 psf, Lr: 20 psf, reducible: [ Lr ] }\n",
                "  roof_live_load_reduction: { rise: 4 }\n", "  - { type: area, load: roof, width: 10 ft }\n"));
        // AT = 400 ft^2: R1 = 1.2 - 0.001 x 400 = 0.8; F = 4: R2 = 1; Lr = 20 x 0.8 = 16 psf, not below 12
        // (ASCE/SEI 7-22 4.8.2, Eq. 4.8-1 and 4.8-2, by hand): 16 psf x 10 ft = 160 lb/ft
        Load.Distributed lr = (Load.Distributed) j.loads().get(1);
        assertEquals("Lr", lr.loadCase());
        assertEquals(160 * LB / FT, lr.wStart(), 1e-9);
    }
}
