package org.beamfolio.loads;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Live load reduction against hand values worked from ASCE/SEI 7-22 4.7.2 and 4.8.2. */
class LiveLoadReductionTest {
    static final double SQ_FT = 0.3048 * 0.3048;
    static final double PSF = LiveLoadReduction.PSF;

    /** ASCE 7-22 Eq. 4.7-1 by hand: AT = 300 ft^2, KLL = 2: 0.25 + 15 / sqrt(600) = 0.8624. */
    @Test
    void reductionFactorByHand() {
        LiveLoadReduction.Reduction r = LiveLoadReduction.of(2, 300 * SQ_FT, 50 * PSF, 1, false);
        assertTrue(r.applied());
        assertEquals(0.25 + 15 / Math.sqrt(600), r.factor(), 1e-12);
        assertEquals(0.8624, r.factor(), 5e-5);
    }

    /** ASCE 7-22 4.7.2: no reduction when KLL AT < 400 ft^2. */
    @Test
    void belowFourHundredSquareFeetNoReduction() {
        LiveLoadReduction.Reduction r = LiveLoadReduction.of(2, 199 * SQ_FT, 50 * PSF, 1, false);
        assertFalse(r.applied());
        assertEquals(1.0, r.factor(), 0.0);
        assertTrue(r.basis().contains("less than 400"));
    }

    /** ASCE 7-22 4.7.2: not below 0.50 Lo (one floor) or 0.40 Lo (two or more). */
    @Test
    void lowerBoundsForOneAndTwoFloors() {
        // KLL AT = 4 x 10,000: 0.25 + 15/200 = 0.325, below both limits
        assertEquals(0.50, LiveLoadReduction.of(4, 10_000 * SQ_FT, 50 * PSF, 1, false).factor(), 0.0);
        assertEquals(0.40, LiveLoadReduction.of(4, 10_000 * SQ_FT, 50 * PSF, 2, false).factor(), 0.0);
    }

    /** ASCE 7-22 4.7.3 and 4.7.6: heavy live loads and assembly occupancies are not reduced. */
    @Test
    void heavyAndAssemblyLoadsAreNotReduced() {
        assertFalse(LiveLoadReduction.of(2, 1000 * SQ_FT, 125 * PSF, 1, false).applied());
        assertFalse(LiveLoadReduction.of(2, 1000 * SQ_FT, 100 * PSF, 1, true).applied());
        assertTrue(LiveLoadReduction.of(2, 1000 * SQ_FT, 100 * PSF, 1, false).applied());
        assertThrows(IllegalArgumentException.class, () -> LiveLoadReduction.of(5, 1000 * SQ_FT, 50 * PSF, 1, false));
    }

    /** ASCE 7-22 Eq. 4.8-1 to 4.8-3 by hand: AT = 400 ft^2 (R1 = 0.8), flat (R2 = 1): 20 x 0.8 = 16 psf. */
    @Test
    void roofLiveLoadByHand() {
        LiveLoadReduction.Reduction r = RoofLiveLoadReduction.of(400 * SQ_FT, 20 * PSF, 0.25);
        assertEquals(0.8, r.factor(), 1e-12);
        // AT = 1,000 ft^2 (R1 = 0.6), F = 12 (R2 = 0.6): 20 x 0.36 = 7.2 psf, raised to 12 psf
        assertEquals(0.6, RoofLiveLoadReduction.of(1000 * SQ_FT, 20 * PSF, 12).factor(), 1e-12);
        assertFalse(RoofLiveLoadReduction.of(150 * SQ_FT, 20 * PSF, 0).applied());
    }
}
