package org.beamfolio.checks;

import java.util.List;
import org.beamfolio.analysis.AnalysisResult;

/**
 * One kind of check: an id, the authority it applies, and its outcomes for a solved job (none
 * when the job does not ask for it). A check reads its own settings from the job.
 */
public interface Check {
    /** A stable id for the kind of check, the prefix of its outcomes' ids. */
    String id();

    /** The standard, edition and clause the check applies (an outcome may cite a more specific clause). */
    Authority authority();

    List<CheckOutcome> run(AnalysisResult result);
}
