package org.beamfolio.design.steel;

import static org.beamfolio.design.steel.Us.FT;
import static org.beamfolio.design.steel.Us.KSI;
import static org.beamfolio.design.steel.Us.kipFt;
import static org.beamfolio.design.steel.Us.member;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.beamfolio.catalogue.SteelGrade;
import org.junit.jupiter.api.Test;

/**
 * Flexural strength against the AISC Design Examples (companion to the 15th edition Manual,
 * v15.0), which print three significant figures: a computed value must round to the printed one
 * or lie within half a unit of its last figure. The example numbers and printed values are from
 * memory, as the issue lists them; where a value is worked by hand here instead, the working is
 * beside it.
 */
class FlexureTest {
    /** Within half a unit of the third significant figure of a printed value, plus its rounding. */
    static void printed(double expected, double actual) {
        double unit = Math.pow(10, Math.floor(Math.log10(Math.abs(expected))) - 2);
        assertEquals(expected, actual, unit, "printed to three figures");
    }

    @Test
    void w18x50ContinuouslyBracedReachesThePlasticMoment() {
        // AISC Design Examples v15.0, F.1-1A and F.1-1B: W18x50, A992, continuously braced:
        // Mp = 421 kip-ft, phi Mn = 379 kip-ft, Mn / Omega = 252 kip-ft
        Strength s = Flexure.strength(member("W18X50", SteelGrade.A992), FlexureCase.continuouslyBraced());
        assertEquals("F2", s.section().clause());
        assertEquals("yielding", s.governing().limitState());
        printed(421, kipFt(s.nominal()));
        printed(379, kipFt(s.available(Method.LRFD)));
        printed(252, kipFt(s.available(Method.ASD)));
        assertFalse(s.evaluated().get(1).applies(), "Lb = 0 <= Lp: no lateral-torsional buckling");
    }

    @Test
    void w18x50BracedAtThirdPointsBucklesInelastically() {
        // AISC Design Examples v15.0, F.1-2: Lb = 35 ft / 3 = 11.7 ft, Cb = 1.01, Lp = 5.83 ft,
        // Lr = 16.9 ft (Manual Table 3-2), Mn = 338 kip-ft by Eq. F2-2. The example rounds Lb, Lp
        // and Lr before substituting; full precision gives 339.3, within 0.5 % of 338.
        Strength s = Flexure.strength(member("W18X50", SteelGrade.A992), FlexureCase.unbraced(35 * FT / 3, 1.01));
        LimitStateResult ltb = s.governing();
        assertEquals("lateral-torsional buckling", ltb.limitState());
        assertEquals("F2-2", ltb.equations().get(ltb.equations().size() - 1).number());
        printed(5.83, equation(ltb, "Lp") / FT);
        printed(16.9, equation(ltb, "Lr") / FT);
        assertEquals(338, kipFt(s.nominal()), 338 * 0.005);
    }

    @Test
    void w18x50BracedAtMidspanBucklesElastically() {
        // AISC Design Examples v15.0, F.1-3: Lb = 17.5 ft, Cb = 1.30, Fcr = 43.2 ksi (Eq. F2-4),
        // Mn = Fcr Sx = 320 kip-ft (Eq. F2-3)
        Strength s = Flexure.strength(member("W18X50", SteelGrade.A992), FlexureCase.unbraced(17.5 * FT, 1.30));
        LimitStateResult ltb = s.governing();
        printed(43.2, equation(ltb, "Fcr") / KSI);
        printed(320, kipFt(s.nominal()));
        assertEquals("F2-3", ltb.equations().get(ltb.equations().size() - 1).number());
    }

