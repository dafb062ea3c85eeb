package org.beamfolio.catalogue;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Dressed sizes of common practice (NDS Supplement Table 1A, from memory). */
class LumberTest {
    static final double INCH = 0.0254;

    @Test
    void dressedSizes() {
        Lumber l = Lumber.parse("2x10", 1).orElseThrow();
        assertEquals(1.5 * INCH, l.breadth(), 1e-15);
        assertEquals(9.25 * INCH, l.depth(), 1e-15);
        Lumber three = Lumber.parse("2X12", 3).orElseThrow();
        assertEquals(4.5 * INCH, three.breadth(), 1e-15);
        assertEquals(11.25 * INCH, three.depth(), 1e-15);
        assertEquals("3-2x12 (4-1/2 x 11-1/4 in)", three.toString());
        Lumber timber = Lumber.parse("6x12", 1).orElseThrow();
        assertEquals(5.5 * INCH, timber.breadth(), 1e-15);
        assertEquals(11.5 * INCH, timber.depth(), 1e-15);
        assertEquals(15.25 * INCH, Lumber.parse("4x16", 1).orElseThrow().depth(), 1e-15);
    }

    @Test
    void unknownSizesAreRefused() {
        assertTrue(Lumber.parse("2x9", 1).isEmpty());
        assertTrue(Lumber.parse("10x2", 1).isEmpty());
        assertTrue(Lumber.parse("2 by 10", 1).isEmpty());
    }
}
