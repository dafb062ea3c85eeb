package org.beamfolio.design.steel;

/** What the tee classes say about the editions, printed with each F9 result. */
final class TeeNote {
    private TeeNote() {}

    /**
     * F9 was reworked between 360-10, 360-16 and 360-22. These classes follow 360-16 (from memory);
     * to the best of our recollection 360-22 revised the tee-stem provisions, so a 360-22 check of a
     * tee says it applies the 360-16 equations.
     */
    static String of(Edition edition) {
        return edition == Edition.AISC_360_16 ? ""
                : "; 360-16 equations applied (360-22 revisions to F9 not implemented)";
    }
}
