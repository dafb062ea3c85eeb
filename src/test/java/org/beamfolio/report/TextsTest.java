package org.beamfolio.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** Positions in feet and inches as US drawings give them (common practice), exact conversions 1 ft = 0.3048 m, 1 in = 0.0254 m. */
class TextsTest {
    @Test
    void feetAndInches() {
        assertEquals("9'-6\"", Texts.feetInches(9.5 * 0.3048));
        assertEquals("0'-0\"", Texts.feetInches(0));
        assertEquals("24'-0\"", Texts.feetInches(24 * 0.3048));
        assertEquals("12'-3 1/4\"", Texts.feetInches((12 * 12 + 3.25) * 0.0254));
        assertEquals("11'-4 3/16\"", Texts.feetInches(11.349 * 0.3048), "11.349 ft = 136.188 in, to the nearest sixteenth 136 3/16 in");
        assertEquals("-2'-0\"", Texts.feetInches(-0.6096));
        assertEquals("1'-0\"", Texts.feetInches(11.999 * 0.0254), "rounding carries into the feet");
    }

    @Test
    void aUsJobAskingForFeetAndInchesGetsThemInItsTables() throws Exception {
        String text = java.nio.file.Files.readString(java.nio.file.Path.of("example-jobs/warehouse-mezzanine-simple-span.yaml"))
                .replace("  paper: letter\n", "  paper: letter\n  positions: ft-in\n");
        var reading = org.beamfolio.job.JobReader.read("w.yaml", "w", text.getBytes(java.nio.charset.StandardCharsets.UTF_8));
        org.junit.jupiter.api.Assertions.assertTrue(reading.ok(), reading::report);
        var result = org.beamfolio.analysis.Analysis.run(reading.job());
        String xhtml = new PackageRenderer().xhtml(result, org.beamfolio.checks.Checks.run(result)).replace("&apos;", "'").replace("&quot;", "\"");
        // the hoist hanger at 9 ft, in the key-point table
        org.junit.jupiter.api.Assertions.assertTrue(xhtml.contains("<td>9'-0\"</td>"), "9'-0\" in a table");
        org.junit.jupiter.api.Assertions.assertFalse(xhtml.contains("<td>9 ft</td>"), "no decimal position left in a table");
    }
}
