package org.beamfolio.model;

/**
 * A load brought from another member of the job: that member's reaction at one of its supports,
 * for every load case it has, unfactored and reversed to act downward on this member, so this
 * member combines it with its own loads case by case. Either a point load ({@code at}) or, for
 * members repeated at {@code spacing} (joists on a beam), a uniform line load of reaction /
 * spacing from {@code from} to {@code to}. SI units: m.
 *
 * @param member the supporting member's id
 * @param support the supporting member's support, counted from 1 in its supports list
 * @param position how many of this member's own loads are written before it, so the loads it
 *        becomes stand where it was written
 */
public record ReactionLoad(String member, int support, Double at, Double spacing, Double from, Double to, String note,
                           Location where, int position) {
    public ReactionLoad {
        if (support < 1) {
            throw new IllegalArgumentException("support is counted from 1, got " + support);
        }
        if ((at == null) == (spacing == null)) {
            throw new IllegalArgumentException("a reaction load is either at a point or smeared at a spacing");
        }
        if (spacing != null && (from == null || to == null || !(to > from) || !(spacing > 0))) {
            throw new IllegalArgumentException("a smeared reaction needs a positive spacing and a range from < to");
        }
    }

    /** Whether the reaction is smeared over a range as a line load. */
    public boolean smeared() {
        return spacing != null;
    }
}
