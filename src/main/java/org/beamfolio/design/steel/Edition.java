package org.beamfolio.design.steel;

import java.util.Arrays;
import java.util.Locale;
import java.util.Optional;

/** The editions of ANSI/AISC 360, Specification for Structural Steel Buildings, that the design follows. */
public enum Edition {
    AISC_360_16("AISC 360-16"),
    AISC_360_22("AISC 360-22");

    private final String label;

    Edition(String label) {
        this.label = label;
    }

    /** As printed: {@code AISC 360-16}. */
    public String label() {
        return label;
    }

    /** An edition as a job file names it ({@code AISC360-16}, case and spaces free). */
    public static Optional<Edition> find(String name) {
        String key = name.toUpperCase(Locale.ROOT).replaceAll("[\\s_]", "");
        return Arrays.stream(values()).filter(e -> e.label.replace(" ", "").equals(key)).findFirst();
    }
}
