package org.beamfolio.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** build --previous: a sheet of what changed between two revisions of a job. */
class RevisionDeltaTest {
    @TempDir
    Path temp;

    @Test
    void theChangedInputsAndTheirEffectArePrinted() throws Exception {
        Path old = Path.of("example-jobs/warehouse-mezzanine-simple-span.yaml");
        Path job = temp.resolve("b4-rev-b.yaml");
        Files.writeString(job, Files.readString(old).replace("P: 2 kip", "P: 3 kip").replace("revision: A", "revision: B"));
        Run run = Run.of("build", job.toString(), "--previous", old.toString(), "--out", temp.toString());
        assertEquals(Main.OK, run.status(), run.err());
        try (var doc = Loader.loadPDF(temp.resolve("b4-rev-b.pdf").toFile())) {
            String text = new PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
            assertTrue(text.contains("Changes since the previous revision"));
            assertTrue(text.contains("loads[L point at 9 ft].P 2 kip 3 kip"), "the changed load, named by case, type and place");
            assertTrue(text.contains("project.revision A B"));
            assertTrue(text.contains("98,270 lb·ft at 11.53 ft"), "previous moment");
            // The hoist load grew to 3 kip at 9 ft. By statics, D + L on the 24 ft span: deck 55 psf x 7 ft
            // plus self weight (A = 2 * 6.73 * 0.505 + 12.89 * 0.31 = 10.79 in^2 at 490 pcf) over the whole
            // span; office 50 psf x 7 ft x f over 0 to 18 ft, f = 0.25 + 15 / sqrt(2 x 222) (ASCE/SEI 7-22
            // 4.7.2, AT = 7 x 18 + (5 + 3) / 2 x 24 = 222 ft^2); storage 125 psf x 7 ft over 18 to 24 ft;
            // deck and office p = 55 + 50 f psf over a width b = 5 - x / 12 ft (resultant 96 p at x = 11 ft).
            // R_A from moments about the right support; zero shear between 9 and 18 ft where
            // R_A - P - (wd + wo) x - p (5 x - x^2 / 24) = 0; M there by statics.
            double f = 0.25 + 15 / Math.sqrt(2 * 222.0);
            double wd = 385 + 490 * (2 * 6.73 * 0.505 + (13.9 - 2 * 0.505) * 0.31) / 144;
            double wo = 350 * f;
            double p = 55 + 50 * f;
            double ra = (wd * 24 * 12 + wo * 18 * 15 + 875 * 6 * 3 + 96 * p * 13 + 3000 * 15) / 24;
            double a = p / 24;
            double b = -(wd + wo + 5 * p);
            double c = ra - 3000;
            double x0 = (-b - Math.sqrt(b * b - 4 * a * c)) / (2 * a);
            double moment = ra * x0 - (wd + wo) * x0 * x0 / 2 - p * (5 * x0 * x0 / 2 - x0 * x0 * x0 / 72) - 3000 * (x0 - 9);
            assertTrue(x0 > 9 && x0 < 18, "zero shear in the office stretch: " + x0);
            String current = org.beamfolio.units.Numbers.format(moment) + " lb·ft at " + org.beamfolio.units.Numbers.format(x0) + " ft";
            assertTrue(text.contains("98,270 lb·ft at 11.53 ft " + current), "the moment before and after: " + current + " in\n" + text);
            assertTrue(text.contains("stress-tension 0.7581"), "previous check ratio");
        }
    }

    @Test
    void previousGoesWithOneJobOnly() throws Exception {
        Run run = Run.of("build", "example-jobs", "--previous", "example-jobs/balcony-cantilever.yaml", "--out", temp.toString());
        assertEquals(Main.BAD_INPUT, run.status());
        assertTrue(run.err().contains("exactly one job"), run.err());
    }

    @Test
    void anInvalidPreviousRevisionWritesNothing() throws Exception {
        Path bad = Files.writeString(temp.resolve("old.yaml"), "beamfolio: 1\n");
        Path out = temp.resolve("out");
        Run run = Run.of("build", "example-jobs/balcony-cantilever.yaml", "--previous", bad.toString(), "--out", out.toString());
        assertEquals(Main.BAD_INPUT, run.status());
        assertTrue(run.err().contains("previous revision (--previous) must itself be a valid job"), run.err());
        assertFalse(Files.exists(out.resolve("balcony-cantilever.pdf")));
    }
}
