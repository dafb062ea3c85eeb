package org.beamfolio.model;

/**
 * A material: elastic modulus, optional weight density for self weight, optional allowable
 * stresses, and the source the engineer gives for them. SI units inside (Pa, N/m^3). A steel may
 * name its grade (the catalogue's {@code SteelGrade} label) and give Fy and Fu explicitly; an
 * explicit value overrides the grade's.
 */
public record Material(String id, double elasticModulus, Double weightDensity,
                       Double allowableTension, Double allowableCompression, Double allowableShear,
                       String source, String grade, Double yieldStress, Double tensileStrength) {
    public Material {
        if (!(elasticModulus > 0)) {
            throw new IllegalArgumentException("material " + id + ": E must be positive, got " + elasticModulus);
        }
    }

    /** A material without grade or steel strengths. */
    public Material(String id, double elasticModulus, Double weightDensity, Double allowableTension,
                    Double allowableCompression, Double allowableShear, String source) {
        this(id, elasticModulus, weightDensity, allowableTension, allowableCompression, allowableShear, source,
                null, null, null);
    }
}
