package org.beamfolio.model;

/**
 * What a load combination is for: strength design (LRFD, EN 1990 (6.10)), allowable stress
 * design (ASD), or serviceability (EN 1990 characteristic). Combinations the engineer lists in
 * the job are taken as allowable-stress combinations: the loads as they act, compared with
 * allowables and limits.
 */
public enum Purpose {
    STRENGTH, ALLOWABLE_STRESS, SERVICE;

    /** Whether stresses under this combination are compared with allowable stresses and design values. */
    public boolean comparedWithAllowables() {
        return this != STRENGTH;
    }
}
