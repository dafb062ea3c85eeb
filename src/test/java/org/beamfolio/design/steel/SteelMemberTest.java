package org.beamfolio.design.steel;

import static org.beamfolio.design.steel.Us.KSI;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Map;
import org.beamfolio.catalogue.ShapeCatalogue;
import org.beamfolio.model.Material;
import org.junit.jupiter.api.Test;

/** Fy and Fu of a job's material: explicit values first, else the grade's for the shape's family (ASTM A500 Grade C). */
class SteelMemberTest {
    static Material material(String grade, Double fy, Double fu) {
        return new Material("steel", 29_000 * KSI, null, null, null, null, "", grade, fy, fu);
    }

    @Test
    void a500GradeCGivesRoundHssFortySixAndRectangularFifty() {
        var round = ShapeCatalogue.aisc().find("HSS6.625X.280").orElseThrow();
        var rect = ShapeCatalogue.aisc().find("HSS10X6X3/16").orElseThrow();
        Material a500 = material("A500C", null, null);
        assertEquals(46 * KSI, SteelMember.of(round, a500, Edition.AISC_360_16).fy(), 1e-6);
        assertEquals(50 * KSI, SteelMember.of(rect, a500, Edition.AISC_360_16).fy(), 1e-6);
        assertEquals(62 * KSI, SteelMember.of(rect, a500, Edition.AISC_360_16).fu(), 1e-6);
    }

    @Test
    void explicitFyOverridesTheGrade() {
        var w = ShapeCatalogue.aisc().find("W18X50").orElseThrow();
        assertEquals(55 * KSI, SteelMember.of(w, material("A992", 55 * KSI, null), Edition.AISC_360_22).fy(), 1e-6);
    }

    @Test
    void withoutFyOrGradeThereIsNoSteelMember() {
        var w = ShapeCatalogue.aisc().find("W18X50").orElseThrow();
        assertThrows(IllegalArgumentException.class, () -> SteelMember.of(w, material(null, null, null), Edition.AISC_360_16));
    }

    @Test
    void templatesEvaluateByTheUsualPrecedence() {
        // right-associative powers, unary minus, brackets: plain arithmetic
        Map<String, Value> v = Map.of("a", Value.of("a", 2, Kind.NUMBER), "b", Value.of("b", 3, Kind.NUMBER));
        assertEquals(2 + 3 * 4.0, Expression.evaluate("{a} + {b} * 4", v));
        assertEquals(Math.pow(2, 9), Expression.evaluate("{a}^{b}^2", v));
        assertEquals(-4.0, Expression.evaluate("-{a}^2", v));
        assertEquals(Math.sqrt(2) * Math.PI / 5, Expression.evaluate("sqrt({a}) * pi / [{a} + {b}]", v), 1e-15);
        assertThrows(IllegalArgumentException.class, () -> Expression.evaluate("{a} +", v));
    }
}
