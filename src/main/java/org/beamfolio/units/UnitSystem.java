package org.beamfolio.units;

/** The unit system a package reports in: US customary or SI. */
public enum UnitSystem { US, SI }
