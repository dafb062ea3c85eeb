package org.beamfolio.properties;

import java.util.Random;
import java.util.function.Consumer;
import java.util.function.Function;

/**
 * A small property-test runner: draws many random cases from a fixed seed, so a failure is
 * reproducible, and reports the seed, the trial and the case that failed.
 */
final class Trials {
    private Trials() {}

    static <T> void forAll(long seed, int trials, Function<Random, T> generator, Consumer<T> property) {
        Random random = new Random(seed);
        for (int i = 0; i < trials; i++) {
            T value = generator.apply(random);
            try {
                property.accept(value);
            } catch (AssertionError | RuntimeException e) {
                throw new AssertionError("property failed on trial " + i + " of seed " + seed + ":\n" + value + "\n" + e.getMessage(), e);
            }
        }
    }
}
