package org.beamfolio.analysis;

/**
 * One governing stress, found once: the combination, the element (which fixes the side of a jump
 * in moment or shear at a couple or a point load), the place, the moment or shear there, and the
 * stress. The check compares {@link #stress()} with the allowable and the worked step prints the
 * same number, so the two cannot differ.
 *
 * @param element the element whose piece gives the value: at a node, the side of the jump
 * @param topFibre for a fibre stress, whether the top fibre governs (else the bottom)
 * @param side where {@code at} lies on a jump of the moment (fibre stress) or shear (shear stress)
 * @param force the bending moment (fibre stress) or shear force (shear stress) on that side, SI
 * @param lever c of the fibre (fibre stress) or Q at the governing cut (shear stress), SI
 * @param width the width at the governing cut (shear stress); NaN for a fibre stress
 * @param cutHeight the governing cut's height above the bottom (shear stress at a junction); NaN at the neutral axis
 * @param stress tension positive for a fibre stress, the magnitude for shear, SI
 * @param allowable the material's allowable for this kind of stress, NaN when not given
 */
public record StressDemand(Kind kind, CombinationResult combination, int element, double at, Side side, boolean topFibre, double force,
                           double lever, double width, double cutHeight, double stress, double allowable) {
    public enum Kind { TENSION, COMPRESSION, SHEAR }

    /** The side of a jump: LEFT is just left of {@code at}, RIGHT just right; NONE where the field is continuous. */
    public enum Side { NONE, LEFT, RIGHT }

    /** The stress as an extreme of its combination: the value the checks, the worked steps and every sheet read. */
    public Extreme extreme() {
        return new Extreme(stress, at, combination.name());
    }

    /** The magnitude compared with the allowable: the tension or compression, zero when there is none. */
    public double demand() {
        return switch (kind) {
            case TENSION -> Math.max(0, stress);
            case COMPRESSION -> Math.max(0, -stress);
            case SHEAR -> stress;
        };
    }
}
