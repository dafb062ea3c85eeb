package org.beamfolio.design.steel;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Function;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * One equation worked with its numbers: {@code result = template}, where the template names its
 * inputs in braces ({@code {Fy} * {Zx}}) and uses only + - * / ^, parentheses, {@code sqrt(..)}
 * and {@code pi}, so that the same text gives the symbolic form, the form with numbers put in,
 * and can be evaluated back (the tests do). {@code cap}, when present, bounds the result from
 * above ({@code Mn <= Mp}). Values are SI; a report formats them.
 *
 * @param number the specification's equation number, e.g. {@code F2-2}, or empty for a definition
 */
public record Equation(String number, Value result, String template, List<Value> inputs, Value cap) {
    private static final Pattern PLACEHOLDER = Pattern.compile("\\{([^}]+)}");

    public Equation {
        inputs = List.copyOf(inputs);
        for (String symbol : Expression.of(template).symbols()) {
            if (inputs.stream().noneMatch(v -> v.symbol().equals(symbol))) {
                throw new IllegalArgumentException("equation " + number + ": no input named " + symbol);
            }
        }
    }

    /** The value the equation gives, after its cap. */
    public double value() {
        return result.value();
    }

    /** {@code Fy * Zx}: the template with symbols in place of the braces. */
    public String symbolic() {
        return PLACEHOLDER.matcher(template).replaceAll(r -> Matcher.quoteReplacement(r.group(1)));
    }

    /** The template with each input written by {@code format} (a report's units and rounding). */
    public String substituted(Function<Value, String> format) {
        Map<String, Value> bySymbol = new HashMap<>();
        for (Value v : inputs) {
            bySymbol.put(v.symbol(), v);
        }
        return PLACEHOLDER.matcher(template)
                .replaceAll(r -> Matcher.quoteReplacement(format.apply(bySymbol.get(r.group(1)))));
    }

    /** The input named {@code symbol}. */
    public Value input(String symbol) {
        return inputs.stream().filter(v -> v.symbol().equals(symbol)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("no input " + symbol));
    }
}
