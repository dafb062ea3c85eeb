package org.beamfolio.model;

import org.beamfolio.units.UnitSystem;

/**
 * How the package is reported: its unit system, paper size, and how positions along the beam
 * print (decimal in the report's length unit, or, for US units, feet and inches: 9'-6").
 */
public record ReportSettings(UnitSystem units, Paper paper, Positions positions) {
    public enum Paper { LETTER, A4 }

    public enum Positions { DECIMAL, FEET_INCHES }

    public ReportSettings(UnitSystem units, Paper paper) {
        this(units, paper, Positions.DECIMAL);
    }
}
