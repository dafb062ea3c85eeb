package org.beamfolio.design.steel;

/** One flexural limit state of AISC 360 Chapter F, for major-axis bending. */
interface FlexuralLimitState {
    /** Its name as the package prints it, e.g. {@code lateral-torsional buckling}. */
    String name();

    /** The clause and equations it follows in an edition. */
    Clause clause(Edition edition);

    /** Worked with its equations, as the package prints it. */
    default LimitStateResult evaluate(SteelMember member, FlexureCase bending) {
        return evaluate(member, bending, new Work(Detail.PRINTED));
    }

    /** Worked on {@code work}, a blank sheet that keeps the equations or only the values. */
    LimitStateResult evaluate(SteelMember member, FlexureCase bending, Work work);
}
