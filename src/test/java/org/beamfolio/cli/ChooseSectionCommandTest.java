package org.beamfolio.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A job that leaves its section to the tool, through the commands: the package and results file
 * name the chosen section and every candidate tried; {@code check --candidates} prints them and
 * writes nothing; when no candidate passes, the package is written with the best one and flagged.
 * The beam is a 20 ft simple span under Mu = 150 kip*ft (LRFD; worked by hand in SelectionTest),
 * so W14X22 (phi Mp 124.5 kip*ft) and W12X26 (139.5) fail and W16X26 (165.75) passes (AISC Manual
 * Table 3-2, Zx from memory).
 */
class ChooseSectionCommandTest {
    @TempDir
    Path temp;

    private Path job(String candidates) throws Exception {
        Path file = temp.resolve("choose.yaml");
        Files.writeString(file, org.beamfolio.TestJobs.chosenFloorBeam(candidates, false));
        return file;
    }

    private List<Path> written() throws Exception {
        try (Stream<Path> files = Files.list(temp)) {
            return files.filter(f -> !f.getFileName().toString().equals("choose.yaml")).toList();
        }
    }

    @Test
    void theResultsFileGivesTheChoiceAndEveryCandidateTried() throws Exception {
        Path out = temp.resolve("out");
        Run run = Run.of("build", job("[ W12X26, W14X22, W16X26, W18X35 ]").toString(), "--out", out.toString());
        assertEquals(Main.OK, run.status(), run.err());
        JsonNode section = new ObjectMapper().readTree(out.resolve("choose.results.json").toFile()).path("sections").path("b1");
        assertEquals("W16X26", section.path("designation").asText());
        assertTrue(section.path("chosen_passes").asBoolean());
        JsonNode candidates = section.path("candidates");
        assertEquals(3, candidates.size());
        assertEquals("W12X26", candidates.get(1).path("designation").asText());
        assertFalse(candidates.get(1).path("pass").asBoolean());
        assertEquals(150 / 139.5, candidates.get(1).path("ratio").asDouble(), 1e-12);
        assertEquals(26.0, candidates.get(1).path("weight").asDouble(), 1e-9); // lb/ft, the catalogue's W
        assertTrue(candidates.get(2).path("chosen").asBoolean());
        assertEquals(150 / 165.75, candidates.get(2).path("ratio").asDouble(), 1e-12);
        // the section properties are the chosen shape's: A of W16X26 is 7.68 in^2 (AISC Manual Table 1-1, from memory)
        assertEquals(7.68, section.path("A").asDouble(), 1e-9);
    }

    @Test
    void theSelectionSheetListsTheCandidatesAndIsInTheContents() throws Exception {
        var reading = org.beamfolio.job.JobReader.read(job("[ W12X26, W14X22, W16X26, W18X35 ]"));
        var chosen = org.beamfolio.selection.Selection.resolve(reading.job());
        var result = org.beamfolio.analysis.Analysis.run(chosen);
        String xhtml = new org.beamfolio.report.PackageRenderer().xhtml(result, org.beamfolio.checks.Checks.run(result));
        assertTrue(xhtml.contains("<section class=\"sheet\" id=\"selection\">"), "the selection sheet");
        assertTrue(xhtml.contains("href=\"#selection\""), "the contents entry");
        assertTrue(xhtml.contains("W16X26 is chosen: the lightest candidate that passes every check"), xhtml);
        assertTrue(xhtml.contains("The next lighter candidate, W12X26, fails: flexure"), xhtml);
        assertTrue(xhtml.contains("1 heavier candidate was not tried."), xhtml);
    }

    @Test
    void checkWithCandidatesPrintsTheTableAndWritesNothing() throws Exception {
        Run run = Run.of("check", "--candidates", job("[ W12X26, W14X22, W16X26, W18X35 ]").toString());
        assertEquals(Main.OK, run.status(), run.err());
        assertTrue(run.out().contains("* W16X26"), run.out());
        assertTrue(run.out().contains("W12X26"), run.out());
        assertTrue(run.out().contains("1.075"), run.out()); // W12X26's ratio, 150 / 139.5
        assertTrue(run.out().contains("chosen: W16X26, the lightest that passes every check; 1 heavier not tried"), run.out());
        assertEquals(List.of(), written());
    }

    /**
     * In a job with members, each member that uses a section to choose gets its own choice, and a
     * member carrying its reaction carries the reaction of the section chosen: the joists of the
     * framing example chosen from 2x8 to 2x12 and the girder from W shapes no deeper than 12.5 in.
     */
    @Test
    void eachMemberOfAJobWithMembersChoosesItsOwnSection() throws Exception {
        String text = Files.readString(Path.of("example-jobs/two-storey-framing-project.yaml"))
                .replace("  girder: { designation: W12X26 }", "  girder: { choose: { family: W, depth_max: 12.5 in } }")
                .replace("  joist: { lumber: 2x10 }", "  joist: { choose: { lumber: [ 2x8, 2x10, 2x12 ] } }");
        assertTrue(text.contains("choose: { family: W") && text.contains("choose: { lumber:"), "the example still names those sections");
        Path file = temp.resolve("framing.yaml");
        Files.writeString(file, text);
        Path out = temp.resolve("out");
        Run run = Run.of("build", file.toString(), "--out", out.toString());
        assertEquals(Main.OK, run.status(), run.err());
        JsonNode members = new ObjectMapper().readTree(out.resolve("framing.results.json").toFile()).path("members");
        int chosen = 0;
        for (JsonNode m : members) {
            for (JsonNode section : m.path("sections")) {
                if (section.has("candidates")) {
                    chosen++;
                    JsonNode last = section.path("candidates").get(section.path("candidates").size() - 1);
                    // the last candidate tried is the one chosen, it passes, and it is the one the section names
                    assertTrue(last.path("chosen").asBoolean() && last.path("pass").asBoolean(), m.path("id").asText());
                    assertEquals(last.has("designation") ? last.path("designation").asText() : last.path("lumber").asText(),
                            section.has("designation") ? section.path("designation").asText() : section.path("lumber").asText());
                }
            }
        }
        assertTrue(chosen >= 2, "the joists and the girder are chosen member by member: " + chosen);
        Run candidates = Run.of("check", "--candidates", file.toString());
        assertTrue(candidates.out().contains("member G-1"), candidates.out());
        assertTrue(candidates.out().contains("choosing section girder"), candidates.out());
    }

    @Test
    void whenNoCandidatePassesThePackageIsWrittenWithTheBestAndFlagged() throws Exception {
        Path out = temp.resolve("out");
        Run run = Run.of("build", job("[ W14X22, W12X26 ]").toString(), "--out", out.toString());
        assertEquals(Main.CHECKS_FAIL, run.status(), run.err());
        JsonNode section = new ObjectMapper().readTree(out.resolve("choose.results.json").toFile()).path("sections").path("b1");
        assertEquals("W12X26", section.path("designation").asText());
        assertFalse(section.path("chosen_passes").asBoolean());
        var reading = org.beamfolio.job.JobReader.read(job("[ W14X22, W12X26 ]"));
        var result = org.beamfolio.analysis.Analysis.run(org.beamfolio.selection.Selection.resolve(reading.job()));
        String xhtml = new org.beamfolio.report.PackageRenderer().xhtml(result, org.beamfolio.checks.Checks.run(result));
        // 150 / 139.5 = 1.0753: 7.53 % over (by hand)
        assertTrue(xhtml.contains("No candidate passes every check. The package uses W12X26"), xhtml);
        assertTrue(xhtml.contains("misses its limit by 7.527 %"), xhtml);
    }
}
