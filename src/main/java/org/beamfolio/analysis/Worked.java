package org.beamfolio.analysis;

import java.util.HashMap;
import java.util.Map;
import java.util.function.Supplier;

/**
 * What later stages work out from one analysis (a design to a specification), kept with it, so
 * that each is worked once and every check, sheet and results entry reads the same values. The
 * analysis does not know those stages: each names its own kind of work.
 */
public final class Worked {
    private final Map<Class<?>, Object> done = new HashMap<>();

    /** The work of this kind, worked by {@code work} the first time it is asked for. */
    public synchronized <T> T get(Class<T> kind, Supplier<T> work) {
        Object value = done.get(kind);
        if (value == null) {
            value = work.get();
            done.put(kind, value);
        }
        return kind.cast(value);
    }
}
