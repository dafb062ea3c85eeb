package org.beamfolio.report;

import java.util.List;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.checks.CheckOutcome;
import org.beamfolio.model.InputChange;

/** An earlier revision of the job, for the sheet of what changed: its results, checks and the inputs that differ. */
public record PreviousRevision(AnalysisResult result, List<CheckOutcome> checks, List<InputChange> inputs) {
    public PreviousRevision {
        checks = List.copyOf(checks);
        inputs = List.copyOf(inputs);
    }
}
