package org.beamfolio.job;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.List;
import org.beamfolio.TestJobs;
import org.beamfolio.model.Job;
import org.beamfolio.model.SectionChoice;
import org.junit.jupiter.api.Test;

/** The candidates a {@code choose:} block gives, in the order the search tries them. */
class ChoiceReaderTest {
    private static String job(String choose) {
        return """
                beamfolio: 1
                project: { title: Test floor beam, number: T-44 }
                report: { units: US }
                materials:
                  a992: { grade: A992 }
                sections:
                  b1: { choose: %s }
                beam:
                  length: 20 ft
                  section: b1
                  material: a992
                  supports:
                    - { at: 0 ft, type: pin }
                    - { at: 20 ft, type: roller }
                loads:
                  - { case: D, type: uniform, w: 0.5 klf }
                combinations: ASCE7-ASD
                design: { steel: AISC360-16 }
                """.formatted(choose);
    }

    private static List<String> candidates(Job job) {
        return job.sections().get("b1").choice().candidates().stream().map(s -> s.designation()).toList();
    }

    /**
     * W12 and W14 shapes of 30 lb/ft or less, no deeper than 14 in (AISC Manual, 15th ed., Table 1-1,
     * from memory: W12X14 to W12X30 are 11.9 to 12.3 in deep; W14X22, W14X26, W14X30 are 13.7, 13.9,
     * 13.8 in; W14X34 weighs more), lightest first, equal weights shallowest first.
     */
    @Test
    void aFamilyGivesItsShapesWithinTheFiltersLightestFirst() {
        Job job = TestJobs.job(job("{ family: W, nominal_depths: [ 12, 14 ], depth_max: 14 in, weight_max: 30 lb/ft }"));
        assertEquals(List.of("W12X14", "W12X16", "W12X19", "W12X22", "W14X22", "W12X26", "W14X26", "W12X30", "W14X30"),
                candidates(job));
        SectionChoice choice = job.sections().get("b1").choice();
        assertEquals(SectionChoice.Kind.FAMILY, choice.kind());
        // before the search the section stands as the first candidate, and nothing has been tried
        assertEquals("W12X14", job.sections().get("b1").designation());
        assertEquals(List.of(), choice.tried());
        assertNull(choice.chosen());
    }

    /** depth_min on the tabulated depth: W14X22 (13.7 in) is left out at 13.8 in, W14X26 (13.9) kept (Table 1-1, from memory). */
    @Test
    void depthMinLeavesOutShallowerShapes() {
        Job job = TestJobs.job(job("{ family: W, nominal_depths: [ 14 ], depth_min: 13.8 in, weight_max: 30 lb/ft }"));
        assertEquals(List.of("W14X26", "W14X30"), candidates(job));
    }

    /** A listed shape is known by any of its names; the list is tried by weight whatever its order. */
    @Test
    void aListIsTriedByWeightWhateverItsOrder() {
        Job job = TestJobs.job(job("[ w18x35, W16X26, W12X26, W14x22 ]"));
        assertEquals(List.of("W14X22", "W12X26", "W16X26", "W18X35"), candidates(job));
        assertEquals(SectionChoice.Kind.LISTED, job.sections().get("b1").choice().kind());
    }
}
