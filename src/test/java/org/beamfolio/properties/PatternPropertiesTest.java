package org.beamfolio.properties;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.beamfolio.TestJobs;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.CombinationResult;
import org.beamfolio.analysis.ReactionEnvelope;
import org.junit.jupiter.api.Test;

/**
 * Pattern loading over random beams (spans, overhangs, cantilevers, springs, hinges): every beam of
 * two or more regions takes a pattern, and the reaction extremes are those of the whole responses
 * of every combination and arrangement, exactly.
 */
class PatternPropertiesTest {
    @Test
    void reactionExtremesAreTheExtremesOfEveryArrangement() {
        Trials.forAll(41, 120, RandomBeams::next, beam -> {
            int regions = TestJobs.job(beam.text()).beam().regionBorders().size() - 1;
            if (regions < 2) {
                return;
            }
            String loadCase = beam.text().contains("case: L") ? "L" : "D";
            AnalysisResult r = TestJobs.solve(beam.text() + "pattern: [ " + loadCase + " ]\n");
            long arrangements = r.combinations().stream().filter(c -> !c.arrangement().isEmpty()).count();
            long patterned = r.combinations().stream().filter(c -> c.arrangement().isEmpty() && c.factors().getOrDefault(loadCase, 0.0) != 0).count();
            if (regions <= 6) {
                assertEquals(patterned * ((1L << regions) - 2), arrangements, "every arrangement but none and all");
            }
            List<ReactionEnvelope.AtSupport> extremes = r.reactions().supports();
            for (int i = 0; i < extremes.size(); i++) {
                double max = Double.NEGATIVE_INFINITY;
                double min = Double.POSITIVE_INFINITY;
                for (CombinationResult c : r.combinations()) {
                    max = Math.max(max, c.response().reactionForce()[i]);
                    min = Math.min(min, c.response().reactionForce()[i]);
                }
                assertEquals(max, extremes.get(i).max().force(), 0.0, "largest reaction at support " + (i + 1));
                assertEquals(min, extremes.get(i).min().force(), 0.0, "smallest reaction at support " + (i + 1));
            }
        });
    }
}
