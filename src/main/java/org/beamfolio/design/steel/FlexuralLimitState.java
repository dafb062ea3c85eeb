package org.beamfolio.design.steel;

/** One flexural limit state of AISC 360 Chapter F, for major-axis bending. */
interface FlexuralLimitState {
    /** Its name as the package prints it, e.g. {@code lateral-torsional buckling}. */
    String name();

    /** The clause and equations it follows in an edition. */
    Clause clause(Edition edition);

    LimitStateResult evaluate(SteelMember member, FlexureCase bending);
}
