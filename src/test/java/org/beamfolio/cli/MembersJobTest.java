package org.beamfolio.cli;

import org.beamfolio.checks.CheckedMember;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.CombinationResult;
import org.beamfolio.job.Diagnostic;
import org.beamfolio.job.JobReader;
import org.beamfolio.job.JobReading;
import org.beamfolio.model.Load;
import org.beamfolio.units.Units;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Jobs with members: joists at 16 in carry an area load onto a beam, the beam's reaction is
 * carried onto a girder, each load case kept apart so the girder's combinations factor them.
 * Every expected value is statics worked by hand in the comment beside it.
 */
class MembersJobTest {
    static final double LB = Units.POUND_FORCE;
    static final double FT = Units.FOOT;

    static final String HEADER = """
            beamfolio: 1
            project: { title: Members test, number: T-2 }
            report: { units: US, paper: letter }
            materials:
              m: { E: 1600 ksi }
            sections:
              s: { shape: rectangle, b: 3.5 in, h: 11.25 in }
            area_loads:
              floor: { D: 15 psf, L: 40 psf }
            combinations: ASCE7-LRFD
            """;

    /** J-1 (12 ft joists at 16 in) on the first 12 ft of B-1 (16 ft), B-1 bearing on G-1 (20 ft) at 5 ft. */
    static final String LOAD_PATH = HEADER + """
            members:
              - id: G-1
                beam: { length: 20 ft, section: s, material: m, supports: [ { at: 0 ft, type: pin }, { at: 20 ft, type: roller } ] }
                loads:
                  - { type: reaction, member: B-1, support: 2, at: 5 ft }
              - id: J-1
                beam: { length: 12 ft, section: s, material: m, supports: [ { at: 0 ft, type: pin }, { at: 12 ft, type: roller } ] }
                loads:
                  - { type: area, load: floor, width: 16 in }
              - id: B-1
                beam: { length: 16 ft, section: s, material: m, supports: [ { at: 0 ft, type: pin }, { at: 16 ft, type: roller } ] }
                loads:
                  - { type: reaction, member: J-1, support: 2, spacing: 16 in, from: 0 ft, to: 12 ft }
            """;

    static JobReading read(String text) {
        return JobReader.read("job.yaml", "job", text.getBytes(StandardCharsets.UTF_8));
    }

    static CheckedMember member(Pipeline.Solved solved, String id) {
        return solved.members().stream().filter(m -> m.id().equals(id)).findFirst().orElseThrow();
    }

    static double reactionLb(AnalysisResult r, String loadCase, int support) {
        return r.cases().get(loadCase).reactionForce()[support] / LB;
    }

