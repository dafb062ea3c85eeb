package org.beamfolio.design.steel;

import java.util.Map;

/**
 * Evaluates an equation's template: numbers, {@code {symbol}}, + - * / ^ (right-associative),
 * unary minus, parentheses, {@code sqrt(..)} and {@code pi}. The strength is computed from the
 * same text that is printed, so the printed equation and the number cannot disagree.
 */
final class Expression {
    private final String text;
    private final Map<String, Value> values;
    private int pos;

    private Expression(String text, Map<String, Value> values) {
        this.text = text;
        this.values = values;
    }

    static double evaluate(String template, Map<String, Value> values) {
        Expression e = new Expression(template, values);
        double v = e.sum();
        e.skipSpaces();
        if (e.pos != template.length()) {
            throw e.error("unexpected text");
        }
        return v;
    }

    private double sum() {
        double v = product();
        while (true) {
            if (eat('+')) {
                v += product();
            } else if (eat('-')) {
                v -= product();
            } else {
                return v;
            }
        }
    }

    private double product() {
        double v = power();
        while (true) {
            if (eat('*')) {
                v *= power();
            } else if (eat('/')) {
                v /= power();
            } else {
                return v;
            }
        }
    }

    private double power() {
        double base = unary();
        return eat('^') ? Math.pow(base, power()) : base;
    }

    private double unary() {
        return eat('-') ? -unary() : atom();
    }

    private double atom() {
        skipSpaces();
        if (eat('(')) {
            double v = sum();
            expect(')');
            return v;
        }
        if (eat('[')) {
            double v = sum();
            expect(']');
            return v;
        }
        if (eat('{')) {
            int close = text.indexOf('}', pos);
            String symbol = text.substring(pos, close);
            pos = close + 1;
            Value v = values.get(symbol);
            if (v == null) {
                throw error("no value for " + symbol);
            }
            return v.value();
        }
        if (text.startsWith("sqrt(", pos)) {
            pos += 5;
            double v = sum();
            expect(')');
            return Math.sqrt(v);
        }
        if (text.startsWith("pi", pos)) {
            pos += 2;
            return Math.PI;
        }
        int start = pos;
        while (pos < text.length() && (Character.isDigit(text.charAt(pos)) || text.charAt(pos) == '.')) {
            pos++;
        }
        if (start == pos) {
            throw error("expected a number, a {symbol} or (");
        }
        return Double.parseDouble(text.substring(start, pos));
    }

    private boolean eat(char c) {
        skipSpaces();
        if (pos < text.length() && text.charAt(pos) == c) {
            pos++;
            return true;
        }
        return false;
    }

    private void expect(char c) {
        if (!eat(c)) {
            throw error("expected " + c);
        }
    }

    private void skipSpaces() {
        while (pos < text.length() && text.charAt(pos) == ' ') {
            pos++;
        }
    }

    private IllegalArgumentException error(String what) {
        return new IllegalArgumentException(what + " at " + pos + " in: " + text);
    }
}
