package org.beamfolio.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Quantities as engineers write them. Exact factors by definition (NIST SP 811, appendix B): the
 * foot is 0.3048 m, the inch 0.0254 m, the pound-force 4.4482216152605 N, so a kip is
 * 4448.2216152605 N. Expected values are worked from those by hand; a double carries them to
 * within a few units in the last place, hence the relative tolerance of 1e-15.
 */
class QuantityParserTest {
    private static final double KIP = 4448.2216152605;

    private static double si(String text, Dimension dimension) {
        QuantityParser.Result result = QuantityParser.parse(text, dimension);
        assertTrue(result.ok(), () -> text + ": " + result.error());
        return result.si();
    }

    private static void near(double expected, double actual) {
        assertEquals(expected, actual, 1e-15 * Math.abs(expected), () -> "expected " + expected + ", got " + actual);
    }

    private static String error(String text, Dimension dimension) {
        QuantityParser.Result result = QuantityParser.parse(text, dimension);
        assertFalse(result.ok(), () -> text + " should be refused");
        return result.error();
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
        // 9 ft 6 in = 114 in = 114 x 0.0254 m = 2.8956 m
        "9'-6\"        | 2.8956",
        "9' 6\"        | 2.8956",
        "9'6\"         | 2.8956",
        "9 ft 6 in     | 2.8956",
        "9ft 6in       | 2.8956",
        "9 ft-6 in     | 2.8956",
        "' 9'-6\" '    | 2.8956",
        // 9 ft = 9 x 0.3048 m = 2.7432 m; 6 in = 6 x 0.0254 m = 0.1524 m
        "9'            | 2.7432",
        "6\"           | 0.1524",
        "9'-0\"        | 2.7432",
        "0'-6\"        | 0.1524",
        // 9 ft 6 1/2 in = 114.5 in = 2.9083 m; the sign belongs to the whole length
        "9'-6 1/2\"    | 2.9083",
        "9'-6-1/2\"    | 2.9083",
        "9 ft 6 1/2 in | 2.9083",
        "-9'-6\"       | -2.8956",
        "-9'-6 1/2\"   | -2.9083",
        // 6 1/2 in = 0.1651 m; 3/4 in = 0.01905 m; 24 ft = 7.3152 m; 2.5 ft 3.25 in = 33.25 in = 0.84455 m
        "6 1/2\"       | 0.1651",
        "6-1/2 in      | 0.1651",
        "3/4\"         | 0.01905",
        "24'           | 7.3152",
        "2.5' 3.25\"   | 0.84455",
    })
    void lengthsInFeetAndInches(String text, double metres) {
        near(metres, si(text.startsWith("'") && text.endsWith("'") ? text.substring(1, text.length() - 1) : text, Dimension.LENGTH));
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
        "2 k      | FORCE            | 8896.443230521",
        "2 kips   | FORCE            | 8896.443230521",
        "2 kip    | FORCE            | 8896.443230521",
        "2 lbs    | FORCE            | 8.896443230521",
        // 1 kip*ft = 4448.2216152605 N x 0.3048 m = 1355.8179483314004 N*m
        "3 ft-kip | MOMENT           | 4067.4538449942012",
        "3 k-ft   | MOMENT           | 4067.4538449942012",
        "3 kip-ft | MOMENT           | 4067.4538449942012",
        "3 ft*kip | MOMENT           | 4067.4538449942012",
        "3 ft-lb  | MOMENT           | 4.0674538449942012",
        "3 lb-ft  | MOMENT           | 4.0674538449942012",
        // 1 kip*in = 4448.2216152605 x 0.0254 = 112.98482902761670 N*m
        "1 in-kip | MOMENT           | 112.9848290276167",
        "1 k-in   | MOMENT           | 112.9848290276167",
        "2 kNm    | MOMENT           | 2000",
        // 1 kip/ft = 4448.2216152605 / 0.3048 = 14593.902937206364 N/m
        "1 klf    | FORCE_PER_LENGTH | 14593.902937206364",
        "1 k/ft   | FORCE_PER_LENGTH | 14593.902937206364",
        "1 kips/ft| FORCE_PER_LENGTH | 14593.902937206364",
        // 1 ksf = 4448.2216152605 / 0.3048^2 = 47880.25898033584 Pa (NIST SP 811: 4.788 026 E+04)
        "1 ksf    | STRESS           | 47880.25898033584",
        "2 N/mm^2 | STRESS           | 2e6",
        "2 kN/m^2 | STRESS           | 2e3",
        "1 ft-kip/rad | ROTATIONAL_STIFFNESS | 1355.8179483314004",
    })
    void theShorthandOfPractice(String text, Dimension dimension, double expected) {
        near(expected, si(text, dimension));
    }

    @Test
    void aShorthandReadsAsItsUnit() {
        assertEquals("kip*ft", QuantityParser.parse("3 ft-kip", Dimension.MOMENT).unit().symbol());
        assertEquals("kip", QuantityParser.parse("2 k", Dimension.FORCE).unit().symbol());
        near(KIP, si("1 k", Dimension.FORCE));
    }

    @Test
    void suggestionsKnowThePractice() {
        assertTrue(error("2 kp", Dimension.FORCE).contains("did you mean \"kip\"?"), error("2 kp", Dimension.FORCE));
        assertTrue(error("2 KIPS", Dimension.FORCE).contains("did you mean \"kip\"?"), error("2 KIPS", Dimension.FORCE));
        assertTrue(error("4 meters", Dimension.LENGTH).contains("did you mean \"m\"?"), error("4 meters", Dimension.LENGTH));
        assertTrue(error("9 feet", Dimension.LENGTH).contains("did you mean \"ft\"?"), error("9 feet", Dimension.LENGTH));
        assertTrue(error("3 kip-fet", Dimension.MOMENT).contains("did you mean \"kip*ft\"?"), error("3 kip-fet", Dimension.MOMENT));
        // a one-letter slip is not taken for another unit that merely shares no letter with it
        assertFalse(error("9 q", Dimension.LENGTH).contains("did you mean"), error("9 q", Dimension.LENGTH));
    }

    @Test
    void aShorthandOfTheWrongDimensionSaysWhatItIs() {
        assertTrue(error("2 k", Dimension.LENGTH).startsWith("\"k\" is a unit of force (kip), but a length is needed"),
                error("2 k", Dimension.LENGTH));
        assertTrue(error("9'", Dimension.FORCE).startsWith("\"'\" is a unit of length (ft), but a force is needed"),
                error("9'", Dimension.FORCE));
        assertTrue(error("9'-6\"", Dimension.FORCE).startsWith("\"9'-6\"\" is a length in feet and inches, but a force is needed"),
                error("9'-6\"", Dimension.FORCE));
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {"9'-6", "9' 6", "6 1/0\"", "9'-6\" 3", "9 ft 6", "'9", "1/2 ft", "9'-'6\""})
    void malformedFeetAndInchesAreRefused(String text) {
        assertFalse(QuantityParser.parse(text, Dimension.LENGTH).ok(), text);
    }
}
