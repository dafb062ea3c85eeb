package org.beamfolio.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.beamfolio.TestJobs;
import org.beamfolio.model.Job;
import org.beamfolio.model.ReportSettings;
import org.beamfolio.units.ReportUnits;
import org.junit.jupiter.api.Test;

/** The take-off table and the live load reduction as the package prints them, every step and every reason. */
class TakeOffPartTest {
    static String job(double spanFt, String areaLoads, String design, String loads) {
        return org.beamfolio.loads.AreaLoadJobsTest.job(spanFt, areaLoads, design, loads).replace("units: SI", "units: US");
    }

    static ReportModel.AreaLoads printed(String text) {
        Job j = TestJobs.job(text);
        return new TakeOffPart(j.takeOff(), j.report().units(), new Texts(ReportUnits.of(org.beamfolio.units.UnitSystem.US), ReportSettings.Positions.DECIMAL)).build();
    }

    static String working(ReportModel.AreaLoads a) {
        return String.join("\n", a.reduction().stream().map(e -> String.join(" | ", e.statement(), e.symbolic(), e.substituted(),
                e.result(), e.source())).toList());
    }

    @Test
    void everyStepOfTheTakeOffAndTheReductionIsPrinted() {
        ReportModel.AreaLoads a = printed(job(30, "  office: { D: 15 psf, L: 50 psf, reducible: [ L ], note: office floor }\n",
                "  live_load_reduction: { KLL: 2 }\n", "  - { type: area, load: office, width: 10 ft, note: bay C }\n"));
        // 15 psf x 10 ft = 150 lb/ft; 50 psf x 10 ft = 500 lb/ft; x 0.8624 (0.25 + 15 / sqrt(2 x 300),
        // ASCE/SEI 7-22 4.7.2) = 431.2 lb/ft, by hand
        assertEquals(List.of("office", "D", "15 psf × 10 ft = 150 lb/ft", "none", "150 lb/ft", "0 ft to 30 ft", "office floor; bay C"),
                a.takeOff().rows().get(0));
        assertEquals(List.of("office", "L", "50 psf × 10 ft = 500 lb/ft", "× 0.8624", "431.2 lb/ft", "0 ft to 30 ft", "office floor; bay C"),
                a.takeOff().rows().get(1));
        String w = working(a);
        assertTrue(w.contains("AT = 300 ft²"), w);
        assertTrue(w.contains("office (10 ft + 10 ft) / 2 × 30 ft = 300 ft²"), w);
        assertTrue(w.contains("KLL = 2"), w);
        assertTrue(w.contains("KLL AT = 2 × 300 ft² = 600 ft² ≥ 400 ft²"), w);
        assertTrue(w.contains("L / Lo = 0.8624"), w);
        assertTrue(w.contains("ASCE/SEI 7-22 4.7.2"), w);
    }

    @Test
    void aVaryingWidthShowsBothEnds() {
        ReportModel.AreaLoads a = printed(job(12, "  floor: { L: 50 psf }\n", "",
                "  - { type: area, load: floor, width: [ 4 ft, 10 ft ] }\n"));
        assertEquals("50 psf × 4 ft = 200 lb/ft to 50 psf × 10 ft = 500 lb/ft", a.takeOff().rows().get(0).get(2));
        assertEquals("200 lb/ft to 500 lb/ft", a.takeOff().rows().get(0).get(4));
    }

    @Test
    void belowFourHundredSquareFeetNoReductionAndTheReasonIsPrinted() {
        // AT = 10 x 15 = 150 ft^2, KLL AT = 300 ft^2 < 400 ft^2: not permitted (ASCE/SEI 7-22 4.7.2)
        String w = working(printed(job(15, "  office: { L: 50 psf, reducible: [ L ] }\n", "  live_load_reduction: { KLL: 2 }\n",
                "  - { type: area, load: office, width: 10 ft }\n")));
        assertTrue(w.contains("is less than 400 ft^2: not reduced"), w);
        assertTrue(w.contains("factor 1 (not reduced)"), w);
    }

    @Test
    void theFiftyPercentFloorHolds() {
        // AT = 20 ft x 100 ft = 2000 ft^2, KLL = 4: 0.25 + 15 / sqrt(8000) = 0.4177 < 0.50, so 0.50 for a
        // member supporting one floor (ASCE/SEI 7-22 4.7.2, by hand)
        ReportModel.AreaLoads a = printed(job(100, "  office: { L: 50 psf, reducible: [ L ] }\n", "  live_load_reduction: { KLL: 4 }\n",
                "  - { type: area, load: office, width: 20 ft }\n"));
        assertEquals("× 0.5", a.takeOff().rows().get(0).get(3));
        assertEquals("500 lb/ft", a.takeOff().rows().get(0).get(4), "50 psf x 20 ft x 0.5");
        assertTrue(working(a).contains("not less than 0.50 for a member supporting one floor"), working(a));
    }

