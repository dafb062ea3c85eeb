package org.beamfolio.selection;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Comparator;
import java.util.List;
import org.beamfolio.TestJobs;
import org.beamfolio.analysis.Analysis;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.checks.CheckOutcome;
import org.beamfolio.design.steel.Detail;
import org.beamfolio.design.steel.SteelDesignWork;
import org.beamfolio.job.JobReader;
import org.beamfolio.job.JobReading;
import org.beamfolio.model.Job;
import org.beamfolio.model.Section;
import org.junit.jupiter.api.Test;

/**
 * The search works each candidate's steel design for its values only, without the equations the
 * package prints. The reference here is the package's own path (every equation recorded), which
 * the design tests check against the AISC design examples and hand calculations: for every
 * candidate of a family, every check outcome (id, ratio to the bit, pass) and the governing check
 * must be the same both ways.
 */
class ValuesOnlySearchTest {
    /** Three spans of 30 ft, top flange braced continuously, live load patterned span by span, LRFD (invented). */
    private static final String THREE_SPANS = """
            beamfolio: 1
            project: { title: Test three-span beam, number: T-77 }
            report: { units: US }
            materials:
              a992: { grade: A992 }
            sections:
              b1: { choose: { family: W } }
            beam:
              length: 90 ft
              section: b1
              material: a992
              bracing: { top: continuous, bottom: supports }
              supports:
                - { at: 0 ft, type: pin }
                - { at: 30 ft, type: roller }
                - { at: 60 ft, type: roller }
                - { at: 90 ft, type: roller }
              self_weight: D
            loads:
              - { case: D, type: uniform, w: 1 klf }
              - { case: L, type: uniform, w: 2.5 klf }
              - { case: L, type: point, P: 10 kip, at: 45 ft }
            combinations: ASCE7-LRFD
            pattern: [ L ]
            design: { steel: AISC360-16 }
            checks:
              deflection:
                - { cases: [ L ], limit: L/360 }
                - { cases: [ D, L ], limit: L/240 }
            """;

    /**
     * A 24 ft span with a 6 ft overhang, both flanges braced at the supports and the top flange at
     * 12 ft only, so lateral-torsional buckling (F2.2, F3) and Cb decide; ASD to 360-22 (invented).
     */
    private static final String UNBRACED = """
            beamfolio: 1
            project: { title: Test unbraced beam, number: T-78 }
            report: { units: US }
            materials:
              a992: { grade: A992 }
            sections:
              b1: { choose: { family: W, depth_max: 21.5 in } }
            beam:
              length: 30 ft
              section: b1
              material: a992
              bracing: { top: [ 12 ft ], bottom: supports }
              supports:
                - { at: 0 ft, type: pin, bearing: 4 in }
                - { at: 24 ft, type: roller, bearing: 6 in }
              self_weight: D
            loads:
              - { case: D, type: uniform, w: 0.6 klf }
              - { case: L, type: uniform, w: 1.2 klf }
              - { case: L, type: point, P: 6 kip, at: 30 ft, bearing: 3 in }
            combinations: ASCE7-ASD
            pattern: [ L ]
            design: { steel: AISC360-22 }
            checks:
              deflection:
                - { cases: [ L ], limit: L/360 }
            """;

    @Test
    void everyCandidateOfTheWholeWFamilyOnThreeSpansChecksTheSameWithoutItsEquations() throws Exception {
        assertSameOutcomesForEveryCandidate(TestJobs.job(THREE_SPANS));
    }

    @Test
    void everyCandidateOfAnUnbracedBeamWithAnOverhangChecksTheSameWithoutItsEquations() throws Exception {
        assertSameOutcomesForEveryCandidate(TestJobs.job(UNBRACED));
    }

    @Test
    void everyCandidateOfTheMezzanineExampleChecksTheSameWithoutItsEquations() throws Exception {
        JobReading reading = JobReader.read(Path.of("example-jobs/mezzanine-beam-chosen-from-w-shapes.yaml"));
        assertTrue(reading.ok(), reading::report);
        assertSameOutcomesForEveryCandidate(reading.job());
    }

    @Test
    void aCandidateWorkedForItsValuesKeepsNoEquationsAndThePackageKeepsThem() throws Exception {
        Job job = TestJobs.job(UNBRACED);
        Section open = Selection.sectionToChoose(job);
        Job named = Selection.asNamed(job, open, open.choice().candidates().get(0));
        AnalysisResult searched = Analysis.run(named);
        SteelDesignWork values = SteelDesignWork.valuesOnly(searched);
        assertTrue(values.flexure().stream().allMatch(r -> r.gradient().equation() == null
                && r.strength().evaluated().stream().allMatch(l -> l.equations().isEmpty())));
        // the package's analysis is designed afresh, with every equation it prints
        SteelDesignWork printed = SteelDesignWork.of(Analysis.run(named));
        assertTrue(printed.flexure().stream().allMatch(r -> r.gradient().equation() != null
                && r.strength().evaluated().stream().noneMatch(l -> l.equations().isEmpty())));
    }

    private static void assertSameOutcomesForEveryCandidate(Job job) throws Exception {
        Section open = Selection.sectionToChoose(job);
        List<Section> candidates = open.choice().candidates();
        assertTrue(candidates.size() > 20, "a family, not a short list: " + candidates.size());
        int passing = 0;
        for (Section candidate : candidates) {
            Job named = Selection.asNamed(job, open, candidate);
            List<CheckOutcome> full = Selection.outcomes(named, Detail.PRINTED);
            List<CheckOutcome> values = Selection.outcomes(named, Detail.VALUES);
            String who = candidate.designation();
            assertFalse(full.isEmpty(), who);
            assertEquals(full.size(), values.size(), who);
            for (int i = 0; i < full.size(); i++) {
                CheckOutcome a = full.get(i);
                CheckOutcome b = values.get(i);
                assertEquals(a.id(), b.id(), who);
                assertEquals(a.description(), b.description(), who + " " + a.id());
                assertEquals(Double.doubleToLongBits(a.ratio()), Double.doubleToLongBits(b.ratio()),
                        () -> who + " " + a.id() + ": " + a.ratio() + " against " + b.ratio());
                assertEquals(a.pass(), b.pass(), who + " " + a.id());
            }
            assertEquals(governing(full).id(), governing(values).id(), who);
            passing += full.stream().allMatch(CheckOutcome::pass) ? 1 : 0;
        }
        // the family spans the choice: some candidates fail and some pass, so both verdicts are compared
        assertTrue(passing > 0 && passing < candidates.size(), "passing: " + passing + " of " + candidates.size());
    }

    private static CheckOutcome governing(List<CheckOutcome> outcomes) {
        return outcomes.stream().max(Comparator.comparingDouble(CheckOutcome::ratio)).orElseThrow();
    }
}
