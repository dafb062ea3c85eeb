package org.beamfolio.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.text.PDFTextStripper;
import org.beamfolio.TestJobs;
import org.beamfolio.job.JobReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The build and check commands end to end, with the PDF read back by PDFBox. */
class BuildCommandTest {
    @TempDir
    Path temp;

    private Path writeJob(String name) throws Exception {
        String text = TestJobs.text("6 m", "    - { at: 0 m, type: pin }\n    - { at: 6 m, type: roller }\n",
                "  - { case: D, type: uniform, w: 10 kN/m }\n  - { case: L, type: point, P: 20 kN, at: 2 m }\n")
                + "combinations: ASCE7-ASD\nchecks:\n  stress: true\n  deflection:\n    - { cases: [ L ], limit: L/360 }\n";
        Path job = temp.resolve(name + ".yaml");
        Files.writeString(job, text);
        return job;
    }

    @Test
    void buildWritesThePackageAndTheResultsFile() throws Exception {
        Path job = writeJob("lintel");
        Path out = temp.resolve("out");
        Run run = Run.of("build", job.toString(), "--out", out.toString());
        assertEquals(Main.OK, run.status(), run.err());
        assertTrue(Files.exists(out.resolve("lintel.pdf")));
        JsonNode results = new ObjectMapper().readTree(out.resolve("lintel.results.json").toFile());
        assertEquals("beamfolio-results/1", results.get("format").asText());
        assertEquals(JobReader.sha256(Files.readAllBytes(job)), results.get("input_sha256").asText());
        assertEquals("kN", results.get("units").get("force").asText());
        assertEquals("mm", results.get("units").get("deflection").asText());
        // SI section units are mm: I = 1e8 mm^4 as given
        assertEquals(1e8, results.get("sections").get("s").get("I").asDouble(), 1e-3);
        JsonNode dPlusL = null;
        for (JsonNode c : results.get("combinations")) {
            if (c.get("name").asText().equals("D + L")) {
                dPlusL = c;
            }
        }
        // statics by hand: R1 = 10 kN/m * 6 m / 2 + 20 kN * 4 m / 6 m = 43.333 kN
        assertEquals(30 + 20.0 * 4 / 6, dPlusL.get("reactions").get(0).get("force").asDouble(), 1e-9);
        assertEquals(0.0, dPlusL.get("reactions").get(0).get("at").asDouble());
        assertEquals("pin", dPlusL.get("reactions").get(0).get("type").asText());
        assertEquals("D + L", results.get("envelope").get("moment").get("max").get("combination").asText());
        assertTrue(results.get("checks").size() >= 4, "stress and deflection checks");
        try (PDDocument pdf = Loader.loadPDF(out.resolve("lintel.pdf").toFile())) {
            int pages = pdf.getNumberOfPages();
            assertTrue(pages >= 1);
            for (int i = 1; i <= pages; i++) {
                PDFTextStripper stripper = new PDFTextStripper();
                stripper.setStartPage(i);
                stripper.setEndPage(i);
                String text = stripper.getText(pdf);
                assertTrue(text.contains("T-1"), "project number on sheet " + i);
                assertTrue(text.contains("Sheet " + i + " of " + pages), "sheet number on sheet " + i);
            }
            for (PDPage page : pdf.getPages()) {
                for (var name : page.getResources().getFontNames()) {
                    PDFont font = page.getResources().getFont(name);
                    assertTrue(font.isEmbedded(), "font " + font.getName() + " is embedded");
                }
            }
        }
    }

    @Test
    void aFolderMeansEveryJobInIt() throws Exception {
        writeJob("first");
        writeJob("second");
        Path out = temp.resolve("many");
        Run run = Run.of("build", temp.toString(), "--out", out.toString());
        assertEquals(Main.OK, run.status(), run.err());
        assertTrue(Files.exists(out.resolve("first.pdf")));
        assertTrue(Files.exists(out.resolve("second.results.json")));
    }

    @Test
    void oneBadJobDoesNotStopTheOthersButSetsTheStatus() throws Exception {
        writeJob("good");
        Files.writeString(temp.resolve("bad.yaml"), "beamfolio: 1\n");
        Path out = temp.resolve("mixed");
        Run run = Run.of("build", temp.resolve("good.yaml").toString(), temp.resolve("bad.yaml").toString(), "--out", out.toString());
        assertEquals(Main.BAD_INPUT, run.status());
        assertTrue(Files.exists(out.resolve("good.pdf")));
        assertFalse(Files.exists(out.resolve("bad.pdf")));
    }

    @Test
    void resultsAreReproducible() throws Exception {
        Path job = writeJob("again");
        Run.of("build", job.toString(), "--out", temp.resolve("a").toString());
        Run.of("build", job.toString(), "--out", temp.resolve("b").toString());
        assertArrayEquals(Files.readAllBytes(temp.resolve("a/again.results.json")),
                Files.readAllBytes(temp.resolve("b/again.results.json")));
    }

