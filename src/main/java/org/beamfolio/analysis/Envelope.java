package org.beamfolio.analysis;

import java.util.List;
import java.util.function.Function;

/** The extremes over every combination and arrangement, each naming the one that gives it. */
final class Envelope {
    private Envelope() {}

    static Extremes of(List<CombinationResult> results) {
        if (results.isEmpty()) {
            return null;
        }
        return new Extremes(
                best(results, Extremes::shearMax, 1), best(results, Extremes::shearMin, -1),
                best(results, Extremes::momentMax, 1), best(results, Extremes::momentMin, -1),
                best(results, Extremes::deflectionMax, 1), best(results, Extremes::deflectionMin, -1),
                best(results, Extremes::stressTopMax, 1), best(results, Extremes::stressTopMin, -1),
                best(results, Extremes::stressBottomMax, 1), best(results, Extremes::stressBottomMin, -1),
                best(results, Extremes::shearStressMax, 1));
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
