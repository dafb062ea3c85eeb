package org.beamfolio.units;

import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Lengths written the way US drawings write them: {@code 9'-6"}, {@code 9' 6"}, {@code 9 ft 6 in},
 * {@code 9ft 6in}, with a fraction of an inch ({@code 9'-6 1/2"}, {@code 6-1/2 in}, {@code 3/4"})
 * and a sign in front of the whole ({@code -9'-6"} is minus nine and a half feet). A length in one
 * unit alone ({@code 9'}, {@code 6"}) is an ordinary quantity with a shorthand symbol.
 */
final class FeetAndInches {
    private static final String NUMBER = "(?:\\d+(?:\\.\\d*)?|\\.\\d+)";
    private static final String FEET = "(" + NUMBER + ")\\s*(?:'|ft)";
    /** Whole or decimal inches with an optional fraction, or a fraction alone. */
    private static final String INCHES = "(?:(" + NUMBER + ")(?:[\\s-]+(\\d+)/(\\d+))?|(\\d+)/(\\d+))\\s*(?:\"|in)";
    static final Pattern COMPOUND = Pattern.compile("\\s*([+-]?)\\s*(?:" + FEET + ")?\\s*-?\\s*(?:" + INCHES + ")?\\s*");

    private FeetAndInches() {}

    /** A compound length in metres, or empty when the text is not one (a plain quantity is read elsewhere). */
    static Optional<QuantityParser.Result> parse(String text) {
        Matcher m = COMPOUND.matcher(text);
        if (!m.matches()) {
            return Optional.empty();
        }
        boolean feet = m.group(2) != null;
        boolean inches = m.group(3) != null || m.group(6) != null;
        boolean fraction = m.group(4) != null || m.group(6) != null;
        if (!(feet && inches) && !fraction) {
            return Optional.empty();
        }
        double ft = feet ? Double.parseDouble(m.group(2)) : 0;
        double in = 0;
        if (m.group(3) != null) {
            in = Double.parseDouble(m.group(3));
        }
        String numerator = m.group(4) != null ? m.group(4) : m.group(6);
        String denominator = m.group(4) != null ? m.group(5) : m.group(7);
        if (numerator != null) {
            double d = Double.parseDouble(denominator);
            if (d == 0) {
                return Optional.of(QuantityParser.Result.failure("the fraction " + numerator + "/" + denominator
                        + " has a zero denominator"));
            }
            in += Double.parseDouble(numerator) / d;
        }
        double sign = m.group(1).equals("-") ? -1 : 1;
        double metres = sign * (ft * Units.FOOT + in * Units.INCH);
        Unit foot = Units.of("ft");
        return Optional.of(new QuantityParser.Result(metres, foot, foot.fromSi(metres), null));
    }
}
