package org.beamfolio.derivation;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** Units in the working print with their repeated factors collected (the algebra of units, common practice). */
class StepsTest {
    @Test
    void productsOfUnitsAreCollected() {
        assertEquals("lb·ft²", Steps.simplify("lb·ft·ft"));
        assertEquals("kN·m³", Steps.simplify("kN·m²·m"));
        assertEquals("lb·in³", Steps.simplify("lb·in·in²"));
        assertEquals("lb·ft²", Steps.n(1, "lb·ft·ft").substring(2).replace("[", "").replace("]", ""));
        assertEquals("in/ft", Steps.simplify("in/ft"), "a quotient is left as written");
        assertEquals("N·mm per kN·m", Steps.simplify("N·mm per kN·m"), "a phrase is left as written");
    }
}
