package org.beamfolio.catalogue;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Grades against their standards' minimum specified values (ASTM A992, A36, A572 Grade 50, A500
 * Grade C, A53 Grade B as listed in AISC Manual 15th edition Table 2-4; EN 10025-2 / EN 1993-1-1
 * Table 3.1 for t <= 40 mm).
 */
class SteelGradeTest {
    static final double KSI = 6.894757293168361e6;

    @Test
    void astmGradesCarryTheirYieldAndTensileStrengths() {
        assertEquals(50 * KSI, SteelGrade.A992.fy(), 1e-6);
        assertEquals(65 * KSI, SteelGrade.A992.fu(), 1e-6);
        assertEquals(36 * KSI, SteelGrade.A36.fy(), 1e-6);
        assertEquals(58 * KSI, SteelGrade.A36.fu(), 1e-6);
        assertEquals(35 * KSI, SteelGrade.A53B.fy(ShapeFamily.PIPE), 1e-6);
        assertEquals(29_000 * KSI, SteelGrade.A992.elasticModulus(), 1e-3);
    }

    @Test
    void a500GradeCIsFiftyKsiRectangularAndFortySixRound() {
        assertEquals(50 * KSI, SteelGrade.A500C.fy(ShapeFamily.HSS_RECTANGULAR), 1e-6);
        assertEquals(46 * KSI, SteelGrade.A500C.fy(ShapeFamily.HSS_ROUND), 1e-6);
        assertEquals(62 * KSI, SteelGrade.A500C.fu(), 1e-6);
    }

    @Test
    void enGradesUse210GPa() {
        assertEquals(355e6, SteelGrade.S355.fy(), 0);
        assertEquals(490e6, SteelGrade.S355.fu(), 0);
        assertEquals(210e9, SteelGrade.S275.elasticModulus(), 0);
        assertTrue(SteelGrade.S235.standard().startsWith("EN 10025-2"));
    }

    @Test
    void densityIs490PoundsPerCubicFootForAstmGrades() {
        // 490 pcf = 76.97 kN/m^3 (common practice for structural steel)
        assertEquals(76.97e3, SteelGrade.A36.weightDensity(), 10);
    }

    @Test
    void gradesAreFoundWhateverTheirCaseOrHyphens() {
        assertEquals(SteelGrade.A572_50, SteelGrade.find("a572-50").orElseThrow());
        assertEquals(SteelGrade.A572_50, SteelGrade.find("A572 50").orElseThrow());
        assertEquals(SteelGrade.A500C, SteelGrade.find("a500c").orElseThrow());
        assertTrue(SteelGrade.find("A993").isEmpty());
    }
}
