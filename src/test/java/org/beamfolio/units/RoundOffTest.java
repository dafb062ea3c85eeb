package org.beamfolio.units;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** The round-off rule (common practice: ten digits below the largest of its kind is the round-off of a zero). */
class RoundOffTest {
    @Test
    void roundOffIsZeroAgainstItsScale() {
        assertEquals(0.0, RoundOff.clean(-4.293e-11, 29881));
        assertEquals(1e-3, RoundOff.clean(1e-3, 29881));
    }

    @Test
    void theBoundIsTenDigitsBelowTheLargest() {
        assertEquals(0.0, RoundOff.clean(1e-6, 1e4), "exactly 1e-10 of the largest is round-off");
        assertEquals(2e-6, RoundOff.clean(2e-6, 1e4), "twice that is a value");
        assertEquals(0.0, RoundOff.clean(-0.0, 0), "a negative zero reads as zero");
    }
}
