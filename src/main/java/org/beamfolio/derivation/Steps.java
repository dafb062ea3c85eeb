package org.beamfolio.derivation;

import java.util.ArrayList;
import java.util.List;
import org.beamfolio.units.Numbers;

/** Collects numbered steps; numbers print rounded, values stay full precision. */
final class Steps {
    private final List<Step> steps = new ArrayList<>();

    int add(String statement, String symbolic, String substituted, double value, String unit, String source, Integer... uses) {
        int number = steps.size() + 1;
        String result = Double.isNaN(value) ? "" : Numbers.format(value) + (unit.isEmpty() ? "" : " " + unit);
        steps.add(new Step(number, statement, symbolic, substituted, result, value,
                source, List.of(uses)));
        return number;
    }

    /** A statement without a number of its own (the free body, the method). */
    int note(String statement, String source) {
        int number = steps.size() + 1;
        steps.add(new Step(number, statement, "", "", "", Double.NaN, source, List.of()));
        return number;
    }

    List<Step> list() {
        return steps;
    }

    /** A number as it appears in a substituted equation: rounded, with its unit in brackets. */
    static String n(double value, String unit) {
        String text = Numbers.format(value);
        String shown = value < 0 ? "(" + text + ")" : text;
        return unit.isEmpty() ? shown : shown + " [" + unit + "]";
    }
}
