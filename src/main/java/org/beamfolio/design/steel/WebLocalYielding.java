package org.beamfolio.design.steel;

import static org.beamfolio.catalogue.ShapeProperty.D;
import static org.beamfolio.catalogue.ShapeProperty.KDES;
import static org.beamfolio.catalogue.ShapeProperty.TW;

import java.util.List;
import java.util.Map;

/**
 * Web local yielding under a concentrated force or reaction on one flange of an I-shape or channel,
 * AISC 360 J10.2: Rn = Fy tw (5k + lb) (Eq. J10-2) when the force acts farther than d from the
 * member end, Rn = Fy tw (2.5k + lb) (Eq. J10-3) otherwise; k = kdes; phi = 1.00, Omega = 1.50.
 */
public final class WebLocalYielding {
    private WebLocalYielding() {}

    public static Clause clause(Edition edition) {
        return Clause.of(edition, "J10.2", "J10-2", "J10-3");
    }

    /**
     * @param lb bearing length (m)
     * @param fromEnd distance from the member end to the force (m)
     */
    public static Strength strength(SteelMember m, double lb, double fromEnd) {
        BearingScope.require(m, "J10.2");
        var s = m.shape();
        Work w = new Work().given("Fy", m.fy(), Kind.STRESS).given("tw", s.get(TW), Kind.LENGTH)
                .given("k", s.get(KDES), Kind.LENGTH).given("lb", lb, Kind.LENGTH);
        double rn;
        String note;
        if (fromEnd > s.get(D)) {
            rn = w.eq("J10-2", "Rn", Kind.FORCE, "{Fy} * {tw} * (5 * {k} + {lb})");
            note = "force farther than d from the member end";
        } else {
            rn = w.eq("J10-3", "Rn", Kind.FORCE, "{Fy} * {tw} * (2.5 * {k} + {lb})");
            note = "force within d of the member end";
        }
        Clause clause = clause(m.edition());
        return new Strength("web local yielding", clause, List.of(),
                List.of(LimitStateResult.governs("web local yielding", clause, rn, w, note)),
                new Resistance(1.00, 1.50, clause), Map.of("lb", lb));
    }
}