    @Test
    void w21x48HasANoncompactFlange() {
        // AISC Design Examples v15.0, F.3A: W21x48, A992, continuously braced, bf/2tf = 9.47 >
        // lambda_pf = 9.15: flange local buckling by Eq. F3-1, Mn = 442 kip-ft
        Strength s = Flexure.strength(member("W21X48", SteelGrade.A992), FlexureCase.continuouslyBraced());
        assertEquals("F3", s.section().clause());
        assertEquals("flange local buckling", s.governing().limitState());
        assertEquals(Slenderness.Compactness.NONCOMPACT, s.compactness().get(0).compactness());
        printed(442, kipFt(s.nominal()));
    }

    @Test
    void hss10x6x3over16HasNoncompactFlanges() {
        // AISC Design Examples v15.0, rectangular HSS with noncompact flanges (the list):
        // HSS10x6x3/16, A500 Grade C, b/t = 31.5 between 1.12 and 1.40 sqrt(E/Fy): Eq. F7-2,
        // Mn = 66.3 kip-ft
        Strength s = Flexure.strength(member("HSS10X6X3/16", SteelGrade.A500C), FlexureCase.continuouslyBraced());
        assertEquals("F7", s.section().clause());
        assertEquals("flange local buckling", s.governing().limitState());
        printed(66.3, kipFt(s.nominal()));
    }

    @Test
    void c15x33point9BracedAtFifthPoints() {
        // AISC Design Examples v15.0, F.2A and F.2B (from memory): C15x33.9, A36, 25 ft span.
        // Continuously braced: phi Mn = 137 kip-ft, Mn / Omega = 91.3 kip-ft (Mp = 36 x 50.8 / 12
        // = 152 kip-ft). Braced at the fifth points, Lb = 5 ft, Cb = 1.00 for the middle segment:
        // phi Mn = 130 kip-ft, Mn / Omega = 86.6 kip-ft (Eq. F2-2, c by Eq. F2-8b). By hand from the
        // row: Lp = 45.0 in, c = 1.081, Lr = 173.8 in, Mn = 1739 kip-in = 144.9 kip-ft, so Mn / Omega
        // = 86.8: within 0.3 % of the remembered 86.6, taken as the check.
        SteelMember c = member("C15X33.9", SteelGrade.A36);
        Strength braced = Flexure.strength(c, FlexureCase.continuouslyBraced());
        printed(137, kipFt(braced.available(Method.LRFD)));
        printed(91.3, kipFt(braced.available(Method.ASD)));
        Strength fifth = Flexure.strength(c, FlexureCase.unbraced(5 * FT, 1.0));
        assertEquals("lateral-torsional buckling", fifth.governing().limitState());
        assertTrue(fifth.governing().equations().stream().anyMatch(e -> e.number().equals("F2-8b")));
        printed(130, kipFt(fifth.available(Method.LRFD)));
        assertEquals(86.6, kipFt(fifth.available(Method.ASD)), 86.6 * 0.003);
    }

    @Test
    void roundHssYieldsWhenCompact() {
        // By hand: HSS6.625X.280 (AISC Shapes Database v15.0: D/t = 25.5, Z = 10.5 in^3),
        // A500 Grade C round, Fy = 46 ksi: lambda_p = 0.07 x 29000 / 46 = 44.1 > 25.5, compact;
        // Mn = Mp = 46 x 10.5 = 483 kip-in = 40.25 kip-ft (Eq. F8-1)
        Strength s = Flexure.strength(member("HSS6.625X.280", SteelGrade.A500C), FlexureCase.continuouslyBraced());
        assertEquals("F8", s.section().clause());
        assertEquals(46 * 10.5 / 12, kipFt(s.nominal()), 1e-9);
        assertFalse(s.evaluated().get(1).applies());
    }

