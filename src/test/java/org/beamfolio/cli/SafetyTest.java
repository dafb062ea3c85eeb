package org.beamfolio.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.beamfolio.TestJobs;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A failed write leaves the earlier package; job text is data, never markup or a path. */
class SafetyTest {
    @TempDir
    Path temp;

    private Path job(String name, String title) throws Exception {
        String text = TestJobs.text("6 m", "    - { at: 0 m, type: pin }\n    - { at: 6 m, type: roller }\n",
                "  - { case: D, type: uniform, w: 10 kN/m }\n").replace("title: Test beam", "title: " + title);
        Path job = temp.resolve(name + ".yaml");
        Files.writeString(job, text);
        return job;
    }

    @Test
    void aFailedWriteLeavesTheEarlierPackageAsItWas() throws Exception {
        Path job = job("lintel", "Lintel");
        Path out = Files.createDirectories(temp.resolve("out"));
        byte[] earlier = "earlier results".getBytes(StandardCharsets.UTF_8);
        Files.write(out.resolve("lintel.results.json"), earlier);
        // the package's own name is taken by a folder with something in it: the second move cannot happen
        Files.createDirectories(out.resolve("lintel.pdf"));
        Files.writeString(out.resolve("lintel.pdf").resolve("keep.txt"), "keep");
        Run run = Run.of("build", job.toString(), "--out", out.toString());
        assertEquals(Main.INTERNAL_FAILURE, run.status(), run.err());
        assertArrayEquals(earlier, Files.readAllBytes(out.resolve("lintel.results.json")), "the earlier results file is back");
        assertTrue(Files.exists(out.resolve("lintel.pdf").resolve("keep.txt")));
        try (Stream<Path> files = Files.list(out)) {
            assertEquals(2, files.count(), "no temporaries or backups left behind");
        }
        assertFalse(run.err().contains("\tat "), "no stack trace");
    }

    @Test
    void markupAndEntitiesInTheJobArePrintedNotParsed() throws Exception {
        Path secret = Files.writeString(temp.resolve("secret.txt"), "TOP-SECRET-CONTENT");
        String title = "\"<!DOCTYPE t [<!ENTITY x SYSTEM 'file://" + secret + "'>]> &x; ${7*7} <#assign y=1>\"";
        Path job = job("entities", title);
        Path out = temp.resolve("out2");
        Run run = Run.of("build", job.toString(), "--out", out.toString());
        assertEquals(Main.OK, run.status(), run.err());
        byte[] pdf = Files.readAllBytes(out.resolve("entities.pdf"));
        try (var doc = org.apache.pdfbox.Loader.loadPDF(pdf)) {
            String text = new org.apache.pdfbox.text.PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
            assertTrue(text.contains("&x; ${7*7} <#assign y=1>"), "printed as typed");
            assertFalse(text.contains("TOP-SECRET-CONTENT"), "no entity was resolved");
            assertFalse(text.contains(" 49 "), "no template code ran");
        }
    }

    @Test
    void outputGoesOnlyWhereTheCommandLineSays() throws Exception {
        Path job = job("here", "Here");
        Path out = temp.resolve("only-here");
        assertEquals(Main.OK, Run.of("build", job.toString(), "--out", out.toString()).status());
        try (Stream<Path> files = Files.list(out)) {
            assertEquals(List.of("here.pdf", "here.results.json"), files.map(p -> p.getFileName().toString()).sorted().toList());
        }
        try (Stream<Path> files = Files.list(temp)) {
            assertEquals(2, files.count(), "the job file and the output folder, nothing else");
        }
    }
}