    @Test
    void theFortyPercentFloorHoldsForTwoOrMoreFloors() {
        ReportModel.AreaLoads a = printed(job(100, "  office: { L: 50 psf, reducible: [ L ] }\n",
                "  live_load_reduction: { KLL: 4, floors: 2 }\n", "  - { type: area, load: office, width: 20 ft }\n"));
        // as above, 0.4177 is not below 0.40 (ASCE/SEI 7-22 4.7.2): 50 x 20 x 0.4177 = 417.7 lb/ft
        assertEquals("× 0.4177", a.takeOff().rows().get(0).get(3));
    }

    @Test
    void everyReasonForNoReductionIsSaid() {
        String areas = "  office: { L: 50 psf, reducible: [ L ] }\n  hall: { L: 100 psf, reducible: [ L ], assembly: true }\n"
                + "  plant: { L: 150 psf, reducible: [ L ] }\n  corridor: { L: 80 psf }\n";
        String loads = "  - { type: area, load: office, width: 20 ft }\n  - { type: area, load: hall, width: 2 ft }\n"
                + "  - { type: area, load: plant, width: 2 ft }\n  - { type: area, load: corridor, width: 2 ft }\n";
        String w = working(printed(job(30, areas, "  live_load_reduction: { KLL: 2 }\n", loads)));
        assertTrue(w.contains("assembly occupancy: not reduced (ASCE/SEI 7-22 4.7.6)"), w);
        assertTrue(w.contains("Lo = 150.0 psf exceeds 100 psf: not reduced (ASCE/SEI 7-22 4.7.3)"), w);
        assertTrue(w.contains("case L of area load corridor is not marked reducible: not reduced"), w);
        // only office counts in AT (the conservative reading): 20 x 30 = 600 ft^2
        assertTrue(w.contains("AT = 600 ft²"), w);
        String none = working(printed(job(30, areas, "  live_load_reduction: none\n", loads)));
        assertTrue(none.contains("design.live_load_reduction is none: not reduced"), none);
        String absent = working(printed(job(30, areas, "", loads)));
        assertTrue(absent.contains("the job asks for no reduction (no design.live_load_reduction): not reduced"), absent);
    }

    @Test
    void theRoofLiveLoadReductionIsWorkedWithR1AndR2() {
        ReportModel.AreaLoads a = printed(job(40, "  roof: { D: 15 psf, Lr: 20 psf, reducible: [ Lr ] }\n",
                "  roof_live_load_reduction: { rise: 6 }\n", "  - { type: area, load: roof, width: 10 ft }\n"));
        // AT = 400 ft^2: R1 = 1.2 - 0.001 x 400 = 0.8; F = 6: R2 = 1.2 - 0.05 x 6 = 0.9;
        // Lr = 20 x 0.8 x 0.9 = 14.4 psf, factor 0.72 (ASCE/SEI 7-22 4.8.2, by hand): 200 x 0.72 = 144 lb/ft
        assertEquals(List.of("roof", "Lr", "20 psf × 10 ft = 200 lb/ft", "× 0.72", "144 lb/ft", "0 ft to 40 ft", ""),
                a.takeOff().rows().get(1));
        String w = working(a);
        assertTrue(w.contains("R1 = 0.800; F = 6.00: R2 = 0.900"), w);
        assertTrue(w.contains("ASCE/SEI 7-22 4.8.2"), w);
    }

    @Test
    void anSiPackageTakesOffInKilopascalsAndSquareMetres() {
        Job j = TestJobs.job(org.beamfolio.loads.AreaLoadJobsTest.job(30, "  office: { L: 2.4 kPa, reducible: [ L ] }\n",
                "  live_load_reduction: { KLL: 2 }\n", "  - { type: area, load: office, width: 3 m }\n"));
        ReportModel.AreaLoads a = new TakeOffPart(j.takeOff(), j.report().units(), new Texts(ReportUnits.of(org.beamfolio.units.UnitSystem.SI), ReportSettings.Positions.DECIMAL)).build();
        // 2.4 kPa x 3 m = 7.2 kN/m (by hand); AT = 3 m x 9.144 m = 27.43 m^2 = 295.3 ft^2
        assertEquals("2.4 kPa × 3 m = 7.2 kN/m", a.takeOff().rows().get(0).get(2));
        assertTrue(working(a).contains("AT = 27.43 m² (295.3 ft²)"), working(a));
    }

    @Test
    void aJobWithoutAreaLoadsPrintsNoTakeOff() {
        Job j = TestJobs.job(TestJobs.text("6 m", "    - { at: 0 m, type: pin }\n    - { at: 6 m, type: roller }\n",
                "  - { case: D, type: uniform, w: 2 kN/m }\n"));
        assertNull(new TakeOffPart(j.takeOff(), j.report().units(), new Texts(ReportUnits.of(org.beamfolio.units.UnitSystem.US), ReportSettings.Positions.DECIMAL)).build());
    }
}