    @Test
    void reactionsAreCarriedDownTheLoadPathCaseByCase() {
        JobReading reading = read(LOAD_PATH);
        assertTrue(reading.ok(), reading::report);
        assertEquals(List.of("J-1", "B-1", "G-1"), reading.project().order(), "each member after the members it carries");
        Pipeline.Solved solved = MemberSolver.solve(reading);
        assertEquals(Main.OK, solved.status(), () -> String.join("", solved.messages()));
        assertEquals(List.of("G-1", "J-1", "B-1"), solved.members().stream().map(CheckedMember::id).toList(),
                "the package keeps the written order");

        // J-1, by hand: w_D = 15 psf x 16/12 ft = 20 lb/ft, w_L = 40 x 16/12 = 53.33 lb/ft over 12 ft;
        // R_D = 20 x 12 / 2 = 120 lb, R_L = 53.33 x 12 / 2 = 320 lb at each support
        AnalysisResult joist = member(solved, "J-1").result();
        assertEquals(120, reactionLb(joist, "D", 1), 1e-9);
        assertEquals(320, reactionLb(joist, "L", 1), 1e-9);

        // B-1 carries J-1's support 2 at 16 in over x = 0 to 12 ft: w_D = 120 lb / (16/12 ft) = 90 lb/ft,
        // w_L = 320 / (4/3) = 240 lb/ft, each in its own case. Its far support, by moments about x = 0:
        // R2_D = 90 x 12 x 6 / 16 = 405 lb, R2_L = 240 x 12 x 6 / 16 = 1080 lb
        AnalysisResult beam = member(solved, "B-1").result();
        List<Load> carried = beam.job().loads();
        assertEquals(2, carried.size());
        assertEquals("D", carried.get(0).loadCase());
        assertEquals(90 * LB / FT, ((Load.Distributed) carried.get(0)).wStart(), 1e-9);
        assertEquals("L", carried.get(1).loadCase());
        assertEquals(240 * LB / FT, ((Load.Distributed) carried.get(1)).wStart(), 1e-9);
        assertEquals(405, reactionLb(beam, "D", 1), 1e-9);
        assertEquals(1080, reactionLb(beam, "L", 1), 1e-9);

        // G-1 carries B-1's support 2 at 5 ft of 20 ft: R1 = P x 15/20, R2 = P x 5/20, case by case:
        // D: R1 = 303.75 lb, R2 = 101.25 lb; L: R1 = 810 lb, R2 = 270 lb
        AnalysisResult girder = member(solved, "G-1").result();
        assertEquals(303.75, reactionLb(girder, "D", 0), 1e-9);
        assertEquals(101.25, reactionLb(girder, "D", 1), 1e-9);
        assertEquals(810, reactionLb(girder, "L", 0), 1e-9);
        assertEquals(270, reactionLb(girder, "L", 1), 1e-9);
        // ASCE 7-22 2.3.1 combination 2, 1.2D + 1.6L, formed from the carried cases:
        // R1 = 1.2 x 303.75 + 1.6 x 810 = 364.5 + 1296 = 1660.5 lb;
        // moment under the load = (1.2 x 405 + 1.6 x 1080) x 5 x 15 / 20 = 2214 x 3.75 = 8302.5 lb*ft
        CombinationResult lrfd = girder.combinations().stream().filter(c -> c.factors().equals(java.util.Map.of("D", 1.2, "L", 1.6)))
                .findFirst().orElseThrow();
        assertEquals(1660.5, lrfd.response().reactionForce()[0] / LB, 1e-9);
        assertEquals(8302.5, girder.envelope().momentMax().value() / (LB * FT), 1e-6);
    }

    @Test
    void aCycleOfReactionsIsBadInputNamingEveryMemberInIt() {
        JobReading reading = read(HEADER + """
                members:
                  - id: A
                    beam: { length: 10 ft, section: s, material: m, supports: [ { at: 0 ft, type: pin }, { at: 10 ft, type: roller } ] }
                    loads:
                      - { type: reaction, member: C, support: 1, at: 5 ft }
                  - id: B
                    beam: { length: 10 ft, section: s, material: m, supports: [ { at: 0 ft, type: pin }, { at: 10 ft, type: roller } ] }
                    loads:
                      - { type: reaction, member: A, support: 2, at: 5 ft }
                      - { type: area, load: floor, width: 4 ft }
                  - id: C
                    beam: { length: 10 ft, section: s, material: m, supports: [ { at: 0 ft, type: pin }, { at: 10 ft, type: roller } ] }
                    loads:
                      - { type: reaction, member: B, support: 1, at: 5 ft }
                """);
        assertFalse(reading.ok());
        Diagnostic d = only(reading);
        assertTrue(d.message().contains("members A, C, B carry each other's reactions in a cycle (A -> C -> B -> A)"), d.message());
        assertEquals(15, d.location().line(), "at the first reaction load of the cycle");
    }

    @Test
    void aReactionFromAMissingMemberOrSupportOrWithoutARangeIsLocated() {
        String beam = "    beam: { length: 10 ft, section: s, material: m, supports: [ { at: 0 ft, type: pin }, { at: 10 ft, type: roller } ] }\n";
        String text = HEADER + "members:\n  - id: A\n" + beam + "    loads:\n      - { type: area, load: floor, width: 4 ft }\n"
                + "  - id: B\n" + beam + "    loads:\n"
                + "      - { type: reaction, member: Z, support: 1, at: 5 ft }\n"
                + "      - { type: reaction, member: A, support: 3, at: 5 ft }\n"
                + "      - { type: reaction, member: A, support: 1, spacing: 16 in }\n";
        JobReading reading = read(text);
        assertFalse(reading.ok());
        List<String> messages = reading.diagnostics().stream().map(d -> d.location().line() + ": " + d.keyPath() + ": " + d.message())
                .toList();
        assertEquals(3, messages.size(), messages::toString);
        assertTrue(messages.get(0).startsWith("19: members[1].loads[0].member: no member \"Z\" under members"), messages.get(0));
        assertTrue(messages.get(1).startsWith("20: members[1].loads[1].support: member A has 2 supports: give a number from 1 to 2"),
                messages.get(1));
        assertTrue(messages.get(2).startsWith("21: members[1].loads[2].spacing: a spacing smears repeated members over a range"),
                messages.get(2));
    }

