package org.beamfolio.units;

import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Reads a job-file quantity such as {@code "12.5 ft"} or {@code "-2.4e3 lb/ft"} into an internal SI
 * value, or says precisely what is wrong with it.
 */
public final class QuantityParser {
    private static final Pattern QUANTITY =
            Pattern.compile("\\s*([+-]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][+-]?\\d+)?)\\s*(.*?)\\s*");

    private QuantityParser() {}

    /** The outcome of reading one quantity: a value in SI, or a message. */
    public record Result(double si, Unit unit, double value, String error) {
        public boolean ok() {
            return error == null;
        }

        static Result failure(String message) {
            return new Result(Double.NaN, null, Double.NaN, message);
        }
    }

    public static Result parse(String text, Dimension expected) {
        Matcher m = QUANTITY.matcher(text);
        if (!m.matches()) {
            return Result.failure("expected a number and a " + expected.description() + " unit such as \""
                    + example(expected) + "\", got \"" + text + "\"");
        }
        double value;
        try {
            value = Double.parseDouble(m.group(1));
        } catch (NumberFormatException e) {
            return Result.failure("not a number: \"" + m.group(1) + "\"");
        }
        if (!Double.isFinite(value)) {
            return Result.failure("number is out of range: \"" + m.group(1) + "\"");
        }
        String symbol = m.group(2);
        if (symbol.isEmpty()) {
            return Result.failure("a unit is required: write \"" + m.group(1) + " " + Units.symbolsOf(expected).get(0)
                    + "\" or another " + expected.description() + " unit (" + String.join(", ", Units.symbolsOf(expected)) + ")");
        }
        Optional<Unit> unit = Units.find(symbol);
        if (unit.isEmpty()) {
            Optional<Unit> caseOnly = Units.findIgnoringCase(symbol);
            String hint = caseOnly.filter(u -> u.dimension() == expected)
                    .map(u -> "; did you mean \"" + u.symbol() + "\"?")
                    .orElseGet(() -> Suggest.closest(symbol, Units.symbolsOf(expected))
                            .map(s -> "; did you mean \"" + s + "\"?")
                            .orElse(""));
            return Result.failure("unknown unit \"" + symbol + "\"" + hint + " (" + expected.description()
                    + " units: " + String.join(", ", Units.symbolsOf(expected)) + ")");
        }
        if (unit.get().dimension() != expected) {
            return Result.failure("\"" + symbol + "\" is a unit of " + unit.get().dimension().description()
                    + ", but a " + expected.description() + " is needed here (" + String.join(", ", Units.symbolsOf(expected)) + ")");
        }
        return new Result(unit.get().toSi(value), unit.get(), value, null);
    }

    private static String example(Dimension d) {
        return "12 " + Units.symbolsOf(d).get(0);
    }
}
