package org.beamfolio.units;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** Lengths in messages, in the job's units (1 ft = 0.3048 m, 1 in = 0.0254 m exactly, NIST SP 811). */
class LengthsTest {
    private static String us(double metres) {
        return Lengths.describe(metres, Lengths.Style.FEET_AND_INCHES);
    }

    @Test
    void usJobsReadFeetAndInches() {
        assertEquals("24 ft", us(24 * Units.FOOT));
        assertEquals("24 ft", us(7.3152));
        assertEquals("9 ft 6 in", us(2.8956));
        assertEquals("9 ft 6 1/2 in", us(114.5 * Units.INCH));
        assertEquals("3/4 in", us(0.01905));
        assertEquals("6 1/16 in", us(97 / 16.0 * Units.INCH));
        assertEquals("-9 ft 6 in", us(-2.8956));
        assertEquals("0 ft", us(0));
    }

    @Test
    void aLengthOffTheSixteenthIsInDecimalFeet() {
        assertEquals("12.35 ft", us(12.35 * Units.FOOT));
        assertEquals("3.2808 ft", us(1.0));
    }

    @Test
    void siJobsReadMetres() {
        assertEquals("7.3152 m", Lengths.describe(7.3152, Lengths.Style.METRES));
        assertEquals("2 m", Lengths.describe(2.0, Lengths.Style.METRES));
        assertEquals("0 m", Lengths.describe(-1e-9, Lengths.Style.METRES));
    }
}