    @Test
    void teeStemInTensionBetweenLpAndLr() {
        // By hand, AISC 360-16 F9: WT9X17.5 (Shapes Database v15.0: d = 8.85, Zx = 11.2, Sx = 6.21,
        // Iy = 7.67, J = 0.252, ry = 1.22 in), A992, stem in tension.
        // My = 50 x 6.21 = 310.5 kip-in; Mp = min(50 x 11.2 = 560, 1.6 My = 496.8) = 496.8 kip-in.
        // Lp = 1.76 x 1.22 x sqrt(580) = 51.71 in.
        // Lr = 1.95 (580) sqrt(7.67 x 0.252) / 6.21 x sqrt(2.36 / 580 x 8.85 x 6.21 / 0.252 + 1)
        //    = 1131 x 1.39027 / 6.21 x sqrt(1.88738) = 253.21 x 1.37382 = 347.9 in.
        // Lb = 10 ft = 120 in: Mn = 496.8 - (496.8 - 310.5)(120 - 51.71)/(347.9 - 51.71) = 453.8 kip-in.
        // Flange: bf/2tf = 7.06 < 0.38 sqrt(580) = 9.15, compact.
        Strength s = Flexure.strength(member("WT9X17.5", SteelGrade.A992), new FlexureCase(10 * FT, 1.0, false));
        assertEquals("F9", s.section().clause());
        assertEquals("lateral-torsional buckling", s.governing().limitState());
        assertEquals(453.8, kipFt(s.nominal()) * 12, 0.2);
    }

    @Test
    void teeStemInCompressionIsLimitedByItsStem() {
        // By hand, AISC 360-16 F9.4: WT9X17.5, d/tw = 29.5 between 0.84 sqrt(580) = 20.2 and 1.52
        // sqrt(580) = 36.6: Fcr = (1.43 - 0.515 x 29.5 x 0.041523) 50 = 39.96 ksi (Eq. F9-18);
        // Mn = 39.96 x 6.21 = 248.1 kip-in (Eq. F9-16), below My = 310.5 kip-in. Continuously braced.
        Strength s = Flexure.strength(member("WT9X17.5", SteelGrade.A992), new FlexureCase(0, 1.0, true));
        assertEquals("stem local buckling", s.governing().limitState());
        assertEquals(248.1, kipFt(s.nominal()) * 12, 0.1);
    }

    @Test
    void teeLrIsWhereTheElasticMomentReachesMy() {
        // AISC 360-16 F9.2(a): Lr (Eq. F9-9) is the length at which Mcr of Eq. F9-10 equals My
        // (the elastic and inelastic ranges meet), so the two equations as coded must agree there;
        // the specification's constants 1.95 and 2.36 are rounded, so they meet to 1e-3, not to round-off.
        SteelMember wt = member("WT9X17.5", SteelGrade.A992);
        LimitStateResult atLr = new F9LateralTorsionalBuckling().evaluate(wt, new FlexureCase(1, 1, false));
        double lr = equation(atLr, "Lr");
        double my = equation(atLr, "My");
        LimitStateResult beyond = new F9LateralTorsionalBuckling().evaluate(wt, new FlexureCase(lr * (1 + 1e-12), 1, false));
        assertEquals(my, beyond.nominal(), my * 1e-3);
    }

    @Test
    void anIShapeWithANoncompactWebIsOutOfScope() {
        // No rolled W shape has a noncompact web at 50 ksi; at Fy = 100 ksi (invented), 3.76
        // sqrt(29000/100) = 64.0 < h/tw = 74.8 of M12.5X12.4: F4 would apply, not implemented.
        var shape = org.beamfolio.catalogue.ShapeCatalogue.aisc().find("M12.5X12.4").orElseThrow();
        SteelMember m = new SteelMember(shape, 100 * KSI, 110 * KSI, 29_000 * KSI, Edition.AISC_360_22);
        assertTrue(Flexure.outOfScope(m).orElseThrow().contains("F4 and F5"));
        assertThrows(OutOfScopeException.class, () -> Flexure.strength(m, FlexureCase.continuouslyBraced()));
    }

    static double equation(LimitStateResult r, String symbol) {
        return r.equations().stream().filter(e -> e.result().symbol().equals(symbol)).reduce((a, b) -> b)
                .orElseThrow().value();
    }
}
