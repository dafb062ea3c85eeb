package org.beamfolio.combinations;

import java.util.List;
import org.beamfolio.model.Purpose;

/**
 * One combination as a standard writes it: a sum of terms, each term a factor on one case or on
 * one of several alternative cases ("0.75(Lr or 0.7S or R)").
 *
 * @param reference where the combination stands, e.g. "ASCE/SEI 7-22 2.4.1 (3)"
 */
public record CombinationTemplate(String reference, List<Term> terms, Purpose purpose) {
    public CombinationTemplate {
        terms = List.copyOf(terms);
    }

    /** One of the alternatives a term offers: a factor on one case. */
    public record Choice(double factor, String loadCase, String label) {}

    /**
     * A sum term; one of its choices applies, or none when the job has none of their cases. A
     * required term (the leading variable action of EN 1990) takes the whole combination with it.
     */
    public record Term(List<Choice> choices, boolean required) {
        public Term {
            choices = List.copyOf(choices);
        }

        public Term(List<Choice> choices) {
            this(choices, false);
        }
    }

    static Term term(double factor, String loadCase) {
        return new Term(List.of(choice(factor, loadCase)));
    }

    static Term leading(double factor, String loadCase) {
        return new Term(List.of(choice(factor, loadCase)), true);
    }

    static Term anyOf(Choice... choices) {
        return new Term(List.of(choices));
    }

    static Choice choice(double factor, String loadCase) {
        return new Choice(factor, loadCase, label(factor, loadCase));
    }

    /** A choice labelled as the standard prints it, e.g. 0.75(0.6W). */
    static Choice choice(double factor, String loadCase, String label) {
        return new Choice(factor, loadCase, label);
    }

    static String label(double factor, String loadCase) {
        if (factor == 1.0) {
            return loadCase;
        }
        String f = Double.toString(factor);
        if (f.endsWith(".0")) {
            f = f.substring(0, f.length() - 2);
        }
        return f + loadCase;
    }
}
