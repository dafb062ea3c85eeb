package org.beamfolio.loads;

/**
 * The live load reductions a job asks for ({@code design.live_load_reduction} and
 * {@code design.roof_live_load_reduction}).
 *
 * @param kll KLL of ASCE/SEI 7-22 Table 4.7-1, or null for no floor live load reduction
 * @param floors floors the member supports (sets the 0.50 or 0.40 limit)
 * @param roofRise F of ASCE/SEI 7-22 4.8.2 (inches of rise per foot), or null for no roof live load reduction
 * @param liveStated whether the job says anything about floor live load reduction (for the reason printed)
 * @param roofStated the same for roof live load reduction
 */
public record ReductionSettings(Double kll, int floors, Double roofRise, boolean liveStated, boolean roofStated) {
    /** The job asks for no reduction at all. */
    public static final ReductionSettings NONE = new ReductionSettings(null, 1, null, false, false);

    public ReductionSettings {
        if (kll != null && !LiveLoadReduction.validKll(kll)) {
            throw new IllegalArgumentException("KLL must be one of Table 4.7-1's values, got " + kll);
        }
        if (floors < 1) {
            throw new IllegalArgumentException("a member supports at least one floor");
        }
    }
}
