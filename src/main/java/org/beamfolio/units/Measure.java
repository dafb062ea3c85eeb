package org.beamfolio.units;

/**
 * What a checked quantity measures, which decides the unit it is reported in ({@link
 * ReportUnits#unitOf(Measure)}): a check keeps its demand and limit in SI and says which of these
 * they are, and the report and the results file convert them at the edge.
 */
public enum Measure {
    /** A stress: psi or MPa. */
    STRESS,
    /** A deflection: in or mm. */
    DEFLECTION,
    /** A force in a design to a specification: kip or kN, the specification's own units. */
    DESIGN_FORCE,
    /** A moment in a design to a specification: kip*ft or kN*m, the specification's own units. */
    DESIGN_MOMENT
}