    @Test
    void aSharedKeyInsideAMemberIsBadInputThatSaysWhereItBelongs() {
        JobReading reading = read(HEADER + """
                members:
                  - id: A
                    beam: { length: 10 ft, section: s, material: m, supports: [ { at: 0 ft, type: pin }, { at: 10 ft, type: roller } ] }
                    loads: [ { type: area, load: floor, width: 4 ft } ]
                    materials: { n: { E: 29000 ksi } }
                """);
        Diagnostic d = only(reading);
        assertEquals("members[0].materials", d.keyPath());
        assertTrue(d.message().startsWith("\"materials\" is shared by every member: write it at the top of the file"), d.message());
    }

    @Test
    void aMemberIdThatCannotNameAFileIsBadInput() {
        JobReading reading = read(HEADER + """
                members:
                  - id: B/1
                    beam: { length: 10 ft, section: s, material: m, supports: [ { at: 0 ft, type: pin }, { at: 10 ft, type: roller } ] }
                    loads: [ { type: area, load: floor, width: 4 ft } ]
                """);
        Diagnostic d = only(reading);
        assertEquals("members[0].id", d.keyPath());
        assertTrue(d.message().startsWith("a member id is letters, digits"), d.message());
    }

    @Test
    void aReactionLoadInASingleBeamJobIsBadInput() {
        JobReading reading = read(HEADER + """
                beam: { length: 10 ft, section: s, material: m, supports: [ { at: 0 ft, type: pin }, { at: 10 ft, type: roller } ] }
                loads:
                  - { type: reaction, member: A, support: 1, at: 5 ft }
                """);
        assertTrue(only(reading).message().startsWith("a reaction load brings another member's reaction: it belongs to a job with members"));
    }

    @Test
    void oneBuildWritesOnePackageAndResultsOfEveryMember(@TempDir Path dir) throws Exception {
        Path job = dir.resolve("framing.yaml");
        Files.writeString(job, LOAD_PATH);
        Run run = Run.of("build", job.toString(), "--out", dir.resolve("out").toString(), "--no-pdfa");
        assertEquals(Main.OK, run.status(), run.err());
        JsonNode results = new ObjectMapper().readTree(dir.resolve("out/framing.results.json").toFile());
        assertEquals(3, results.get("members").size());
        JsonNode girder = results.get("members").get(0);
        assertEquals("G-1", girder.get("id").asText());
        // as worked above: G-1's R1 is 303.75 lb of D and 810 lb of L, unfactored, in the report's units
        assertEquals(303.75, girder.get("reactions_by_case").get(0).get("cases").get("D").asDouble(), 1e-9);
        assertEquals(810, girder.get("reactions_by_case").get(0).get("cases").get("L").asDouble(), 1e-9);
        try (var pdf = org.apache.pdfbox.Loader.loadPDF(dir.resolve("out/framing.pdf").toFile())) {
            String text = new org.apache.pdfbox.text.PDFTextStripper().getText(pdf);
            assertTrue(text.contains("Member schedule"));
            assertTrue(text.contains("Load path: reactions carried from member to member"));
            assertTrue(text.contains("Member B-1: s,"), "the member's sheets name it in the title block");
            int sheets = pdf.getNumberOfPages();
            assertTrue(text.contains("Sheet " + sheets + " of " + sheets), "sheet numbers run through the whole set");
        }
    }