    @Test
    void checkPrintsASummaryAndWritesNothing() throws Exception {
        Path job = writeJob("summary");
        Run run = Run.of("check", job.toString());
        assertEquals(Main.OK, run.status(), run.err());
        // the largest reaction at the pin, by statics: D 10 kN/m * 6 m / 2 + L 20 kN * 4 m / 6 m = 43.33 kN
        assertTrue(run.out().contains("R1   pin     at 0 m        max        43.33 (D + L)"), run.out());
        assertTrue(run.out().contains("moment, sagging"), run.out());
        assertTrue(run.out().lines().count() < 40, "fits one screen");
        try (var files = Files.list(temp)) {
            assertEquals(1, files.count(), "only the job file is there");
        }
    }

    @Test
    void checkPrintsTheReactionThatGovernsOverEveryArrangement() {
        // Footbridge example, EN 1990 (6.10) with pedestrian load on spans 1 and 2: the first interior
        // support's largest reaction is 88.01 kN, more than the 83.51 kN with every span loaded
        // (1.35 * 21.99 + 1.5 * 35.88 kN from the case reactions; the pattern adds the rest).
        Run run = Run.of("check", "example-jobs/footbridge-continuous-three-span.yaml");
        assertTrue(run.out().contains("R2   roller  at 8 m        max        88.01 (1.35D + 1.5L (L on spans 1, 2))"), run.out());
    }

    @Test
    void csvHoldsTheDiagramOrdinatesWithUnits() throws Exception {
        Path job = writeJob("ordinates");
        Path out = temp.resolve("csv");
        assertEquals(Main.OK, Run.of("build", job.toString(), "--out", out.toString(), "--csv").status());
        List<String> lines = Files.readAllLines(out.resolve("ordinates.csv"));
        assertEquals("combination,x (m),V (kN),M (kN*m),slope (rad),deflection (mm; down +),stress_top (MPa; tension +),"
                + "stress_bottom (MPa; tension +)", lines.get(0));
        assertTrue(lines.stream().anyMatch(l -> l.startsWith("envelope: largest,")));
        // the simple span under 10 kN/m and 20 kN at 2 m: V(0) = 30 + 20 * 4 / 6 kN in D + L (statics)
        String first = lines.stream().filter(l -> l.startsWith("D + L,0.0,")).findFirst().orElseThrow();
        assertEquals(30 + 20.0 * 4 / 6, Double.parseDouble(first.split(",")[2]), 1e-9);
        Path plain = temp.resolve("plain");
        assertEquals(Main.OK, Run.of("build", job.toString(), "--out", plain.toString()).status());
        try (var files = Files.list(plain)) {
            assertEquals(List.of("ordinates.pdf", "ordinates.results.json"),
                    files.map(p -> p.getFileName().toString()).sorted().toList(), "without --csv, no CSV beside the package");
        }
    }

    @Test
    void aFolderBuildEndsWithATable() throws Exception {
        writeJob("one");
        writeJob("two");
        Run run = Run.of("build", temp.toString(), "--out", temp.resolve("t").toString());
        assertEquals(Main.OK, run.status(), run.err());
        assertTrue(run.out().contains("job  sheets  governing ratio  result  time"), run.out());
        assertTrue(run.out().lines().anyMatch(l -> l.startsWith("one ") && l.contains("pass")), run.out());
    }

    @Test
    void aParallelFolderBuildGivesTheBytesOfBuildingEachAlone() throws Exception {
        Path together = temp.resolve("together");
        assertEquals(Main.OK, Run.of("build", "example-jobs", "--out", together.toString()).status());
        try (var jobs = Files.list(Path.of("example-jobs"))) {
            for (Path job : jobs.filter(p -> p.toString().endsWith(".yaml")).toList()) {
                Path alone = temp.resolve("alone");
                assertEquals(Main.OK, Run.of("build", job.toString(), "--out", alone.toString()).status());
                String name = job.getFileName().toString().replace(".yaml", "");
                assertArrayEquals(Files.readAllBytes(alone.resolve(name + ".pdf")), Files.readAllBytes(together.resolve(name + ".pdf")), name);
                assertArrayEquals(Files.readAllBytes(alone.resolve(name + ".results.json")),
                        Files.readAllBytes(together.resolve(name + ".results.json")), name);
            }
        }
    }

    @Test
    void helpAndVersion() {
        Run help = Run.of("--help");
        assertEquals(0, help.status());
        assertTrue(help.out().contains("build") && help.out().contains("check"), help.out());
        Run version = Run.of("--version");
        assertEquals(0, version.status());
        assertTrue(version.out().startsWith("beamfolio "), version.out());
        assertEquals(Main.BAD_INPUT, Run.of("build").status(), "a missing argument is a usage error");
    }
}
