package org.beamfolio.model.timber;

/**
 * Reference design values given by the engineer, SI (Pa), with their source as the engineer
 * states it. The tool ships the factor rules, not a table of species and grades.
 *
 * @param fbNegative glulam only: Fb with the compression zone stressed in tension (Fbx-), or null
 * @param volumeExponent glulam only: x of NDS Eq. 5.3-1, 20 for Southern Pine, 10 otherwise
 */
public record TimberValues(TimberKind kind, double fb, Double fbNegative, double fv, double fcPerp,
                           double e, double eMin, SizeClass sizeClass, double volumeExponent,
                           String source) {
    public TimberValues {
        for (double v : new double[] {fb, fv, fcPerp, e, eMin}) {
            if (!(v > 0)) {
                throw new IllegalArgumentException("timber reference values must be positive, got " + v);
            }
        }
        if (fbNegative != null && kind != TimberKind.GLULAM) {
            throw new IllegalArgumentException("Fb_neg applies to glulam only");
        }
    }

    /** Fb for the face in tension: Fb+ (bottom, sagging) or, for glulam, Fb- when given. */
    public double fbFor(boolean topInTension) {
        return topInTension && fbNegative != null ? fbNegative : fb;
    }
}
