package org.beamfolio.design.steel;

/**
 * The shear strength of a catalogue shape along its major axis (web or webs), AISC 360 Chapter G,
 * unstiffened webs without tension field action: {@link G2Shear} for I-shapes and channels,
 * {@link G3Shear} for tees, {@link G4Shear} for rectangular HSS, {@link G5Shear} for round HSS and pipe.
 */
public final class Shear {
    private Shear() {}

    /**
     * @param lv for round HSS, the distance from the largest shear to zero shear (m), or null to use
     *           Eq. G5-2b alone (conservative); ignored for other shapes
     */
    public static Strength strength(SteelMember m, Double lv) {
        return switch (m.shape().family().kind()) {
            case I_SHAPE, CHANNEL -> G2Shear.strength(m);
            case TEE -> G3Shear.strength(m);
            case RECTANGULAR_HSS -> G4Shear.strength(m);
            case ROUND_HSS -> G5Shear.strength(m, lv);
        };
    }
}
