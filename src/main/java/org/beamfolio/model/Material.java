package org.beamfolio.model;

/**
 * A material: elastic modulus, optional weight density for self weight, optional allowable
 * stresses, and the source the engineer gives for them. SI units inside (Pa, N/m^3).
 */
public record Material(String id, double elasticModulus, Double weightDensity,
                       Double allowableTension, Double allowableCompression, Double allowableShear,
                       String source) {
    public Material {
        if (!(elasticModulus > 0)) {
            throw new IllegalArgumentException("material " + id + ": E must be positive, got " + elasticModulus);
        }
    }
}
