package org.beamfolio.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.beamfolio.TestJobs;
import org.beamfolio.model.Bracing;
import org.junit.jupiter.api.Test;

/**
 * The unbraced segments of the flange in compression, against moment diagrams worked by hand
 * (invented test beams, w = 10 kN/m).
 */
class UnbracedSegmentsTest {
    private static List<UnbracedSegments.Segment> segments(String length, String supports, String bracing) {
        String text = TestJobs.text(length, supports, "  - { case: D, type: uniform, w: 10 kN/m }\n")
                .replace("  supports:\n", bracing + "  supports:\n");
        AnalysisResult r = TestJobs.solve(text);
        return UnbracedSegments.of(r.job().beam(), r.cases().get("D").moment());
    }

    @Test
    void aSimpleSpanBracedAtMidspanHasTwoTopSegments() {
        // Sagging everywhere: only the top flange is compressed; it is cut at 3 m. Largest moment in each
        // half: w L^2 / 8 = 45 kN*m at midspan (by hand).
        var s = segments("6 m", "    - { at: 0 m, type: pin }\n    - { at: 6 m, type: roller }\n",
                "  bracing: { top: [ 3 m ] }\n");
        assertEquals(2, s.size());
        for (var seg : s) {
            assertEquals(Bracing.Flange.TOP, seg.flange());
            assertEquals(3.0, seg.lb(), 1e-12);
            assertEquals(45e3, seg.demand().value(), 1e-6);
            assertFalse(seg.freeEnd());
        }
    }

    @Test
    void aCantileverCompressesItsBottomFlangeUpToAnUnbracedTip() {
        // Fixed at 0, free at 3 m: M = -w (L - x)^2 / 2, hogging; bottom flange compressed, -45 kN*m at the root.
        var s = segments("3 m", "    - { at: 0 m, type: fixed }\n", "  bracing: { top: continuous }\n");
        assertEquals(1, s.size());
        var seg = s.get(0);
        assertEquals(Bracing.Flange.BOTTOM, seg.flange());
        assertTrue(seg.freeEnd());
        assertEquals(3.0, seg.lb(), 1e-12);
        assertEquals(-45e3, seg.demand().value(), 1e-6);
        assertEquals(0.0, seg.demand().at(), 1e-12);
    }

    @Test
    void aSegmentWhoseMomentChangesSignIsCheckedForBothFlanges() {
        // Propped cantilever, fixed at 0, roller at 6 m: M(x) = -w L^2/8 + 5 w L x / 8 - w x^2 / 2, zero at
        // x = L/4 (by hand). Both flanges braced at the supports only: the one segment [0, 6] compresses
        // the bottom flange (-45 kN*m at the fixed end) and the top one (9 w L^2 / 128 = 25.3125 kN*m where
        // the shear 5 w L / 8 - w x vanishes, x = 5L/8).
        var s = segments("6 m", "    - { at: 0 m, type: fixed }\n    - { at: 6 m, type: roller }\n", "");
        assertEquals(2, s.size());
        assertEquals(Bracing.Flange.TOP, s.get(0).flange());
        assertEquals(25312.5, s.get(0).demand().value(), 1e-6);
        assertEquals(3.75, s.get(0).demand().at(), 1e-9);
        assertEquals(Bracing.Flange.BOTTOM, s.get(1).flange());
        assertEquals(-45e3, s.get(1).demand().value(), 1e-6);
    }

    @Test
    void aContinuouslyBracedFlangeHasNoUnbracedLength() {
        var s = segments("6 m", "    - { at: 0 m, type: pin }\n    - { at: 6 m, type: roller }\n",
                "  bracing: { top: continuous, bottom: supports }\n");
        assertEquals(1, s.size());
        assertTrue(s.get(0).continuouslyBraced());
        assertEquals(0.0, s.get(0).lb());
    }
}
