package org.beamfolio.analysis;

import java.util.List;
import java.util.function.Function;

/**
 * The extremes over every combination and arrangement, each naming the one that gives it; the
 * stresses over the combinations that are compared with the allowables ({@link StressCombinations},
 * every combination when there are none), so that no factored stress stands beside the checked one.
 */
final class Envelope {
    private Envelope() {}

    static Extremes of(List<CombinationResult> results) {
        if (results.isEmpty()) {
            return null;
        }
        List<CombinationResult> service = StressCombinations.of(results);
        List<CombinationResult> stressed = service.isEmpty() ? results : service;
        return new Extremes(
                best(results, Extremes::shearMax, 1), best(results, Extremes::shearMin, -1),
                best(results, Extremes::momentMax, 1), best(results, Extremes::momentMin, -1),
                best(results, Extremes::deflectionMax, 1), best(results, Extremes::deflectionMin, -1),
                best(stressed, Extremes::stressTopMax, 1), best(stressed, Extremes::stressTopMin, -1),
                best(stressed, Extremes::stressBottomMax, 1), best(stressed, Extremes::stressBottomMin, -1),
                best(stressed, Extremes::shearStressMax, 1));
    }

    private static Extreme best(List<CombinationResult> results, Function<Extremes, Extreme> pick, int sign) {
        Extreme best = null;
        for (CombinationResult r : results) {
            Extreme e = pick.apply(r.extremes());
            if (e != null && (best == null || sign * e.value() > sign * best.value())) {
                best = e.withCombination(r.name());
            }
        }
        return best;
    }
}
