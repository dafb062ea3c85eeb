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
        Files.writeString(job, Files.readString(old).replace("w: 750 lb/ft", "w: 900 lb/ft").replace("revision: A", "revision: B"));
        Run run = Run.of("build", job.toString(), "--previous", old.toString(), "--out", temp.toString());
        assertEquals(Main.OK, run.status(), run.err());
        try (var doc = Loader.loadPDF(temp.resolve("b4-rev-b.pdf").toFile())) {
            String text = new PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
            assertTrue(text.contains("Changes since the previous revision"));
            assertTrue(text.contains("loads[1].w 750 lb/ft 900 lb/ft"), "the changed load");
            assertTrue(text.contains("project.revision A B"));
            assertTrue(text.contains("92,886 lb·ft at 11.35 ft"), "previous moment");
            // The live load grew by 150 lb/ft. By statics, D + L is w = 375 + 900 + 36.73 lb/ft (self
            // weight: A = 2 * 6.73 * 0.505 + 12.89 * 0.31 = 10.79 in^2 at 490 pcf) and 2 kip at 9 ft on
            // 24 ft: R_A = 12 w + 2000 * 15 / 24, zero shear at x0 = 12 - 750 / w ft, and
            // M = R_A x0 - w x0^2 / 2 - 2000 (x0 - 9).
            double w = 375 + 900 + 490 * (2 * 6.73 * 0.505 + (13.9 - 2 * 0.505) * 0.31) / 144;
            double x0 = 12 - 750 / w;
            double moment = (12 * w + 2000.0 * 15 / 24) * x0 - w * x0 * x0 / 2 - 2000 * (x0 - 9);
            String current = org.beamfolio.units.Numbers.format(moment) + " lb·ft at " + org.beamfolio.units.Numbers.format(x0) + " ft";
            assertTrue(text.contains("92,886 lb·ft at 11.35 ft " + current), "the moment before and after: " + current + " in\n" + text);
            assertTrue(text.contains("stress-tension 0.7165"), "previous check ratio");
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
