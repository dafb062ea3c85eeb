package org.beamfolio.results;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.beamfolio.TestJobs;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.checks.Checks;
import org.junit.jupiter.api.Test;

/**
 * {@code reactions_by_case} and {@code reactions_extreme} in the results file: the case reactions
 * against handbook values, and the extremes re-derived from the reactions the file lists for
 * every combination and arrangement (each summed from its whole response, not from the
 * reactions-only sum the extremes are kept from).
 */
class ReactionsResultsTest {
    @Test
    void caseReactionsAndSupportMomentsOfAProppedCantilever() throws Exception {
        // Fixed at 0, roller at L = 6 m, w = 10 kN/m: R1 = 5/8 w L = 37.5 kN, R2 = 3/8 w L = 22.5 kN,
        // M1 = w L^2 / 8 = 45 kN*m (AISC Manual Table 3-23, beam fixed at one end and supported at the
        // other, uniform load; case number not quoted, from memory), counter-clockwise on the beam.
        String text = TestJobs.text("6 m", "    - { at: 0 m, type: fixed }\n    - { at: 6 m, type: roller }\n",
                "  - { case: D, type: uniform, w: 10 kN/m }\n");
        JsonNode json = results(text);
        JsonNode fixed = json.get("reactions_by_case").get(0);
        assertEquals("fixed", fixed.get("type").asText());
        assertEquals(37.5, fixed.get("cases").get("D").asDouble(), 1e-9);
        assertEquals(45, fixed.get("moments").get("D").asDouble(), 1e-9);
        JsonNode roller = json.get("reactions_by_case").get(1);
        assertEquals(22.5, roller.get("cases").get("D").asDouble(), 1e-9);
        assertFalse(roller.has("moments"), "a roller carries no moment");
    }

    @Test
    void extremesAgreeWithEveryCombinationListed() throws Exception {
        // Two equal spans, D 1 kN/m, L 10 kN/m patterned, the built-in ASD set: case reactions 3/8, 10/8,
        // 3/8 w L (AISC Manual Table 3-23 two-span diagram, from memory).
        String text = TestJobs.text("12 m", "    - { at: 0 m, type: pin }\n    - { at: 6 m, type: roller }\n"
                        + "    - { at: 12 m, type: roller }\n",
                "  - { case: D, type: uniform, w: 1 kN/m }\n  - { case: L, type: uniform, w: 10 kN/m }\n")
                + "combinations: ASCE7-ASD\npattern: [ L ]\n";
        JsonNode json = results(text);
        double[] share = {3.0 / 8, 10.0 / 8, 3.0 / 8};
        for (int i = 0; i < 3; i++) {
            JsonNode byCase = json.get("reactions_by_case").get(i);
            assertEquals(share[i] * 6, byCase.get("cases").get("D").asDouble(), 1e-9);
            assertEquals(share[i] * 60, byCase.get("cases").get("L").asDouble(), 1e-9);
            double max = Double.NEGATIVE_INFINITY;
            double min = Double.POSITIVE_INFINITY;
            String maxBy = null;
            String minBy = null;
            for (JsonNode c : json.get("combinations")) {
                double force = c.get("reactions").get(i).get("force").asDouble();
                if (force > max) {
                    max = force;
                    maxBy = c.get("name").asText();
                }
                if (force < min) {
                    min = force;
                    minBy = c.get("name").asText();
                }
            }
            JsonNode extreme = json.get("reactions_extreme").get(i);
            assertEquals(max, extreme.get("max").get("force").asDouble(), 1e-12 * Math.abs(max));
            assertEquals(maxBy, extreme.get("max").get("combination").asText());
            assertEquals(min, extreme.get("min").get("force").asDouble(), 1e-12 * Math.abs(min));
            assertEquals(minBy, extreme.get("min").get("combination").asText());
        }
        // the far support lifts under D + L with L on span 1: 3/8 * 6 - 1/16 * 60 = -1.5 kN (by hand)
        assertEquals(-1.5, json.get("reactions_extreme").get(2).get("min").get("force").asDouble(), 1e-9);
        assertEquals("D + L (L on span 1)", json.get("reactions_extreme").get(2).get("min").get("combination").asText());
    }

    private static JsonNode results(String text) throws Exception {
        AnalysisResult r = TestJobs.solve(text);
        return new ObjectMapper().readTree(ResultsWriter.write(r, Checks.run(r)));
    }
}
