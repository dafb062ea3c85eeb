package org.beamfolio.design.steel;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The equations of one limit state as they are worked: values given (from the shape and the
 * material), then each equation evaluated from its template and recorded with the inputs it used.
 * A result becomes a known value for the equations after it.
 */
final class Work {
    private final Map<String, Value> known = new LinkedHashMap<>();
    private final List<Equation> equations = new ArrayList<>();
    private final boolean recorded;

    /** A sheet that records every equation, for the package. */
    Work() {
        this(Detail.PRINTED);
    }

    /** A sheet that records the equations for {@link Detail#PRINTED}, and only works the values for {@link Detail#VALUES}. */
    Work(Detail detail) {
        this.recorded = detail == Detail.PRINTED;
    }

    /** A value the equations may use, e.g. Fy or Zx. */
    Work given(String symbol, double value, Kind kind) {
        known.put(symbol, Value.of(symbol, value, kind));
        return this;
    }

    /** Evaluates {@code symbol = template}, records it, and returns its value. */
    double eq(String number, String symbol, Kind kind, String template) {
        return record(number, symbol, kind, template, null);
    }

    /** As {@link #eq}, the result bounded above by the known value {@code capSymbol} ({@code Mn <= Mp}). */
    double eqCapped(String number, String symbol, Kind kind, String template, String capSymbol) {
        return record(number, symbol, kind, template, value(capSymbol));
    }

    /** As {@link #eq}, bounded above by {@code capTemplate}, shown as {@code capSymbol} ({@code Mp <= 1.6 My}). */
    double eqCapped(String number, String symbol, Kind kind, String template, String capSymbol, String capTemplate) {
        return record(number, symbol, kind, template, Value.of(capSymbol, Expression.evaluate(capTemplate, known), kind));
    }

    /** The value of {@code template} from the known values, recorded nowhere (a comparison, a limit). */
    double evaluate(String template) {
        return Expression.evaluate(template, known);
    }

    private double record(String number, String symbol, Kind kind, String template, Value cap) {
        double raw = Expression.evaluate(template, known);
        double v = cap == null ? raw : Math.min(raw, cap.value());
        Value result = Value.of(symbol, v, kind);
        if (recorded) {
            equations.add(new Equation(number, result, template, inputsOf(template), cap));
        }
        known.put(symbol, result);
        return v;
    }

    Value value(String symbol) {
        Value v = known.get(symbol);
        if (v == null) {
            throw new IllegalArgumentException("no value " + symbol);
        }
        return v;
    }

    /** The equations recorded, in order; none on a sheet that works the values only. */
    List<Equation> equations() {
        return List.copyOf(equations);
    }

    private List<Value> inputsOf(String template) {
        List<Value> used = new ArrayList<>();
        for (String symbol : Expression.of(template).symbols()) {
            used.add(value(symbol));
        }
        return used;
    }
}
