package org.beamfolio.checks;

import java.util.List;

/**
 * Whether a package's checks meet their limits, as the short text the PDF's document information
 * carries under {@link #INFO_KEY} so that {@code seal}, {@code verify} or any other program can
 * read it without reading the pages: {@code pass}, {@code fail: D1, S2} (the ids of the checks
 * that do not meet their limits) or {@code none} (no checks were requested).
 */
public final class ChecksVerdict {
    /** The name of the document information entry (without the PDF name's slash). */
    public static final String INFO_KEY = "BeamfolioChecks";

    private ChecksVerdict() {}

    /** The verdict of a package's outcomes. */
    public static String of(List<CheckOutcome> outcomes) {
        List<String> failing = outcomes.stream().filter(c -> !c.pass()).map(CheckOutcome::id).toList();
        if (!failing.isEmpty()) {
            return "fail: " + String.join(", ", failing);
        }
        return outcomes.isEmpty() ? "none" : "pass";
    }

    /**
     * The verdict of a package of several members: each failing check named under its member,
     * {@code fail: G-1/deflection-L-max}.
     */
    public static String ofMembers(List<CheckedMember> members) {
        List<String> failing = members.stream().flatMap(m -> m.checks().stream().filter(c -> !c.pass())
                .map(c -> m.id() + "/" + c.id())).toList();
        if (!failing.isEmpty()) {
            return "fail: " + String.join(", ", failing);
        }
        return members.stream().allMatch(m -> m.checks().isEmpty()) ? "none" : "pass";
    }

    /** True when the verdict says some check does not meet its limit. */
    public static boolean failing(String verdict) {
        return verdict != null && verdict.startsWith("fail");
    }
}
