package org.beamfolio.model;

import org.beamfolio.design.timber.TimberValues;

/**
 * A material: elastic modulus, optional weight density for self weight, optional allowable
 * stresses, and the source the engineer gives for them. SI units inside (Pa, N/m^3). A timber
 * material also carries its NDS reference design values ({@code timber}, else null); its
 * {@code elasticModulus} is then the adjusted E' the analysis uses.
 */
public record Material(String id, double elasticModulus, Double weightDensity,
                       Double allowableTension, Double allowableCompression, Double allowableShear,
                       String source, TimberValues timber) {
    public Material {
        if (!(elasticModulus > 0)) {
            throw new IllegalArgumentException("material " + id + ": E must be positive, got " + elasticModulus);
        }
    }

    public Material(String id, double elasticModulus, Double weightDensity, Double allowableTension,
                    Double allowableCompression, Double allowableShear, String source) {
        this(id, elasticModulus, weightDensity, allowableTension, allowableCompression, allowableShear, source, null);
    }

    /** The same material analysed with another modulus (E' of a timber member in its service conditions). */
    public Material withModulus(double e) {
        return new Material(id, e, weightDensity, allowableTension, allowableCompression, allowableShear, source, timber);
    }
}
