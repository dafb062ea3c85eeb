package org.beamfolio.units;

/** The physical dimensions a job-file quantity may have; each has one internal SI unit. */
public enum Dimension {
    LENGTH("length", "m"),
    FORCE("force", "N"),
    FORCE_PER_LENGTH("force per length", "N/m"),
    MOMENT("moment", "N*m"),
    STRESS("stress", "Pa"),
    AREA("area", "m^2"),
    SECOND_MOMENT("second moment of area", "m^4"),
    FIRST_MOMENT("section modulus or first moment", "m^3"),
    WEIGHT_DENSITY("density", "N/m^3"),
    ROTATIONAL_STIFFNESS("rotational stiffness", "N*m/rad");

    private final String description;
    private final String siUnit;

    Dimension(String description, String siUnit) {
        this.description = description;
        this.siUnit = siUnit;
    }

    public String description() {
        return description;
    }

    public String siUnit() {
        return siUnit;
    }
}
