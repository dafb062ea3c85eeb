package org.beamfolio.units;


/**
 * The units a package reports in: US reports ft, lb, lb*ft, lb/ft, psi and in (deflection, and
 * in, in^2, in^3, in^4 for sections); SI reports m, kN, kN*m, kN/m, MPa and mm (mm for sections).
 */
public record ReportUnits(Unit length, Unit force, Unit moment, Unit distributed, Unit stress, Unit deflection,
                          Unit sectionLength, Unit area, Unit firstMoment, Unit secondMoment, Unit rotationalStiffness,
                          Unit stiffness, UnitSystem system) {
    public static ReportUnits of(UnitSystem system) {
        return system == UnitSystem.SI
                ? new ReportUnits(Units.of("m"), Units.of("kN"), Units.of("kN*m"), Units.of("kN/m"), Units.of("MPa"),
                        Units.of("mm"), Units.of("mm"), Units.of("mm^2"), Units.of("mm^3"), Units.of("mm^4"),
                        Units.of("kN*m/rad"), Units.of("kN/mm"), UnitSystem.SI)
                : new ReportUnits(Units.of("ft"), Units.of("lb"), Units.of("lb*ft"), Units.of("lb/ft"), Units.of("psi"),
                        Units.of("in"), Units.of("in"), Units.of("in^2"), Units.of("in^3"), Units.of("in^4"),
                        Units.of("kip*ft/rad"), Units.of("kip/in"), UnitSystem.US);
    }

    /**
     * The unit a checked quantity is reported in. Designs to a specification state forces and
     * moments in kip and kip*ft (US) or kN and kN*m (SI), the units of the specification's worked
     * examples, not the lb of the report's diagrams.
     */
    public Unit unitOf(Measure measure) {
        return switch (measure) {
            case STRESS -> stress;
            case DEFLECTION -> deflection;
            case DESIGN_FORCE -> Units.of(us() ? "kip" : "kN");
            case DESIGN_MOMENT -> Units.of(us() ? "kip*ft" : "kN*m");
        };
    }

    /** A checked value, SI inside, in the unit the report gives it ({@link #unitOf(Measure)}). */
    public double inReportUnit(double si, Measure measure) {
        return unitOf(measure).fromSi(si);
    }

    public boolean us() {
        return system == UnitSystem.US;
    }
}
