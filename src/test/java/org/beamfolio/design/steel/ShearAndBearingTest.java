package org.beamfolio.design.steel;

import static org.beamfolio.design.steel.Us.IN;
import static org.beamfolio.design.steel.Us.KIP;
import static org.beamfolio.design.steel.Us.member;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.beamfolio.catalogue.SteelGrade;
import org.junit.jupiter.api.Test;

/** Shear (Chapter G) and web bearing (J10.2, J10.3) against the AISC Design Examples and by hand. */
class ShearAndBearingTest {
    @Test
    void w24x62RolledWebTakesPhiOneAndCv1One() {
        // AISC Design Examples v15.0, G.1A (from memory): W24x62, A992, h/tw = 50.1 <= 2.24
        // sqrt(E/Fy) = 53.9: Cv1 = 1.0, phi_v = 1.00, Omega_v = 1.50;
        // Vn = 0.6 x 50 x (23.7 x 0.430) x 1.0 = 306 kips, phi Vn = 306 kips, Vn / Omega = 204 kips
        Strength s = Shear.strength(member("W24X62", SteelGrade.A992), null);
        FlexureTest.printed(306, s.nominal() / KIP);
        FlexureTest.printed(306, s.available(Method.LRFD) / KIP);
        FlexureTest.printed(204, s.available(Method.ASD) / KIP);
        assertEquals("G2.1(a)", s.resistance().clause().clause());
    }

    @Test
    void aChannelWebTakesTheGeneralFactors() {
        // AISC 360-16 G2.1(b) by hand: C15X33.9, A36, h/tw = 31.8 <= 1.10 sqrt(5.34 x 29000/36)
        // = 72.2: Cv1 = 1.0 (Eq. G2-3), phi_v = 0.90; Vn = 0.6 x 36 x 15 x 0.4 = 129.6 kips
        Strength s = Shear.strength(member("C15X33.9", SteelGrade.A36), null);
        assertEquals(129.6, s.nominal() / KIP, 1e-9);
        assertEquals(0.90 * 129.6, s.available(Method.LRFD) / KIP, 1e-9);
        assertEquals("G2-3", s.governing().equations().get(2).number());
    }

    @Test
    void rectangularHssShearUsesBothWebs() {
        // AISC 360-16 G4 by hand: HSS10X6X3/16 (h = 9.48 in flat, t = 0.174 in, h/t = 54.5), A500C
        // Fy = 50 ksi: 1.10 sqrt(5 x 29000 / 50) = 59.2 >= 54.5, Cv2 = 1.0 (Eq. G2-9);
        // Aw = 2 x 9.48 x 0.174 = 3.299 in^2; Vn = 0.6 x 50 x 3.299 = 98.97 kips (Eq. G4-1)
        Strength s = Shear.strength(member("HSS10X6X3/16", SteelGrade.A500C), null);
        assertEquals(0.6 * 50 * 2 * 9.48 * 0.174, s.nominal() / KIP, 1e-9);
    }

    @Test
    void roundHssShearWithoutLvUsesG52bCappedAtPointSixFy() {
        // AISC 360-16 G5 by hand: HSS6.625X.280, D/t = 25.5, Fy = 46 ksi: 0.78 x 29000 / 25.5^1.5
        // = 176.6 ksi > 0.6 Fy = 27.6 ksi, so Fcr = 27.6 ksi; Vn = 27.6 x 5.20 / 2 = 71.76 kips
        Strength s = Shear.strength(member("HSS6.625X.280", SteelGrade.A500C), null);
        assertEquals(27.6 * 5.20 / 2, s.nominal() / KIP, 1e-9);
    }

    @Test
    void webLocalYieldingAtAnEndReaction() {
        // AISC 360-16 J10.2 by hand: W18X50 (tw = 0.355, kdes = 0.972 in), A992, lb = 3.5 in at the
        // end: Rn = 50 x 0.355 x (2.5 x 0.972 + 3.5) = 105.26 kips (Eq. J10-3); inside, farther than
        // d = 18 in from the end: Rn = 50 x 0.355 x (5 x 0.972 + 3.5) = 148.39 kips (Eq. J10-2)
        SteelMember w = member("W18X50", SteelGrade.A992);
        Strength end = WebLocalYielding.strength(w, 3.5 * IN, 0);
        assertEquals(50 * 0.355 * (2.5 * 0.972 + 3.5), end.nominal() / KIP, 1e-9);
        assertEquals(end.nominal() / 1.5, end.available(Method.ASD), 1e-6);
        Strength inside = WebLocalYielding.strength(w, 3.5 * IN, 10 * 12 * IN);
        assertEquals(50 * 0.355 * (5 * 0.972 + 3.5), inside.nominal() / KIP, 1e-9);
    }

    @Test
    void webLocalCripplingAtAnEndReaction() {
        // AISC 360-16 J10.3 by hand: W18X50 (tw = 0.355, tf = 0.570, d = 18.0 in), A992, lb = 3.5 in
        // at the end, lb/d = 0.194 <= 0.2: Eq. J10-5a,
        // Rn = 0.40 x 0.355^2 [1 + 3 (3.5/18)(0.355/0.570)^1.5] sqrt(29000 x 50 x 0.570 / 0.355)
        //    = 0.050410 x 1.28676 x 1525.84 = 98.98 kips; phi Rn = 0.75 x 98.98 = 74.2 kips
        SteelMember w = member("W18X50", SteelGrade.A992);
        Strength s = WebLocalCrippling.strength(w, 3.5 * IN, 0);
        assertEquals("J10-5a", s.governing().equations().get(0).number());
        assertEquals(98.98, s.nominal() / KIP, 0.01);
        assertEquals(0.75 * s.nominal(), s.available(Method.LRFD), 1e-9);
        Strength longer = WebLocalCrippling.strength(w, 6 * IN, 0);
        assertEquals("J10-5b", longer.governing().equations().get(0).number());
        Strength inside = WebLocalCrippling.strength(w, 3.5 * IN, 9 * IN);
        assertEquals("J10-4", inside.governing().equations().get(0).number());
        assertEquals(2 * s.nominal(), inside.nominal(), 1e-9 * s.nominal(), "J10-4 is twice J10-5a");
    }

    @Test
    void webBearingOfAnHssIsOutOfScope() {
        assertThrows(OutOfScopeException.class,
                () -> WebLocalYielding.strength(member("HSS10X6X3/16", SteelGrade.A500C), 0.1, 0));
    }
}
