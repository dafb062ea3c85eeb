package org.beamfolio.job;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.List;
import org.beamfolio.analysis.Analysis;
import org.beamfolio.model.Job;
import org.beamfolio.model.Material;
import org.beamfolio.model.SectionShape;
import org.beamfolio.section.SectionCalculator;
import org.beamfolio.section.SectionProperties;
import org.junit.jupiter.api.Test;

/** Sections named from the shape catalogue and steel materials named by grade (job-format.md, Release 2 additions). */
class CatalogueSectionsTest {
    static final double IN = 0.0254;
    static final double KSI = 4448.2216152605 / (IN * IN);

    private static final String JOB = """
            beamfolio: 1
            project: { title: Test floor beam, number: T-16 }
            report: { units: US }
            materials:
              steel: { grade: A992 }
            sections:
              b1: { designation: w18x50 }
            beam:
              length: 30 ft
              section: b1
              material: steel
              supports:
                - { at: 0 ft, type: pin }
                - { at: 30 ft, type: roller }
            loads:
              - { case: D, type: uniform, w: 1 klf }
            checks:
              deflection:
                - { cases: [D], limit: L/360 }
            """;

    private static JobReading read(String text) {
        return JobReader.read("job.yaml", "job", text.getBytes(StandardCharsets.UTF_8));
    }

    private static List<String> headlines(JobReading reading) {
        return reading.diagnostics().stream().map(Diagnostic::headline).toList();
    }

    @Test
    void aDesignationGivesTheTabulatedProperties() {
        JobReading reading = read(JOB);
        assertTrue(reading.ok(), reading.report());
        Job job = reading.job();
        SectionShape shape = job.sections().get("b1").shape();
        assertEquals("W18X50", assertInstanceOf(SectionShape.Catalogued.class, shape).shape().designation());
        // AISC Shapes Database v15.0, W18X50: Ix = 800 in^4, A = 14.7 in^2, d = 18.0 in, Qw = 49.9 in^3
        SectionProperties p = SectionCalculator.of(job.sections().get("b1"));
        assertEquals(800 * Math.pow(IN, 4), p.inertia(), 1e-15);
        assertEquals(14.7 * IN * IN, p.area(), 1e-15);
        assertEquals(9 * IN, p.yBottom(), 1e-15);
        assertEquals(49.9 * Math.pow(IN, 3), p.qNeutral(), 1e-15);
    }

    @Test
    void analysisUsesTheCataloguesIx() throws Exception {
        // Simple span, uniform load: midspan deflection 5 w L^4 / (384 E I) (any mechanics text),
        // with E = 29,000 ksi and the tabulated Ix = 800 in^4
        Job job = read(JOB).job();
        double w = 1000 * 4.4482216152605 / 0.3048;
        double length = 30 * 0.3048;
        double expected = 5 * w * Math.pow(length, 4) / (384 * 29_000 * KSI * 800 * Math.pow(IN, 4));
        var response = Analysis.run(job).combinations().get(0).response();
        assertEquals(expected, response.deflection().at(length / 2), expected * 1e-9);
    }

    @Test
    void aGradeFillsEAndDensityAndExplicitFyOverrides() {
        Material m = read(JOB).job().materials().get("steel");
        assertEquals(29_000 * KSI, m.elasticModulus(), 1e-3);
        assertEquals("A992", m.grade());
        assertNull(m.yieldStress(), "Fy comes from the grade when not given");
        assertEquals("ASTM A992/A992M", m.source());
        Material given = read(JOB.replace("{ grade: A992 }", "{ grade: A572-50, Fy: 55 ksi, Fu: 70 ksi }")).job()
                .materials().get("steel");
        assertEquals(55 * KSI, given.yieldStress(), 1e-3);
        assertEquals(70 * KSI, given.tensileStrength(), 1e-3);
    }

    @Test
    void anUnknownDesignationNamesTheNearest() {
        JobReading reading = read(JOB.replace("w18x50", "W18X51"));
        assertEquals(List.of("job.yaml:7:22: sections.b1.designation: \"W18X51\" is not in the AISC Shapes Database v15.0;"
                + " nearest: W18X50, W18X55, W18X46"), headlines(reading));
    }

    @Test
    void anUnknownGradeListsTheGrades() {
        JobReading reading = read(JOB.replace("A992", "A993"));
        assertEquals(1, reading.diagnostics().size(), reading.report());
        assertTrue(headlines(reading).get(0).startsWith("job.yaml:5:19: materials.steel.grade: unknown steel grade \"A993\""),
                headlines(reading).get(0));
    }

    @Test
    void fuBelowFyIsBadInput() {
        JobReading reading = read(JOB.replace("{ grade: A992 }", "{ E: 29000 ksi, Fy: 50 ksi, Fu: 45 ksi }"));
        assertEquals(1, reading.diagnostics().size(), reading.report());
        assertTrue(headlines(reading).get(0).contains("materials.steel.Fu: Fu must not be less than Fy"));
    }
}
