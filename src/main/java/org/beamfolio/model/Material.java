package org.beamfolio.model;

import org.beamfolio.model.timber.TimberValues;

/**
 * A material: elastic modulus, optional weight density for self weight, optional allowable
 * stresses, and the source the engineer gives for them. SI units inside (Pa, N/m^3). A steel may
 * name its grade (the catalogue's {@code SteelGrade} label) and give Fy and Fu explicitly; an
 * explicit value overrides the grade's. A timber material carries its NDS reference design
 * values ({@code timber}, else null); its {@code elasticModulus} is then the adjusted E' the
 * analysis uses.
 */
public record Material(String id, double elasticModulus, Double weightDensity,
                       Double allowableTension, Double allowableCompression, Double allowableShear,
                       String source, String grade, Double yieldStress, Double tensileStrength, TimberValues timber) {
    public Material {
        if (!(elasticModulus > 0)) {
            throw new IllegalArgumentException("material " + id + ": E must be positive, got " + elasticModulus);
        }
    }

    /** A material without grade, steel strengths or timber values. */
    public Material(String id, double elasticModulus, Double weightDensity, Double allowableTension,
                    Double allowableCompression, Double allowableShear, String source) {
        this(id, elasticModulus, weightDensity, allowableTension, allowableCompression, allowableShear, source,
                null, null, null, null);
    }

    /** A steel (or other) material with grade and strengths, without timber values. */
    public Material(String id, double elasticModulus, Double weightDensity, Double allowableTension,
                    Double allowableCompression, Double allowableShear, String source, String grade,
                    Double yieldStress, Double tensileStrength) {
        this(id, elasticModulus, weightDensity, allowableTension, allowableCompression, allowableShear, source,
                grade, yieldStress, tensileStrength, null);
    }

    /** A timber material: its reference values, E taken from them. */
    public static Material timber(String id, Double weightDensity, TimberValues values) {
        return new Material(id, values.e(), weightDensity, null, null, null, values.source(), null, null, null, values);
    }

    /** The same material analysed with another modulus (E' of a timber member in its service conditions). */
    public Material withModulus(double e) {
        return new Material(id, e, weightDensity, allowableTension, allowableCompression, allowableShear, source,
                grade, yieldStress, tensileStrength, timber);
    }
}
