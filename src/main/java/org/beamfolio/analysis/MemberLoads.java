package org.beamfolio.analysis;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.beamfolio.model.Job;
import org.beamfolio.model.Load;
import org.beamfolio.model.ReactionLoad;
import org.beamfolio.units.Lengths;
import org.beamfolio.units.UnitSystem;

/**
 * Brings the reactions a member carries into its loads. For every load case of the supporting
 * member, its unfactored reaction at the named support (upward on that member) acts downward on
 * this one: as a point load, or divided by the spacing as a uniform line load over the range of
 * the repeated members. Each case stays its own case, so this member's combinations factor the
 * dead, live and snow parts as they factor its own loads. Live load arrives as the supporting
 * member carried it: reduced where that member reduced its area loads, and not reduced again here.
 * Support moments are not carried (a member bearing on another is taken to transfer shear only).
 */
public final class MemberLoads {
    private MemberLoads() {}

    /** The member with its reaction loads brought in, each where it was written among the member's own loads. */
    public static Job withReactions(Job member, Map<String, AnalysisResult> solved) {
        if (member.reactionLoads().isEmpty()) {
            return member;
        }
        List<Load> own = member.loads();
        List<Load> loads = new ArrayList<>();
        int next = 0;
        for (ReactionLoad r : member.reactionLoads()) {
            while (next < r.position()) {
                loads.add(own.get(next++));
            }
            loads.addAll(loadsOf(r, solved.get(r.member()), member.report().units()));
        }
        loads.addAll(own.subList(next, own.size()));
        return member.withLoads(loads);
    }

    /** One load per case of the supporting member. */
    static List<Load> loadsOf(ReactionLoad r, AnalysisResult supporting, UnitSystem units) {
        if (supporting == null) {
            throw new IllegalStateException("member " + r.member() + " is solved before the members that carry it");
        }
        int support = r.support() - 1;
        String note = note(r, units);
        List<Load> loads = new ArrayList<>();
        for (Map.Entry<String, Response> c : supporting.cases().entrySet()) {
            double reaction = c.getValue().reactionForce()[support];
            loads.add(r.smeared()
                    ? new Load.Distributed(c.getKey(), reaction / r.spacing(), reaction / r.spacing(), r.from(), r.to(), true, note,
                            r.where())
                    : new Load.Point(c.getKey(), reaction, r.at(), note, r.where()));
        }
        return loads;
    }

    private static String note(ReactionLoad r, UnitSystem units) {
        String from = "reaction of " + r.member() + " at its support " + r.support();
        String spacing = r.smeared() ? ", members at " + Lengths.describe(r.spacing(),
                units == UnitSystem.SI ? Lengths.Style.METRES : Lengths.Style.FEET_AND_INCHES) + " (w = R / spacing)" : "";
        return from + spacing + (r.note().isBlank() ? "" : "; " + r.note());
    }
}
