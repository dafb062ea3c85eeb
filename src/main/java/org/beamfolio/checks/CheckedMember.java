package org.beamfolio.checks;

import java.util.List;
import org.beamfolio.analysis.AnalysisResult;

/**
 * One member of a package of several, solved and checked: its id, its analysis and its check
 * outcomes. The report and the results file both read members in this form.
 */
public record CheckedMember(String id, AnalysisResult result, List<CheckOutcome> checks) {
    public CheckedMember {
        checks = List.copyOf(checks);
    }
}
