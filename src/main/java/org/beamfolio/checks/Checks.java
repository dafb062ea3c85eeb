package org.beamfolio.checks;

import java.util.List;
import org.beamfolio.analysis.AnalysisResult;

/** The checks stage's entry point: every check of the standard registry that the job asks for. */
public final class Checks {
    private Checks() {}

    public static List<CheckOutcome> run(AnalysisResult result) {
        return CheckRegistry.standard().run(result);
    }
}
