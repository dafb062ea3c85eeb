package org.beamfolio.design.timber;

import org.beamfolio.model.timber.TimberKind;
import org.beamfolio.model.timber.SizeClass;
import org.beamfolio.model.timber.Temperature;
import org.beamfolio.model.timber.TimberService;
import org.beamfolio.model.timber.TimberValues;
import org.beamfolio.model.timber.LoadDuration;
import org.beamfolio.model.timber.ServiceFactors;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Timber adjustment factors against published worked values. Each test names its source; values
 * recalled rather than read are marked "from memory".
 */
class TimberDesignTest {
    static final double PSI = ServiceFactors.PSI;
    static final double INCH = 0.0254;
    static final double FOOT = 0.3048;

    static TimberValues sawn(double fbPsi, double eMinPsi, SizeClass size) {
        return new TimberValues(TimberKind.SAWN, fbPsi * PSI, null, 170 * PSI, 625 * PSI,
                1_900_000 * PSI, eMinPsi * PSI, size, 10, "test");
    }

    /**
     * AWC beam design example (from memory of the AWC's published NDS beam example): 4x16 Douglas
     * Fir-Larch Select Structural (Fb = 1,500 psi, Emin = 690,000 psi), 20 ft span braced at the
     * ends only, concentrated load at midspan, CD = 1.0: le = 375 in, RB = 21.6, FbE = 1,776 psi,
     * CL = 0.876, Fb' = 1,313 psi.
     */
    @Test
    void sawnBeamStabilityMatchesTheAwcExample() {
        double b = 3.5 * INCH;
        double d = 15.25 * INCH;
        EffectiveLength.Worked le = EffectiveLength.CENTRE_LOAD.of(20 * FOOT, d);
        assertEquals(375, le.le() / INCH, 0.5);
        AdjustedValues adjusted = new AdjustedValues(sawn(1500, 690_000, SizeClass.DIMENSION),
                TimberService.DEFAULT, b, d);
        AdjustedValues.Bending fb = adjusted.bending(LoadDuration.TEN_YEARS, false, b, le.le(), 20 * FOOT);
        assertEquals(21.6, fb.stability().rb(), 0.05);
        assertEquals(1776, fb.stability().fbe() / PSI, 1.0);
        assertEquals(1.0, fb.factor("CF"), 0.0, "4x16: 14 in and wider, 4 in thick (NDS Supplement Table 4A)");
        assertEquals(0.876, fb.factor("CL"), 0.0005);
        assertEquals(1313, fb.value() / PSI, 1.0);
    }

    /**
     * AWC Technical Report 10 (from memory of its glulam beam example): 6-3/4 x 13-1/2 glulam,
     * 24F-V4 (Fbx+ = 2,400 psi), 18 ft simple span, x = 10: CV = 0.98, Fb' = 2,343 psi with CD = 1.0
     * and the compression edge braced.
     */
    @Test
    void glulamVolumeFactorMatchesTechnicalReport10() {
        TimberValues v = new TimberValues(TimberKind.GLULAM, 2400 * PSI, 1450 * PSI, 265 * PSI, 650 * PSI,
                1_800_000 * PSI, 950_000 * PSI, SizeClass.NONE, 10, "24F-V4");
        double b = 6.75 * INCH;
        double d = 13.5 * INCH;
        AdjustedValues.Bending fb = new AdjustedValues(v, TimberService.DEFAULT, b, d)
                .bending(LoadDuration.TEN_YEARS, false, b, null, 18 * FOOT);
        assertEquals(0.98, fb.factor("CV"), 0.005);
        assertEquals(2343, fb.value() / PSI, 1.0);
        AdjustedValues.Bending negative = new AdjustedValues(v, TimberService.DEFAULT, b, d)
                .bending(LoadDuration.TEN_YEARS, true, b, null, 18 * FOOT);
        assertEquals(1450 * fb.factor("CV"), negative.value() / PSI, 1e-9, "Fb- where the top face is in tension");
    }

    /** NDS 2018 Table 2.3.2 (from memory): 0.9, 1.0, 1.15, 1.25, 1.6, 2.0. */
    @Test
    void loadDurationFactorsFollowTable232() {
        assertEquals(0.9, LoadDuration.PERMANENT.factor());
        assertEquals(1.0, LoadDuration.TEN_YEARS.factor());
        assertEquals(1.15, LoadDuration.TWO_MONTHS.factor());
        assertEquals(1.25, LoadDuration.SEVEN_DAYS.factor());
        assertEquals(1.6, LoadDuration.TEN_MINUTES.factor());
        assertEquals(2.0, LoadDuration.IMPACT.factor());
        assertEquals(LoadDuration.TWO_MONTHS, LoadDuration.PERMANENT.shorter(LoadDuration.TWO_MONTHS));
    }

