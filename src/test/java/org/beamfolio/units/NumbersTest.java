package org.beamfolio.units;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** Display rounding: four significant figures, whole numbers from a thousand (common practice). */
class NumbersTest {
    @Test
    void fourSignificantFigures() {
        assertEquals("0.9169", Numbers.format(0.916912));
        assertEquals("11.35", Numbers.format(11.3544));
        assertEquals("123.5", Numbers.format(123.45001));
        assertEquals("92,886", Numbers.format(92886.4));
        assertEquals("-14,691", Numbers.format(-14690.6));
        assertEquals("0", Numbers.format(-0.0));
        assertEquals("2", Numbers.format(2.0));
        assertEquals("0.000123", Numbers.format(0.000123));
    }
}
