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
            // the live load grew by 150 lb/ft: the largest moment grows by 150 * 24^2 / 8 = 10,800 lb*ft (statics)
            assertTrue(text.contains("92,886 lb·ft at 11.35 ft"), "previous moment");
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
