package org.beamfolio.job;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.List;
import org.beamfolio.model.ReportSettings;
import org.beamfolio.units.UnitSystem;
import org.junit.jupiter.api.Test;

/**
 * Messages that do not mislead: one message per mistake (no follow-on message whose cause is an
 * earlier one), lengths in the job's own units, and a tab explained in plain words. The jobs are
 * invented test data: a 24 ft US joist with self weight (case D) and a live load (case L).
 */
class MessagesTest {
    private static final String US_JOB = """
            beamfolio: 1
            project: { title: Test joist, number: T-14 }
            report: { units: US }
            materials:
              fir: { E: 1600 ksi, density: 35 pcf }
            sections:
              joist: { shape: rectangle, b: 3.5 in, h: 11.25 in }
            beam:
              length: 24 ft
              section: joist
              material: fir
              self_weight: D
              supports:
                - { at: 0 ft, type: pin }
                - { at: 24 ft, type: roller }
            loads:
              - { case: L, type: uniform, w: 200 plf }
            checks:
              deflection:
                - { cases: [D, L], limit: L/240 }
                - { cases: [L], limit: L/360 }
            """;

    private static JobReading read(String text) {
        return JobReader.read("job.yaml", "job", text.getBytes(StandardCharsets.UTF_8));
    }

    private static List<String> headlines(JobReading reading) {
        return reading.diagnostics().stream().map(Diagnostic::headline).toList();
    }

    @Test
    void theTestJobIsValid() {
        assertTrue(read(US_JOB).ok(), read(US_JOB).report());
    }

    @Test
    void aMaterialThatFailsToReadIsReportedOnce() {
        JobReading reading = read(US_JOB.replace("E: 1600 ksi", "E: 1600 kis"));
        assertEquals(1, reading.diagnostics().size(), reading.report());
        assertTrue(headlines(reading).get(0).contains("materials.fir.E: unknown unit \"kis\"; did you mean \"ksi\"?"), reading.report());
    }

    @Test
    void aSectionThatFailsToReadIsReportedOnce() {
        JobReading reading = read(US_JOB.replace("b: 3.5 in", "b: -3.5 in"));
        assertEquals(1, reading.diagnostics().size(), reading.report());
        assertTrue(headlines(reading).get(0).contains("sections.joist.b: must be greater than zero"), reading.report());
    }

    @Test
    void aBeamThatFailsToReadDoesNotUnnameItsSelfWeightCase() {
        // without the beam its self weight (case D) is missing: "no load uses case D; did you mean L?"
        // would be the follow-on, and following it would drop dead load from the deflection check
        JobReading reading = read(US_JOB.replace("length: 24 ft", "length: 24 kN"));
        assertEquals(1, reading.diagnostics().size(), reading.report());
        assertTrue(headlines(reading).get(0).contains("beam.length: \"kN\" is a unit of force"), reading.report());
    }

    @Test
    void aBeamThatIsNotAMappingSilencesEveryCaseCheck() {
        JobReading reading = read(US_JOB.replaceAll("(?s)beam:.*?loads:", "beam: [24 ft]\nloads:"));
        assertEquals(List.of("job.yaml:8:7: beam: expected a mapping of keys and values, got a list"), headlines(reading), reading.report());
    }

    @Test
    void aLoadThatFailsToReadDoesNotUnnameItsCase() {
        JobReading reading = read(US_JOB.replace("w: 200 plf", "w: 200 plff"));
        assertEquals(1, reading.diagnostics().size(), reading.report());
        assertTrue(headlines(reading).get(0).contains("loads[0].w: unknown unit \"plff\"; did you mean \"plf\"?"), reading.report());
    }

    @Test
    void aCaseNoLoadNamesIsStillReported() {
        JobReading reading = read(US_JOB.replace("cases: [L], limit", "cases: [S], limit"));
        assertEquals(1, reading.diagnostics().size(), reading.report());
        assertTrue(headlines(reading).get(0).contains("checks.deflection[1].cases[0]: no load uses case \"S\""), reading.report());
    }

    @Test
    void aMissingMaterialIsStillReportedWhenTheOthersRead() {
        JobReading reading = read(US_JOB.replace("material: fir", "material: oak"));
        assertTrue(headlines(reading).stream().anyMatch(h -> h.contains("beam.material: no material \"oak\" under materials")), reading.report());
    }

    @Test
    void usJobsGetFeetAndInches() {
        JobReading reading = read(US_JOB.replace("at: 24 ft, type: roller", "at: 25'-6\", type: roller"));
        assertEquals(List.of("job.yaml:15:13: beam.supports[1].at: is off the beam: positions run from 0 to the beam length 24 ft"),
                headlines(reading), reading.report());
    }

    @Test
    void aJobInFeetWithoutReportUnitsIsAUsJob() {
        String text = US_JOB.replace("report: { units: US }\n", "").replace("at: 0 ft, type: pin", "at: 9'-6\", type: pin")
                .replace("at: 24 ft, type: roller", "at: 9 ft 6 in, type: roller");
        JobReading reading = read(text);
        assertTrue(headlines(reading).stream().anyMatch(h -> h.endsWith("two supports at 9 ft 6 in (the other is at line 13): combine them into one")),
                reading.report());
    }

    @Test
    void siJobsGetMetres() {
        String si = US_JOB.replace("units: US", "units: SI").replace("24 ft", "7.3152 m").replace("at: 0 ft", "at: 8 m");
        JobReading reading = read(si);
        assertTrue(headlines(reading).get(0).endsWith("is off the beam: positions run from 0 to the beam length 7.3152 m"), reading.report());
        assertFalse(reading.report().contains(" ft"), reading.report());
    }

    @Test
    void aJobInMetresWithoutReportUnitsIsReportedInSi() {
        String si = US_JOB.replace("report: { units: US }\n", "").replace("24 ft", "7.3152 m").replace("0 ft", "0 m");
        JobReading reading = read(si);
        assertTrue(reading.ok(), reading.report());
        assertEquals(UnitSystem.SI, reading.job().report().units());
        assertEquals(UnitSystem.US, read(US_JOB.replace("report: { units: US }\n", "")).job().report().units());
    }

    @Test
    void aTabIsExplainedInPlainWordsWhereItIs() {
        JobReading reading = read(US_JOB.replace("  section: joist", "\tsection: joist"));
        assertEquals(List.of("job.yaml:10:1: (file): tabs are not allowed for indentation in YAML; use spaces"), headlines(reading),
                reading.report());
        JobReading deeper = read(US_JOB.replace("    - { at: 0 ft", "  \t- { at: 0 ft"));
        assertEquals(List.of("job.yaml:14:3: (file): tabs are not allowed for indentation in YAML; use spaces"), headlines(deeper),
                deeper.report());
    }

    @Test
    void aTabAfterAKeyIsLocatedToo() {
        JobReading reading = read(US_JOB.replace("length: 24 ft", "length:\t24 ft"));
        assertEquals(List.of("job.yaml:9:10: (file): a tab cannot stand here in YAML; use spaces"), headlines(reading), reading.report());
    }

    @Test
    void aTabInQuotedTextIsNoMistake() {
        JobReading reading = read(US_JOB.replace("title: Test joist", "title: \"Test\tjoist\""));
        assertTrue(reading.ok(), reading.report());
    }
}
