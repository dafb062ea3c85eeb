package org.beamfolio.checks;

import java.util.ArrayList;
import java.util.List;
import org.beamfolio.analysis.AnalysisResult;

/**
 * The checks a package runs, in the order the checks table lists them. Adding a check means
 * writing its class and listing it in {@link #standard()}; nothing else changes.
 */
public final class CheckRegistry {
    private final List<Check> checks;

    private CheckRegistry(List<Check> checks) {
        this.checks = List.copyOf(checks);
    }

    /** Every check the tool knows; each decides from the job whether it applies. */
    public static CheckRegistry standard() {
        return new CheckRegistry(List.of(
                new FibreStressCheck(FibreStressCheck.Kind.TENSION),
                new FibreStressCheck(FibreStressCheck.Kind.COMPRESSION),
                new ShearStressCheck(),
                new SteelFlexureCheck(),
                new SteelShearCheck(),
                new SteelBearingCheck(),
                new DeflectionCheck(),
                new org.beamfolio.checks.timber.TimberChecks()));
    }

    /** This registry with one more check at the end. */
    public CheckRegistry with(Check check) {
        List<Check> more = new ArrayList<>(checks);
        more.add(check);
        return new CheckRegistry(more);
    }

    public List<Check> checks() {
        return checks;
    }

    public List<CheckOutcome> run(AnalysisResult result) {
        List<CheckOutcome> outcomes = new ArrayList<>();
        for (Check check : checks) {
            outcomes.addAll(check.run(result));
        }
        return List.copyOf(outcomes);
    }
}
