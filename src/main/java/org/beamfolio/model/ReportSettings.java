package org.beamfolio.model;

/** How the package is reported: its unit system and paper size. */
public record ReportSettings(UnitSystem units, Paper paper) {
    public enum UnitSystem { US, SI }

    public enum Paper { LETTER, A4 }
}