    @Test
    void aFailingMemberShowsOnTheCoverAndInTheSchedule(@TempDir Path dir) throws Exception {
        Path job = dir.resolve("framing.yaml");
        // B-1 as above carries 1920 lb of L on 16 ft; G-1's own limit of 0.001 in under L cannot be met
        // by any real beam, so G-1 fails (and only G-1: B-1 and J-1 have no checks)
        Files.writeString(job, LOAD_PATH.replace("    loads:\n      - { type: reaction, member: B-1, support: 2, at: 5 ft }\n",
                "    loads:\n      - { type: reaction, member: B-1, support: 2, at: 5 ft }\n"
                        + "    checks: { deflection: [ { cases: [ L ], max: 0.001 in } ] }\n"));
        Run run = Run.of("build", job.toString(), "--out", dir.resolve("out").toString(), "--no-pdfa");
        assertEquals(Main.CHECKS_FAIL, run.status(), run.err());
        assertTrue(run.err().contains("DOES NOT MEET G-1/deflection-L-max (ratio "), run.err());
        try (var pdf = org.apache.pdfbox.Loader.loadPDF(dir.resolve("out/framing.pdf").toFile())) {
            var stripper = new org.apache.pdfbox.text.PDFTextStripper();
            stripper.setEndPage(2);
            String front = stripper.getText(pdf);
            assertTrue(front.contains("DOES NOT MEET: one member has a check that exceeds its limit"), front);
            assertTrue(front.contains("Member G-1: 1 check exceeds the limit"), front);
            assertTrue(front.contains("EXCEEDS"), "the schedule marks the failing member");
            assertEquals("fail: G-1/deflection-L-max", pdf.getDocumentInformation().getCustomMetadataValue("BeamfolioChecks"));
        }
    }

    @Test
    void aCycleWritesNothing(@TempDir Path dir) throws Exception {
        Path job = dir.resolve("cycle.yaml");
        Files.writeString(job, HEADER + """
                members:
                  - id: A
                    beam: { length: 10 ft, section: s, material: m, supports: [ { at: 0 ft, type: pin }, { at: 10 ft, type: roller } ] }
                    loads:
                      - { type: reaction, member: A, support: 1, at: 5 ft }
                """);
        Run run = Run.of("build", job.toString(), "--out", dir.resolve("out").toString());
        assertEquals(Main.BAD_INPUT, run.status());
        assertTrue(run.err().contains("cycle.yaml:15:"), run.err());
        assertFalse(Files.exists(dir.resolve("out")));
    }

    @Test
    void combineGathersSingleJobsIntoOnePackage(@TempDir Path dir) throws Exception {
        Run run = Run.of("build", "example-jobs/balcony-cantilever.yaml", "example-jobs/school-lintel-given-properties.yaml",
                "--combine", "set", "--out", dir.toString());
        assertEquals(Main.OK, run.status(), run.err());
        JsonNode results = new ObjectMapper().readTree(dir.resolve("set.results.json").toFile());
        assertEquals(List.of("balcony-cantilever", "school-lintel-given-properties"),
                List.of(results.get("members").get(0).get("id").asText(), results.get("members").get(1).get("id").asText()));
        // each member keeps the digest of its own job file, as its single build would print it
        JsonNode alone = new ObjectMapper().readTree(Run.of("build", "example-jobs/balcony-cantilever.yaml", "--out",
                dir.resolve("alone").toString()).status() == Main.OK ? dir.resolve("alone/balcony-cantilever.results.json").toFile() : null);
        assertEquals(alone.get("input_sha256"), results.get("members").get(0).get("input_sha256"));
        assertEquals(alone.get("reactions_by_case"), results.get("members").get(0).get("reactions_by_case"));
        try (var pdf = org.apache.pdfbox.Loader.loadPDF(dir.resolve("set.pdf").toFile())) {
            String text = new org.apache.pdfbox.text.PDFTextStripper().getText(pdf);
            assertTrue(text.contains("File balcony-cantilever.yaml, SHA-256"), "the first job file listed");
            assertTrue(text.contains("File school-lintel-given-properties.yaml, SHA-256"), "the second job file listed");
            assertEquals(2, new org.apache.pdfbox.pdmodel.PDDocumentNameDictionary(pdf.getDocumentCatalog()).getEmbeddedFiles()
                    .getNames().size(), "both job files attached");
        }
    }

    @Test
    void combineWritesNothingWhenAJobIsBad(@TempDir Path dir) throws Exception {
        Path bad = dir.resolve("bad.yaml");
        Files.writeString(bad, "beamfolio: 1\n");
        Run run = Run.of("build", "example-jobs/balcony-cantilever.yaml", bad.toString(), "--combine", "set", "--out",
                dir.resolve("out").toString());
        assertEquals(Main.BAD_INPUT, run.status());
        assertTrue(run.err().contains("nothing was written"), run.err());
        assertFalse(Files.exists(dir.resolve("out")));
    }

    private static Diagnostic only(JobReading reading) {
        assertEquals(1, reading.diagnostics().size(), reading::report);
        assertNotNull(reading.diagnostics().get(0));
        return reading.diagnostics().get(0);
    }
}
