package org.beamfolio.checks;

import java.util.ArrayList;
import java.util.List;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.results.CheckOutcome;

/** The checks stage's entry point: every check the job asks for, in a fixed order. */
public final class Checks {
    private Checks() {}

    public static List<CheckOutcome> run(AnalysisResult result) {
        List<Check> checks = new ArrayList<>();
        if (result.job().stressCheck()) {
            checks.add(new FibreStressCheck(FibreStressCheck.Kind.TENSION));
            checks.add(new FibreStressCheck(FibreStressCheck.Kind.COMPRESSION));
            checks.add(new ShearStressCheck());
        }
        checks.add(org.beamfolio.design.steel.SteelChecks::run);
        checks.add(new DeflectionCheck());
        List<CheckOutcome> outcomes = new ArrayList<>();
        for (Check check : checks) {
            outcomes.addAll(check.run(result));
        }
        outcomes.addAll(org.beamfolio.checks.timber.TimberChecks.run(result));
        return outcomes;
    }
}
