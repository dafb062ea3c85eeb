package org.beamfolio.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.beamfolio.TestJobs;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.checks.Checks;
import org.beamfolio.design.steel.SteelDesignWork;
import org.beamfolio.checks.CheckOutcome;
import org.junit.jupiter.api.Test;

/** The steel design sheet of the example jobs: what it prints, and that it prints the checks' own values. */
class SteelSheetTest {
    private static AnalysisResult solve(String example) throws Exception {
        return TestJobs.solve(Files.readString(Path.of("example-jobs", example)));
    }

    @Test
    void theFloorBeamSheetShowsTheCatalogueRowCompactnessSegmentsAndEquations() throws Exception {
        AnalysisResult result = solve("office-floor-beam-steel-design.yaml");
        List<CheckOutcome> checks = Checks.run(result);
        String xhtml = new PackageRenderer().xhtml(result, checks);
        assertTrue(xhtml.contains("Steel design: W18X50 to AISC 360-16, LRFD"), "sheet title");
        assertTrue(xhtml.contains("AISC Shapes Database v15.0"), "the catalogue row's source");
        assertTrue(xhtml.contains("<td>Zx</td><td>plastic section modulus about the x-axis</td><td>101 in³</td>"),
                "the tabulated Zx of W18x50 (AISC Shapes Database v15.0: 101 in^3)");
        assertTrue(xhtml.contains("Table B4.1b case 10"), "compactness table");
        assertTrue(xhtml.contains("Mn = 50 ksi × 101 in³"), "F2-1 with its numbers");
        assertTrue(xhtml.contains("Cv1"), "shear with Cv1");
        assertTrue(xhtml.contains("AISC 360-16 J10.2"), "web local yielding at the supports");
        assertTrue(xhtml.contains("<td>b12</td><td>W18X50</td>"), "the section table names the designation");
        assertFalse(xhtml.contains("Lateral-torsional buckling, local buckling, connections, bearing, web crippling"),
                "the caution that buckling is not checked is replaced");
        // the sheet's available strength is the flexure check's limit, printed once from one value
        CheckOutcome flexure = checks.stream().filter(c -> c.kind() == org.beamfolio.checks.CheckKind.FLEXURE).findFirst().orElseThrow();
        String limit = org.beamfolio.units.Numbers.format(org.beamfolio.units.Units.of("kip*ft").fromSi(flexure.limit()));
        assertTrue(xhtml.contains("(" + limit + " kip·ft available"), "available strength " + limit + " on the sheet:\n"
                + xhtml.substring(xhtml.indexOf("Available flexural strength")).substring(0, 600));
    }

    @Test
    void theCantileverSegmentEndingAtTheFreeTipTakesCbOfOne() throws Exception {
        AnalysisResult result = solve("loading-dock-cantilever-steel.yaml");
        SteelDesignWork work = SteelDesignWork.of(result);
        assertTrue(work == SteelDesignWork.of(result), "worked once per analysis");
        // AISC 360-16/22 F1: Cb = 1.0 for cantilevers or overhangs where the free end is unbraced
        var tip = Checks.run(result).stream().filter(c -> c.id().equals("flexure-bottom-18-26ft")).findFirst().orElseThrow();
        assertEquals(1.0, tip.factors().get("Cb"));
        assertEquals("lateral-torsional buckling", tip.limitState());
        assertEquals(18 * 0.3048, tip.segment().from(), 1e-12);
        assertEquals(26 * 0.3048, tip.segment().to(), 1e-12);
        String xhtml = new PackageRenderer().xhtml(result, Checks.run(result));
        assertTrue(xhtml.contains("(free end)"), "the segment table marks the free end");
        assertTrue(xhtml.contains("F1 (free end unbraced)"), "the Cb step names why it is 1.0");
    }
}
