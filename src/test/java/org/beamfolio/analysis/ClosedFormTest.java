package org.beamfolio.analysis;

import static org.beamfolio.TestJobs.EI;
import static org.beamfolio.TestJobs.caseD;
import static org.beamfolio.TestJobs.text;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * The solver against published closed-form solutions. Sources: AISC Steel Construction Manual,
 * 15th ed., Table 3-23 "Shears, Moments and Deflections" (case numbers quoted from memory, the
 * formulas themselves are the standard ones of every such table); the continuous-beam
 * coefficients for two and three equal spans (AISC Table 3-23 continuous-beam diagrams; also in
 * Roark's Formulas for Stress and Strain); compatibility by hand where stated. Test data: w = 10
 * kN/m, P = 25 kN, EI = 2e7 N*m^2, L = 6 m (invented, for round numbers). The solver is exact,
 * so the tolerance is round-off: 1e-9 relative.
 */
class ClosedFormTest {
    static final double W = 10e3;
    static final double P = 25e3;
    static final double L = 6;
    static final String PIN_ROLLER = "    - { at: 0 m, type: pin }\n    - { at: 6 m, type: roller }\n";
    static final String UNIFORM = "  - { case: D, type: uniform, w: 10 kN/m }\n";

    static void near(double expected, double actual, String what) {
        assertEquals(expected, actual, 1e-9 * Math.max(1, Math.abs(expected)), what);
    }

    @Test
    void simpleBeamUniformLoad() {
        // AISC Manual Table 3-23, case 1: R = wl/2, M max = wl^2/8 at centre, deflection 5wl^4/(384EI)
        Response r = caseD(text("6 m", PIN_ROLLER, UNIFORM));
        near(W * L / 2, r.reactionForce()[0], "left reaction");
        near(W * L / 2, r.reactionForce()[1], "right reaction");
        near(W * L * L / 8, r.moment().max().value(), "largest moment");
        near(L / 2, r.moment().max().at(), "where");
        near(5 * W * Math.pow(L, 4) / (384 * EI), r.deflection().max().value(), "largest deflection");
        near(W * L / 2, r.shear().max().value(), "end shear");
    }

    @Test
    void simpleBeamPointLoadAnywhere() {
        // AISC Manual Table 3-23, case 8: R1 = Pb/l, M max = Pab/l under the load,
        // deflection under the load P a^2 b^2 / (3 E I l), largest deflection
        // P a b (a + 2b) sqrt(3a(a + 2b)) / (27 E I l) at x = sqrt(a(a + 2b)/3) when a > b
        double a = 4;
        double b = 2;
        Response r = caseD(text("6 m", PIN_ROLLER, "  - { case: D, type: point, P: 25 kN, at: 4 m }\n"));
        near(P * b / L, r.reactionForce()[0], "R1");
        near(P * a / L, r.reactionForce()[1], "R2");
        near(P * a * b / L, r.moment().max().value(), "M max");
        near(a, r.moment().max().at(), "at the load");
        near(P * a * a * b * b / (3 * EI * L), r.deflection().at(a), "deflection under the load");
        near(P * a * b * (a + 2 * b) * Math.sqrt(3 * a * (a + 2 * b)) / (27 * EI * L), r.deflection().max().value(), "largest deflection");
        near(Math.sqrt(a * (a + 2 * b) / 3), r.deflection().max().at(), "where");
        // shear jumps by P under the load
        near(-P, r.shear().at(a) - r.shear().leftOf(a), "shear jump");
    }

    @Test
    void simpleBeamLoadIncreasingToOneEnd() {
        // AISC Manual Table 3-23, case 2 (triangular load, total W): R1 = W/3, R2 = 2W/3,
        // M max = 2Wl/(9 sqrt 3) at x = l/sqrt 3, largest deflection 0.01304 W l^3 / EI at
        // x = l sqrt(1 - sqrt(8/15)); the exact constant is (the published 0.01304 rounds it)
        // derived by integrating the elastic curve.
        Response r = caseD(text("6 m", PIN_ROLLER, "  - { case: D, type: linear, w: [0 kN/m, 10 kN/m], from: 0 m, to: 6 m }\n"));
        double total = W * L / 2;
        near(total / 3, r.reactionForce()[0], "R1");
        near(2 * total / 3, r.reactionForce()[1], "R2");
        near(2 * total * L / (9 * Math.sqrt(3)), r.moment().max().value(), "M max");
        near(L / Math.sqrt(3), r.moment().max().at(), "where");
        double xMax = L * Math.sqrt(1 - Math.sqrt(8.0 / 15));
        near(xMax, r.deflection().max().at(), "where the deflection peaks");
        assertEquals(0.01304, r.deflection().max().value() * EI / (total * L * L * L), 5e-6, "published coefficient");
    }

    @Test
    void cantileverFixedAtLeftUniformLoad() {
        // AISC Manual Table 3-23, case 18: R = wl, M at the support = -wl^2/2, free-end deflection wl^4/(8EI)
        Response r = caseD(text("6 m", "    - { at: 0 m, type: fixed }\n", UNIFORM));
        near(W * L, r.reactionForce()[0], "reaction");
        near(W * L * L / 2, r.reactionMoment()[0], "support moment, counter-clockwise");
        near(-W * L * L / 2, r.moment().min().value(), "hogging moment at the support");
        near(W * Math.pow(L, 4) / (8 * EI), r.deflection().max().value(), "free-end deflection");
        near(L, r.deflection().max().at(), "at the free end");
    }

    @Test
    void cantileverFixedAtRightPointLoadAtFreeEnd() {
        // AISC Manual Table 3-23, case 22: M = Pl at the support, free-end deflection Pl^3/(3EI)
        Response r = caseD(text("6 m", "    - { at: 6 m, type: fixed }\n", "  - { case: D, type: point, P: 25 kN, at: 0 m }\n"));
        near(P, r.reactionForce()[0], "reaction");
        near(-P * L, r.reactionMoment()[0], "support moment (clockwise on the beam)");
        near(-P * L, r.moment().min().value(), "hogging moment at the support");
        near(P * L * L * L / (3 * EI), r.deflection().max().value(), "free-end deflection");
        near(0, r.deflection().max().at(), "at the free end");
    }

    @Test
    void cantileverLoadIncreasingToFixedEnd() {
        // AISC Manual Table 3-23, case 19 (from memory): total W, M = Wl/3 at the support, free-end deflection Wl^3/(15EI)
        Response r = caseD(text("6 m", "    - { at: 0 m, type: fixed }\n",
                "  - { case: D, type: linear, w: [10 kN/m, 0 kN/m], from: 0 m, to: 6 m }\n"));
        double total = W * L / 2;
        near(total, r.reactionForce()[0], "reaction");
        near(-total * L / 3, r.moment().min().value(), "support moment");
        near(total * L * L * L / (15 * EI), r.deflection().max().value(), "free-end deflection");
    }

    @Test
    void proppedCantileverUniformLoad() {
        // AISC Manual Table 3-23, case 12: R at the simple end 3wl/8, at the fixed end 5wl/8,
        // M fixed end -wl^2/8, largest sagging 9wl^2/128 at 3l/8 from the simple end,
        // largest deflection wl^4/(185EI) at 0.4215 l from the simple end (published, rounded)
        Response r = caseD(text("6 m", "    - { at: 0 m, type: roller }\n    - { at: 6 m, type: fixed }\n", UNIFORM));
        near(3 * W * L / 8, r.reactionForce()[0], "simple-end reaction");
        near(5 * W * L / 8, r.reactionForce()[1], "fixed-end reaction");
        near(-W * L * L / 8, r.moment().min().value(), "fixed-end moment");
        near(9 * W * L * L / 128, r.moment().max().value(), "largest sagging moment");
        near(3 * L / 8, r.moment().max().at(), "where");
        // the published 185 is rounded: the exact denominator is 184.63
        assertEquals(185, W * Math.pow(L, 4) / (EI * r.deflection().max().value()), 0.5, "published denominator");
        assertEquals(0.4215 * L, r.deflection().max().at(), 1e-4 * L, "published location");
    }

    @Test
    void fixedFixedUniformLoad() {
        // AISC Manual Table 3-23, case 15: end moments -wl^2/12, centre wl^2/24, deflection wl^4/(384EI)
        Response r = caseD(text("6 m", "    - { at: 0 m, type: fixed }\n    - { at: 6 m, type: fixed }\n", UNIFORM));
        near(W * L / 2, r.reactionForce()[0], "reaction");
        near(-W * L * L / 12, r.moment().min().value(), "end moment");
        near(W * L * L / 24, r.moment().max().value(), "centre moment");
        near(W * Math.pow(L, 4) / (384 * EI), r.deflection().max().value(), "centre deflection");
    }

    @Test
    void fixedFixedCentrePointLoad() {
        // AISC Manual Table 3-23, case 16: M = Pl/8 at the ends and the centre, deflection Pl^3/(192EI)
        Response r = caseD(text("6 m", "    - { at: 0 m, type: fixed }\n    - { at: 6 m, type: fixed }\n",
                "  - { case: D, type: point, P: 25 kN, at: 3 m }\n"));
        near(P * L / 8, r.moment().max().value(), "centre moment");
        near(-P * L / 8, r.moment().min().value(), "end moment");
        near(P * L * L * L / (192 * EI), r.deflection().max().value(), "centre deflection");
    }

    @Test
    void twoEqualSpansUniformLoad() {
        // Continuous beam, two equal spans, uniform load on both (AISC Manual Table 3-23, case 29,
        // from memory): outer reactions 3wl/8, centre 10wl/8, support moment -wl^2/8,
        // largest sagging 9wl^2/128 at 3l/8 from an outer support
        double l = 3;
        Response r = caseD(text("6 m", "    - { at: 0 m, type: pin }\n    - { at: 3 m, type: roller }\n    - { at: 6 m, type: roller }\n", UNIFORM));
        near(3 * W * l / 8, r.reactionForce()[0], "outer reaction");
        near(10 * W * l / 8, r.reactionForce()[1], "centre reaction");
        near(-W * l * l / 8, r.moment().min().value(), "support moment");
        near(9 * W * l * l / 128, r.moment().max().value(), "largest sagging moment");
    }

    @Test
    void threeEqualSpansUniformLoad() {
        // Continuous beam, three equal spans, all loaded (the usual coefficients, e.g. AISC Manual
        // Table 3-23 continuous-beam diagrams): outer reactions 0.4wl, inner 1.1wl, support
        // moments -0.1wl^2, end-span sagging 0.08wl^2, centre-span sagging 0.025wl^2
        double l = 2;
        Response r = caseD(text("6 m", "    - { at: 0 m, type: pin }\n    - { at: 2 m, type: roller }\n"
                + "    - { at: 4 m, type: roller }\n    - { at: 6 m, type: roller }\n", UNIFORM));
        near(0.4 * W * l, r.reactionForce()[0], "outer reaction");
        near(1.1 * W * l, r.reactionForce()[1], "inner reaction");
        near(-0.1 * W * l * l, r.moment().min().value(), "support moment");
        near(0.08 * W * l * l, r.moment().max().value(), "end-span sagging moment");
        near(0.025 * W * l * l, r.moment().at(3), "centre-span moment");
    }

    @Test
    void springAtCentreOfTwoSpans() {
        // Compatibility by hand (mechanics of materials): the simple span 2l deflects 5wL^4/(384EI)
        // at its centre under w and R L^3 / (48EI) under the spring force R, and the spring shortens
        // R/k, so R = (5wL^4/(384EI)) / (L^3/(48EI) + 1/k) with L = 6 m.
        double k = 5e6;
        Response r = caseD(text("6 m", "    - { at: 0 m, type: pin }\n    - { at: 3 m, type: spring, k: 5000 kN/m }\n"
                + "    - { at: 6 m, type: roller }\n", UNIFORM));
        double expected = (5 * W * Math.pow(L, 4) / (384 * EI)) / (L * L * L / (48 * EI) + 1 / k);
        near(expected, r.reactionForce()[1], "spring reaction");
        near(expected / k, r.deflection().at(3), "spring shortening equals the beam's deflection there");
    }

    @Test
    void simpleBeamCoupleAtEnd() {
        // AISC Manual Table 3-23, simple beam with a moment at one end (from memory):
        // |R| = M/l, the moment falls linearly from M to 0, largest deflection M l^2 / (9 sqrt 3 EI) at x = l (1 - 1/sqrt 3).
        // A clockwise couple at the left end pulls that end down: R1 = -M/l, R2 = +M/l (moments about the right support).
        double m = 30e3;
        Response r = caseD(text("6 m", PIN_ROLLER, "  - { case: D, type: moment, M: 30 kN*m, at: 0 m, sense: cw }\n"));
        near(m, r.moment().max().value(), "moment next to the couple (clockwise couple at the left end sags the beam)");
        near(-m / L, r.reactionForce()[0], "left reaction");
        near(m / L, r.reactionForce()[1], "right reaction");
        near(m * L * L / (9 * Math.sqrt(3) * EI), r.deflection().max().value(), "largest deflection");
        near(L * (1 - 1 / Math.sqrt(3)), r.deflection().max().at(), "where");
    }

    @Test
    void overhangWithUniformLoadEverywhere() {
        // AISC Manual Table 3-23, beam overhanging one support, uniform load (from memory):
        // span l = 4.5 m, overhang a = 1.5 m: R1 = w(l^2 - a^2)/(2l), R2 = w(l + a)^2/(2l),
        // moment over the support -wa^2/2, largest sagging w(l + a)^2 (l - a)^2 / (8 l^2)
        double l = 4.5;
        double a = 1.5;
        Response r = caseD(text("6 m", "    - { at: 0 m, type: pin }\n    - { at: 4.5 m, type: roller }\n", UNIFORM));
        near(W * (l * l - a * a) / (2 * l), r.reactionForce()[0], "R1");
        near(W * (l + a) * (l + a) / (2 * l), r.reactionForce()[1], "R2");
        near(-W * a * a / 2, r.moment().min().value(), "moment over the support");
        near(W * Math.pow(l + a, 2) * Math.pow(l - a, 2) / (8 * l * l), r.moment().max().value(), "largest sagging");
    }

    @Test
    void largestDeflectionWithinEachRegionOfABeamLoadedOnItsOverhang() {
        // AISC Manual Table 3-23, beam overhanging one support, uniform load on the overhang
        // (from memory): span l = 4.5 m, overhang a = 1.5 m; between the supports the beam
        // rises by at most w a^2 l^2 / (18 sqrt(3) E I) (= 0.03208 w a^2 l^2 / EI) at x = l / sqrt(3),
        // and the free end falls by w a^3 (4l + 3a) / (24 E I). Deflection is positive down.
        double l = 4.5;
        double a = 1.5;
        Field d = caseD(text("6 m", "    - { at: 0 m, type: pin }\n    - { at: 4.5 m, type: roller }\n",
                "  - { case: D, type: uniform, w: 10 kN/m, from: 4.5 m, to: 6 m }\n")).deflection();
        Extreme span = d.largestWithin(0, l);
        near(-W * a * a * l * l / (18 * Math.sqrt(3) * EI), span.value(), "largest (upward) deflection in the span");
        near(l / Math.sqrt(3), span.at(), "where");
        Extreme overhang = d.largestWithin(l, l + a);
        near(W * a * a * a * (4 * l + 3 * a) / (24 * EI), overhang.value(), "free-end deflection");
        near(l + a, overhang.at(), "at the free end");
    }

    @Test
    void hingeInProppedBeamIsStaticallyDeterminate() {
        // By statics (free bodies by hand): fixed at 0, hinge at 4 m, roller at 6 m, uniform w.
        // The part from the hinge to the roller is a simple span of 2 m: the hinge carries w*2/2 = 10 kN.
        // Fixed end: R = w*4 + 10 kN = 50 kN; M = -(w*4^2/2 + 10 kN * 4 m) = -120 kN*m.
        Response r = caseD(text("6 m", "    - { at: 0 m, type: fixed }\n    - { at: 6 m, type: roller }\n", UNIFORM)
                .replace("loads:", "  hinges: [ 4 m ]\nloads:"));
        near(50e3, r.reactionForce()[0], "fixed-end reaction");
        near(10e3, r.reactionForce()[1], "roller reaction");
        near(-120e3, r.moment().min().value(), "fixed-end moment");
        near(0, r.moment().at(4), "no moment at the hinge");
    }
}
