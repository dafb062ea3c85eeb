package org.beamfolio.derivation;

/**
 * Evaluates the substituted side of a derivation step as printed: numbers with thousands
 * separators, units in brackets (skipped), + − × / ( ) and postfix powers ² to ⁷. Used by the tests to
 * re-evaluate what the package prints.
 */
final class Arithmetic {
    private final String s;
    private int i;

    private Arithmetic(String s) {
        this.s = s;
    }

    static double evaluate(String expression) {
        String cleaned = expression.replaceAll("\\[[^\\]0-9]*\\]", "").replaceAll("(?<=\\d),(?=\\d{3})", "");
        Arithmetic a = new Arithmetic(cleaned);
        double v = a.sum();
        a.blank();
        if (a.i != a.s.length()) {
            throw new IllegalArgumentException("cannot read past position " + a.i + " of: " + cleaned);
        }
        return v;
    }

    private void blank() {
        while (i < s.length() && Character.isWhitespace(s.charAt(i))) {
            i++;
        }
    }

    private boolean eat(char c) {
        blank();
        if (i < s.length() && s.charAt(i) == c) {
            i++;
            return true;
        }
        return false;
    }

    private double sum() {
        double v = product();
        while (true) {
            if (eat('+')) {
                v += product();
            } else if (eat('−') || eat('-')) {
                v -= product();
            } else {
                return v;
            }
        }
    }

    private double product() {
        double v = power();
        while (true) {
            if (eat('×') || eat('*')) {
                v *= power();
            } else if (eat('/')) {
                v /= power();
            } else {
                return v;
            }
        }
    }

    private double power() {
        double v = unary();
        while (true) {
            int power = "²³⁴⁵⁶⁷".indexOf(peek()) + 2;
            if (power < 2) {
                return v;
            }
            i++;
            v = Math.pow(v, power);
        }
    }

    private char peek() {
        blank();
        return i < s.length() ? s.charAt(i) : ' ';
    }

    private double unary() {
        if (eat('−') || eat('-')) {
            return -unary();
        }
        if (eat('(') || eat('[')) {
            double v = sum();
            if (!eat(')') && !eat(']')) {
                throw new IllegalArgumentException("unclosed bracket in: " + s);
            }
            return v;
        }
        blank();
        int start = i;
        while (i < s.length() && (Character.isDigit(s.charAt(i)) || s.charAt(i) == '.' || s.charAt(i) == 'e'
                || (s.charAt(i) == '-' && i > start && s.charAt(i - 1) == 'e'))) {
            i++;
        }
        if (start == i) {
            throw new IllegalArgumentException("expected a number at position " + i + " of: " + s);
        }
        return Double.parseDouble(s.substring(start, i));
    }
}
