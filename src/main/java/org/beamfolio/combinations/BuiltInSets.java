package org.beamfolio.combinations;

import static org.beamfolio.combinations.CombinationTemplate.anyOf;
import static org.beamfolio.combinations.CombinationTemplate.choice;
import static org.beamfolio.combinations.CombinationTemplate.term;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.beamfolio.model.Purpose;

/**
 * The built-in combination sets of format 1. The factors are transcribed from the standards
 * named in each set's source; the tests list every combination again with its clause number.
 */
public final class BuiltInSets {
    public static final String ASCE7_ASD = "ASCE7-ASD";
    public static final String ASCE7_LRFD = "ASCE7-LRFD";
    public static final String EN1990 = "EN1990";

    private static final Map<String, CombinationSet> SETS = Map.of(
            ASCE7_ASD, asce7Asd(),
            ASCE7_LRFD, asce7Lrfd(),
            EN1990, en1990());

    private BuiltInSets() {}

    public static List<String> names() {
        return List.of(ASCE7_ASD, ASCE7_LRFD, EN1990);
    }

    public static Optional<CombinationSet> find(String name) {
        return Optional.ofNullable(SETS.get(name));
    }

    /** ASCE/SEI 7-22 section 2.4.1, basic combinations for allowable stress design (1) to (7). */
    private static CombinationSet asce7Asd() {
        String s = "ASCE/SEI 7-22 2.4.1 ";
        CombinationTemplate.Term roof = anyOf(choice(1, "Lr"), choice(0.7, "S"), choice(1, "R"));
        CombinationTemplate.Term roof75 = anyOf(choice(0.75, "Lr"), choice(0.525, "S", "0.75(0.7S)"), choice(0.75, "R"));
        List<CombinationTemplate> t = List.of(
                new CombinationTemplate(s + "(1)", List.of(term(1, "D")), Purpose.ALLOWABLE_STRESS),
                new CombinationTemplate(s + "(2)", List.of(term(1, "D"), term(1, "L")), Purpose.ALLOWABLE_STRESS),
                new CombinationTemplate(s + "(3)", List.of(term(1, "D"), roof), Purpose.ALLOWABLE_STRESS),
                new CombinationTemplate(s + "(4)", List.of(term(1, "D"), term(0.75, "L"), roof75), Purpose.ALLOWABLE_STRESS),
                new CombinationTemplate(s + "(5)", List.of(term(1, "D"), term(0.6, "W")), Purpose.ALLOWABLE_STRESS),
                new CombinationTemplate(s + "(6)", List.of(term(1, "D"), term(0.75, "L"),
                        new CombinationTemplate.Term(List.of(choice(0.45, "W", "0.75(0.6W)"))), roof75), Purpose.ALLOWABLE_STRESS),
                new CombinationTemplate(s + "(7)", List.of(term(0.6, "D"), term(0.6, "W")), Purpose.ALLOWABLE_STRESS));
        return new CombinationSet(ASCE7_ASD, "ASCE/SEI 7-22, section 2.4.1, basic combinations (allowable stress design)",
                CombinationSet.Purpose.ALLOWABLE_STRESS, t, Set.of("D", "L", "Lr", "S", "R", "W"));
    }

    /** ASCE/SEI 7-22 section 2.3.1, basic combinations for strength design (1) to (5). */
    private static CombinationSet asce7Lrfd() {
        String s = "ASCE/SEI 7-22 2.3.1 ";
        CombinationTemplate.Term roofHalf = anyOf(choice(0.5, "Lr"), choice(0.5, "S"), choice(0.5, "R"));
        List<CombinationTemplate> t = List.of(
                new CombinationTemplate(s + "(1)", List.of(term(1.4, "D")), Purpose.STRENGTH),
                new CombinationTemplate(s + "(2)", List.of(term(1.2, "D"), term(1.6, "L"), roofHalf), Purpose.STRENGTH),
                new CombinationTemplate(s + "(3)", List.of(term(1.2, "D"),
                        anyOf(choice(1.6, "Lr"), choice(1.6, "S"), choice(1.6, "R")),
                        anyOf(choice(1, "L"), choice(0.5, "W"))), Purpose.STRENGTH),
                new CombinationTemplate(s + "(4)", List.of(term(1.2, "D"), term(1.0, "W"), term(1, "L"), roofHalf), Purpose.STRENGTH),
                new CombinationTemplate(s + "(5)", List.of(term(0.9, "D"), term(1.0, "W")), Purpose.STRENGTH));
        return new CombinationSet(ASCE7_LRFD, "ASCE/SEI 7-22, section 2.3.1, basic combinations (strength design)",
                CombinationSet.Purpose.STRENGTH, t, Set.of("D", "L", "Lr", "S", "R", "W"));
    }

    /**
     * EN 1990:2002 expression (6.10) with the recommended partial factors of Table A1.2(B)
     * (gamma_G = 1.35, gamma_Q = 1.5) and the recommended psi_0 of Table A1.1 (imposed load,
     * categories A and B: 0.7; roofs, category H: 0; snow at sites up to 1000 m: 0.5; wind: 0.6),
     * each variable case leading in turn; plus the characteristic (service) combination (6.14b).
     */
    private static CombinationSet en1990() {
        Map<String, Double> psi0 = Map.of("L", 0.7, "Lr", 0.0, "S", 0.5, "W", 0.6);
        List<String> variables = List.of("L", "Lr", "S", "W");
        List<CombinationTemplate> t = new ArrayList<>();
        t.add(new CombinationTemplate("EN 1990 (6.10)", List.of(term(1.35, "D")), Purpose.STRENGTH));
        for (String lead : variables) {
            List<CombinationTemplate.Term> terms = new ArrayList<>();
            terms.add(term(1.35, "D"));
            terms.add(CombinationTemplate.leading(1.5, lead));
            for (String other : variables) {
                double factor = 1.5 * psi0.get(other);
                if (!other.equals(lead) && factor > 0) {
                    terms.add(new CombinationTemplate.Term(List.of(choice(round(factor), other,
                            "1.5(" + psi0.get(other) + ")" + other))));
                }
            }
            t.add(new CombinationTemplate("EN 1990 (6.10), " + lead + " leading", terms, Purpose.STRENGTH));
        }
        for (String lead : variables) {
            List<CombinationTemplate.Term> terms = new ArrayList<>();
            terms.add(term(1, "D"));
            terms.add(CombinationTemplate.leading(1, lead));
            for (String other : variables) {
                if (!other.equals(lead) && psi0.get(other) > 0) {
                    terms.add(term(psi0.get(other), other));
                }
            }
            t.add(new CombinationTemplate("EN 1990 (6.14b) characteristic, " + lead + " leading", terms, Purpose.SERVICE));
        }
        return new CombinationSet(EN1990, "EN 1990:2002, expression (6.10) with recommended factors "
                + "(Tables A1.1, A1.2(B)), and the characteristic combination (6.14b)",
                CombinationSet.Purpose.MIXED, t, Set.of("D", "L", "Lr", "S", "W"));
    }

    private static double round(double factor) {
        return Math.round(factor * 1e6) / 1e6;
    }
}
