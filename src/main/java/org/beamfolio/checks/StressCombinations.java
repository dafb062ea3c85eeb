package org.beamfolio.checks;

import java.util.List;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.CombinationResult;

/**
 * Which combinations an allowable-stress check compares with the allowables: those of an
 * allowable-stress set (ASCE 7 2.4), the characteristic (service) combinations of EN 1990, or
 * every combination the engineer listed; never the factored strength combinations.
 */
final class StressCombinations {
    private StressCombinations() {}

    static List<CombinationResult> of(AnalysisResult result) {
        return result.combinations().stream()
                .filter(c -> !c.reference().startsWith("ASCE/SEI 7-22 2.3"))
                .filter(c -> !c.reference().startsWith("EN 1990 (6.10)"))
                .toList();
    }
}
