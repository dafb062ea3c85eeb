package org.beamfolio.derivation;

import java.util.ArrayList;
import java.util.List;
import org.beamfolio.units.Numbers;

/** Collects numbered steps; numbers print rounded, values stay full precision. */
final class Steps {
    private final List<Step> steps = new ArrayList<>();

    int add(String statement, String symbolic, String substituted, double value, String unit, String source, Integer... uses) {
        int number = steps.size() + 1;
        String result = Double.isNaN(value) ? "" : Numbers.format(value) + (unit.isEmpty() ? "" : " " + simplify(unit));
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
        return unit.isEmpty() ? shown : shown + " [" + simplify(unit) + "]";
    }

    private static final String POWERS = "¹²³⁴⁵⁶⁷⁸⁹";

    /**
     * A product of units with its repeated factors collected: lb·ft·ft is lb·ft², kN·m²·m is
     * kN·m³. A quotient or a phrase (in/ft, N·mm per kN·m) is left as written.
     */
    static String simplify(String unit) {
        if (unit.contains("/") || unit.contains(" ") || !unit.contains("·")) {
            return unit;
        }
        java.util.Map<String, Integer> powers = new java.util.LinkedHashMap<>();
        for (String factor : unit.split("·")) {
            int end = factor.length();
            while (end > 0 && POWERS.indexOf(factor.charAt(end - 1)) >= 0) {
                end--;
            }
            int power = end == factor.length() ? 1 : POWERS.indexOf(factor.charAt(factor.length() - 1)) + 1;
            if (factor.length() - end > 1) {
                return unit; // a power of ten or more: leave it as written
            }
            powers.merge(factor.substring(0, end), power, Integer::sum);
        }
        StringBuilder out = new StringBuilder();
        for (java.util.Map.Entry<String, Integer> p : powers.entrySet()) {
            if (p.getValue() > 9) {
                return unit;
            }
            out.append(out.length() == 0 ? "" : "·").append(p.getKey()).append(p.getValue() == 1 ? "" : POWERS.charAt(p.getValue() - 1));
        }
        return out.toString();
    }
}