    /** NDS Supplement Table 4A size factors for Fb (from memory), and NDS 4.3.6.2 for timbers. */
    @Test
    void sizeFactorsFollowTable4AAndEquation431() {
        TimberValues dim = sawn(900, 580_000, SizeClass.DIMENSION);
        assertEquals(1.5, SizeFactor.of(dim, 1.5 * INCH, 3.5 * INCH).value(), 0.0, "2x4");
        assertEquals(1.3, SizeFactor.of(dim, 1.5 * INCH, 5.5 * INCH).value(), 0.0, "2x6");
        assertEquals(1.2, SizeFactor.of(dim, 1.5 * INCH, 7.25 * INCH).value(), 0.0, "2x8");
        assertEquals(1.1, SizeFactor.of(dim, 1.5 * INCH, 9.25 * INCH).value(), 0.0, "2x10");
        assertEquals(1.0, SizeFactor.of(dim, 1.5 * INCH, 11.25 * INCH).value(), 0.0, "2x12");
        assertEquals(0.9, SizeFactor.of(dim, 1.5 * INCH, 13.25 * INCH).value(), 0.0, "2x14");
        assertEquals(1.3, SizeFactor.of(dim, 3.5 * INCH, 7.25 * INCH).value(), 0.0, "4x8");
        assertEquals(1.1, SizeFactor.of(dim, 3.5 * INCH, 11.25 * INCH).value(), 0.0, "4x12");
        TimberValues timber = sawn(1350, 580_000, SizeClass.TIMBER);
        assertEquals(1.0, SizeFactor.of(timber, 5.5 * INCH, 11.5 * INCH).value(), 0.0, "6x12");
        assertEquals(Math.pow(12 / 15.5, 1.0 / 9), SizeFactor.of(timber, 5.5 * INCH, 15.5 * INCH).value(), 1e-15, "6x16");
        assertEquals(0.972, SizeFactor.of(timber, 5.5 * INCH, 15.5 * INCH).value(), 0.0005, "6x16 by hand");
    }

    /** NDS 2018 Table 3.3.3: the rows used, by hand. */
    @Test
    void effectiveLengthsFollowTable333() {
        double d = 10 * INCH;
        assertEquals(2.06 * 50 * INCH, EffectiveLength.UNIFORM.of(50 * INCH, d).le(), 1e-12);
        assertEquals(1.63 * 100 * INCH + 3 * d, EffectiveLength.UNIFORM.of(100 * INCH, d).le(), 1e-12);
        assertEquals(1.33 * 100 * INCH, EffectiveLength.CANTILEVER_UNIFORM.of(100 * INCH, d).le(), 1e-12);
        assertEquals(1.87 * 100 * INCH, EffectiveLength.CANTILEVER_END_LOAD.of(100 * INCH, d).le(), 1e-12);
        assertEquals(1.84 * 150 * INCH, EffectiveLength.ANY.of(150 * INCH, d).le(), 1e-12);
        assertEquals(1.63 * 140 * INCH + 3 * d, EffectiveLength.ANY.of(140 * INCH, d).le(), 1e-12);
    }

    /** NDS 3.3.3.7: RB may not exceed 50. */
    @Test
    void slenderBeamIsRefused() {
        assertThrows(BeamStability.SlendernessException.class,
                () -> BeamStability.of(600 * INCH, 1.5 * INCH, 11.25 * INCH, 1000 * PSI, 580_000 * PSI));
    }

    /** CL never exceeds 1.0 and falls as the beam gets more slender (a property of Eq. 3.3-6). */
    @Test
    void stabilityFactorFallsWithSlenderness() {
        double previous = 1.0;
        for (double le = 10; le <= 400; le += 10) {
            double cl = BeamStability.of(le * INCH, 3.5 * INCH, 11.25 * INCH, 1500 * PSI, 580_000 * PSI).cl();
            assertTrue(cl <= previous + 1e-15 && cl > 0, "CL at le = " + le + " in");
            previous = cl;
        }
    }

    /** Repetitive member and wet service for dimension lumber: NDS 4.3.9 and Table 4A (from memory). */
    @Test
    void repetitiveAndWetServiceFactors() {
        TimberValues dim = sawn(900, 580_000, SizeClass.DIMENSION);
        TimberService wetRepetitive = new TimberService(true, Temperature.NORMAL, true, false);
        AdjustedValues.Bending fb = new AdjustedValues(dim, wetRepetitive, 1.5 * INCH, 9.25 * INCH)
                .bending(LoadDuration.TEN_YEARS, false, 1.5 * INCH, null, 12 * FOOT);
        assertEquals(1.15, fb.factor("Cr"), 0.0);
        assertEquals(1.0, fb.factor("CM"), 0.0, "Fb CF = 990 psi <= 1,150 psi");
        assertEquals(900 * 1.1 * 1.15, fb.value() / PSI, 1e-9);
        AdjustedValues.Adjusted fv = new AdjustedValues(dim, wetRepetitive, 1.5 * INCH, 9.25 * INCH)
                .shear(LoadDuration.TWO_MONTHS);
        assertEquals(170 * 1.15 * 0.97, fv.value() / PSI, 1e-9);
    }

    /** NDS 3.10.4: Cb = (lb + 0.375)/lb for a 3 in interior bearing = 1.125. */
    @Test
    void bearingAreaFactor() {
        assertEquals(1.125, BearingAreaFactor.of(3 * INCH, false).value(), 1e-12);
        assertEquals(1.0, BearingAreaFactor.of(3 * INCH, true).value(), 0.0);
        assertEquals(1.0, BearingAreaFactor.of(6 * INCH, false).value(), 0.0);
    }
}
