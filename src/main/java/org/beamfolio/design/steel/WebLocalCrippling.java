package org.beamfolio.design.steel;

import static org.beamfolio.catalogue.ShapeProperty.D;
import static org.beamfolio.catalogue.ShapeProperty.TF;
import static org.beamfolio.catalogue.ShapeProperty.TW;

import java.util.List;
import java.util.Map;

/**
 * Web local crippling under a compressive concentrated force or reaction on one flange of an
 * I-shape or channel, AISC 360 J10.3: Eq. J10-4 when the force acts at least d/2 from the member
 * end, otherwise Eq. J10-5a (lb/d <= 0.2) or J10-5b (lb/d > 0.2); Qf = 1.0 for wide-flange sections
 * and channels; phi = 0.75, Omega = 2.00.
 */
public final class WebLocalCrippling {
    private WebLocalCrippling() {}

    public static Clause clause(Edition edition) {
        return Clause.of(edition, "J10.3", "J10-4", "J10-5a", "J10-5b");
    }

    /**
     * @param lb bearing length (m)
     * @param fromEnd distance from the member end to the force (m)
     */
    public static Strength strength(SteelMember m, double lb, double fromEnd) {
        BearingScope.require(m, "J10.3");
        var s = m.shape();
        Work w = new Work().given("E", m.e(), Kind.STRESS).given("Fy", m.fy(), Kind.STRESS)
                .given("tw", s.get(TW), Kind.LENGTH).given("tf", s.get(TF), Kind.LENGTH)
                .given("d", s.get(D), Kind.LENGTH).given("lb", lb, Kind.LENGTH).given("Qf", 1.0, Kind.NUMBER);
        double rn;
        String note;
        String root = " * sqrt({E} * {Fy} * {tf} / {tw}) * {Qf}";
        if (fromEnd >= s.get(D) / 2) {
            rn = w.eq("J10-4", "Rn", Kind.FORCE, "0.80 * {tw}^2 * [1 + 3 * ({lb} / {d}) * ({tw} / {tf})^1.5]" + root);
            note = "force at least d/2 from the member end";
        } else if (lb / s.get(D) <= 0.2) {
            rn = w.eq("J10-5a", "Rn", Kind.FORCE, "0.40 * {tw}^2 * [1 + 3 * ({lb} / {d}) * ({tw} / {tf})^1.5]" + root);
            note = "force within d/2 of the member end, lb/d <= 0.2";
        } else {
            rn = w.eq("J10-5b", "Rn", Kind.FORCE,
                    "0.40 * {tw}^2 * [1 + (4 * {lb} / {d} - 0.2) * ({tw} / {tf})^1.5]" + root);
            note = "force within d/2 of the member end, lb/d > 0.2";
        }
        Clause clause = clause(m.edition());
        return new Strength("web local crippling", clause, List.of(),
                List.of(LimitStateResult.governs("web local crippling", clause, rn, w, note)),
                new Resistance(0.75, 2.00, clause), Map.of("lb", lb));
    }
}
