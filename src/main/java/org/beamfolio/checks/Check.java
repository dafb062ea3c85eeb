package org.beamfolio.checks;

import java.util.List;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.checks.CheckOutcome;

/** One kind of check: its outcomes for a solved job (none when it does not apply). */
interface Check {
    List<CheckOutcome> run(AnalysisResult result);
}
