package org.beamfolio.design.steel;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

/**
 * An equation's template, parsed: numbers, {@code {symbol}}, + - * / ^ (right-associative), unary
 * minus, parentheses and brackets, {@code sqrt(..)} and {@code pi}. The strength is computed from
 * the same text that is printed, so the printed equation and the number cannot disagree. Templates
 * are a fixed set written in the limit-state classes, so each is parsed once and kept.
 */
final class Expression {
    /** A parsed template: evaluates from the known values. */
    private interface Node {
        double at(Map<String, Value> values);
    }

    private static final Map<String, Expression> PARSED = new ConcurrentHashMap<>();

    private final Node root;
    private final List<String> symbols;

    private Expression(Node root, List<String> symbols) {
        this.root = root;
        this.symbols = List.copyOf(symbols);
    }

    static Expression of(String template) {
        return PARSED.computeIfAbsent(template, t -> new Parser(t).parse());
    }

    static double evaluate(String template, Map<String, Value> values) {
        return of(template).evaluate(values);
    }

    double evaluate(Map<String, Value> values) {
        return root.at(values);
    }

    /** The symbols the template names, in order of first appearance. */
    List<String> symbols() {
        return symbols;
    }

    private static final class Parser {
        private final String text;
        private final List<String> symbols = new ArrayList<>();
        private int pos;

        Parser(String text) {
            this.text = text;
        }

        Expression parse() {
            Node n = sum();
            skipSpaces();
            if (pos != text.length()) {
                throw error("unexpected text");
            }
            return new Expression(n, symbols);
        }

        private Node sum() {
            Node v = product();
            while (true) {
                Node left = v;
                if (eat('+')) {
                    Node right = product();
                    v = m -> left.at(m) + right.at(m);
                } else if (eat('-')) {
                    Node right = product();
                    v = m -> left.at(m) - right.at(m);
                } else {
                    return v;
                }
            }
        }

        private Node product() {
            Node v = unary();
            while (true) {
                Node left = v;
                if (eat('*')) {
                    Node right = unary();
                    v = m -> left.at(m) * right.at(m);
                } else if (eat('/')) {
                    Node right = unary();
                    v = m -> left.at(m) / right.at(m);
                } else {
                    return v;
                }
            }
        }

        /** A minus sign binds more loosely than a power: -a^2 is -(a^2). */
        private Node unary() {
            if (eat('-')) {
                Node operand = unary();
                return m -> -operand.at(m);
            }
            return power();
        }

        private Node power() {
            Node base = atom();
            if (eat('^')) {
                Node exponent = unary();
                return m -> Math.pow(base.at(m), exponent.at(m));
            }
            return base;
        }

        private Node atom() {
            skipSpaces();
            if (eat('(')) {
                Node v = sum();
                expect(')');
                return v;
            }
            if (eat('[')) {
                Node v = sum();
                expect(']');
                return v;
            }
            if (eat('{')) {
                int close = text.indexOf('}', pos);
                if (close < 0) {
                    throw error("no closing }");
                }
                String symbol = text.substring(pos, close);
                pos = close + 1;
                if (!symbols.contains(symbol)) {
                    symbols.add(symbol);
                }
                return m -> {
                    Value v = m.get(symbol);
                    if (v == null) {
                        throw new IllegalArgumentException("no value for " + symbol + " in: " + text);
                    }
                    return v.value();
                };
            }
            if (text.startsWith("sqrt(", pos)) {
                pos += 5;
                Node v = sum();
                expect(')');
                return m -> Math.sqrt(v.at(m));
            }
            if (text.startsWith("pi", pos)) {
                pos += 2;
                return m -> Math.PI;
            }
            int start = pos;
            while (pos < text.length() && (Character.isDigit(text.charAt(pos)) || text.charAt(pos) == '.')) {
                pos++;
            }
            if (start == pos) {
                throw error("expected a number, a {symbol} or (");
            }
            double constant = Double.parseDouble(text.substring(start, pos));
            return m -> constant;
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
}
