package org.beamfolio.units;

import java.util.Map;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Reads a job-file quantity such as {@code "12.5 ft"}, {@code "-2.4e3 lb/ft"} or {@code "9'-6 1/2\""}
 * into an internal SI value, or says precisely what is wrong with it.
 */
public final class QuantityParser {
    private static final Pattern QUANTITY =
            Pattern.compile("\\s*([+-]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][+-]?\\d+)?)\\s*(.*?)\\s*");

    /** Units spelt out in words: refused (a symbol is wanted) but recognised for the suggestion. */
    private static final Map<String, String> WORDS = Map.ofEntries(
            Map.entry("inch", "in"), Map.entry("inches", "in"), Map.entry("foot", "ft"), Map.entry("feet", "ft"),
            Map.entry("meter", "m"), Map.entry("meters", "m"), Map.entry("metre", "m"), Map.entry("metres", "m"),
            Map.entry("millimeter", "mm"), Map.entry("millimeters", "mm"), Map.entry("millimetre", "mm"),
            Map.entry("millimetres", "mm"), Map.entry("centimeter", "cm"), Map.entry("centimeters", "cm"),
            Map.entry("centimetre", "cm"), Map.entry("centimetres", "cm"), Map.entry("pound", "lb"), Map.entry("pounds", "lb"),
            Map.entry("newton", "N"), Map.entry("newtons", "N"), Map.entry("kilonewton", "kN"), Map.entry("kilonewtons", "kN"));

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
        Optional<Result> compound = FeetAndInches.parse(text);
        if (compound.isPresent()) {
            if (expected != Dimension.LENGTH && compound.get().ok()) {
                return Result.failure("\"" + text.strip() + "\" is a length in feet and inches, but a "
                        + expected.description() + " is needed here (" + String.join(", ", Units.symbolsOf(expected)) + ")");
            }
            return compound.get();
        }
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
            return Result.failure("unknown unit \"" + symbol + "\"" + suggestion(symbol, expected).map(s -> "; did you mean \"" + s + "\"?").orElse("")
                    + " (" + expected.description() + " units: " + String.join(", ", Units.symbolsOf(expected)) + ")");
        }
        if (unit.get().dimension() != expected) {
            return Result.failure("\"" + symbol + "\" is a unit of " + unit.get().dimension().description()
                    + (symbol.equals(unit.get().symbol()) ? "" : " (" + unit.get().symbol() + ")")
                    + ", but a " + expected.description() + " is needed here (" + String.join(", ", Units.symbolsOf(expected)) + ")");
        }
        return new Result(unit.get().toSi(value), unit.get(), value, null);
    }

    /**
     * The symbol most likely meant: the symbol of a unit spelt out in words, the same symbol in
     * another case, or a near spelling among the symbols and shorthand of the dimension wanted.
     * Very short symbols are only matched on their first letter, so that "q" does not suggest "m".
     */
    static Optional<String> suggestion(String symbol, Dimension expected) {
        String word = WORDS.get(symbol.toLowerCase(java.util.Locale.ROOT));
        if (word != null && Units.of(word).dimension() == expected) {
            return Optional.of(word);
        }
        Optional<Unit> caseOnly = Units.findIgnoringCase(symbol);
        if (caseOnly.isPresent()) {
            return caseOnly.filter(u -> u.dimension() == expected).map(Unit::symbol);
        }
        java.util.List<String> candidates = new java.util.ArrayList<>(Units.symbolsOf(expected));
        candidates.addAll(Units.shorthandOf(expected));
        Optional<String> near = Suggest.closest(symbol, candidates);
        if (near.isPresent() && symbol.length() <= 2
                && Character.toLowerCase(near.get().charAt(0)) != Character.toLowerCase(symbol.charAt(0))) {
            return Optional.empty();
        }
        return near.map(s -> Units.find(s).orElseThrow().symbol());
    }

    private static String example(Dimension d) {
        return "12 " + Units.symbolsOf(d).get(0);
    }
}
