package org.beamfolio.design.steel;

/** What a value in a worked equation measures, so a report can print it in its own units; SI inside. */
public enum Kind {
    /** A pure number: a ratio, a factor, a slenderness. */
    NUMBER,
    /** m */
    LENGTH,
    /** m^2 */
    AREA,
    /** m^3: section modulus or first moment */
    MODULUS,
    /** m^4: moment of inertia, torsional constant */
    INERTIA,
    /** m^6: warping constant */
    WARPING,
    /** Pa */
    STRESS,
    /** N */
    FORCE,
    /** N*m */
    MOMENT
}
