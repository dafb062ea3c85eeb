package org.beamfolio.combinations;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import org.beamfolio.model.Combination;
import org.junit.jupiter.api.Test;

/** The built-in sets hold the combinations of the clauses they cite, each listed here again. */
class BuiltInSetsTest {
    static String text(List<Combination> combinations) {
        return combinations.stream().map(c -> c.name() + " = " + c.factors()).collect(Collectors.joining("\n"));
    }

    @Test
    void asce7AllowableStressBasicCombinations() {
        // ASCE/SEI 7-22 section 2.4.1 (from the standard; snow at 0.7S since ASCE 7-22 gives strength-level snow):
        // (1) D; (2) D + L; (3) D + (Lr or 0.7S or R); (4) D + 0.75L + 0.75(Lr or 0.7S or R);
        // (5) D + 0.6W; (6) D + 0.75L + 0.75(0.6W) + 0.75(Lr or 0.7S or R); (7) 0.6D + 0.6W
        CombinationSet.Expansion e = BuiltInSets.find("ASCE7-ASD").orElseThrow().expand(Set.of("D", "L", "Lr", "S", "R", "W"));
        assertEquals(String.join("\n",
                "D = {D=1.0}",
                "D + L = {D=1.0, L=1.0}",
                "D + Lr = {D=1.0, Lr=1.0}",
                "D + 0.7S = {D=1.0, S=0.7}",
                "D + R = {D=1.0, R=1.0}",
                "D + 0.75L + 0.75Lr = {D=1.0, L=0.75, Lr=0.75}",
                "D + 0.75L + 0.75(0.7S) = {D=1.0, L=0.75, S=0.525}",
                "D + 0.75L + 0.75R = {D=1.0, L=0.75, R=0.75}",
                "D + 0.6W = {D=1.0, W=0.6}",
                "D + 0.75L + 0.75(0.6W) + 0.75Lr = {D=1.0, L=0.75, W=0.45, Lr=0.75}",
                "D + 0.75L + 0.75(0.6W) + 0.75(0.7S) = {D=1.0, L=0.75, W=0.45, S=0.525}",
                "D + 0.75L + 0.75(0.6W) + 0.75R = {D=1.0, L=0.75, W=0.45, R=0.75}",
                "0.6D + 0.6W = {D=0.6, W=0.6}"), text(e.combinations()));
    }

    @Test
    void asce7StrengthBasicCombinations() {
        // ASCE/SEI 7-22 section 2.3.1: (1) 1.4D; (2) 1.2D + 1.6L + 0.5(Lr or S or R);
        // (3) 1.2D + 1.6(Lr or S or R) + (L or 0.5W); (4) 1.2D + 1.0W + L + 0.5(Lr or S or R); (5) 0.9D + 1.0W
        CombinationSet.Expansion e = BuiltInSets.find("ASCE7-LRFD").orElseThrow().expand(Set.of("D", "L", "S", "W"));
        assertEquals(String.join("\n",
                "1.4D = {D=1.4}",
                "1.2D + 1.6L + 0.5S = {D=1.2, L=1.6, S=0.5}",
                "1.2D + 1.6S + L = {D=1.2, S=1.6, L=1.0}",
                "1.2D + 1.6S + 0.5W = {D=1.2, S=1.6, W=0.5}",
                "1.2D + W + L + 0.5S = {D=1.2, W=1.0, L=1.0, S=0.5}",
                "0.9D + W = {D=0.9, W=1.0}"), text(e.combinations()));
    }

    @Test
    void combinationsWithoutTheJobsCasesAreDroppedAndSaid() {
        CombinationSet.Expansion e = BuiltInSets.find("ASCE7-ASD").orElseThrow().expand(Set.of("D", "L"));
        assertEquals(List.of("D", "D + L", "D + 0.75L"), e.combinations().stream().map(Combination::name).toList());
        assertEquals(4, e.dropped().size(), "(3), (5) and (7) have none of their cases; (6) reduces to (4)");
    }

    @Test
    void en1990Fundamental() {
        // EN 1990 expression (6.10), gamma_G = 1.35 and gamma_Q = 1.5 (Table A1.2(B)), psi_0 = 0.7
        // for imposed loads of categories A and B and 0.5 for snow (Table A1.1); characteristic (6.14b)
        CombinationSet.Expansion e = BuiltInSets.find("EN1990").orElseThrow().expand(Set.of("D", "L", "S"));
        Map<String, Map<String, Double>> byName = e.combinations().stream()
                .collect(Collectors.toMap(Combination::name, Combination::factors));
        assertEquals(Map.of("D", 1.35, "L", 1.5, "S", 0.75), byName.get("1.35D + 1.5L + 1.5(0.5)S"));
        assertEquals(Map.of("D", 1.35, "S", 1.5, "L", 1.05), byName.get("1.35D + 1.5S + 1.5(0.7)L"));
        assertEquals(Map.of("D", 1.0, "L", 1.0, "S", 0.5), byName.get("D + L + 0.5S"));
    }
}
