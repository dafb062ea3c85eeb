package org.beamfolio.checks;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import org.beamfolio.units.Measure;

/**
 * One check's outcome: demand against limit in SI units, what they measure (which decides the
 * unit the report and the results file give them, {@link org.beamfolio.units.ReportUnits#unitOf}), their ratio,
 * whether it passes, the combination that governs and where (SI metres for {@code at}), and the
 * authority behind it as data.
 *
 * @param kind what sort of check it is
 * @param clause the standard, edition and clause the limit comes from, e.g. "AISC 360-16 F2.2"
 * @param limitState the limit state that governs, or null where the check has only one
 * @param segment the unbraced segment a flexure check covers (SI metres), or null
 * @param factors the factors the limit depends on by symbol (Cb; CD, CL, CF ...), empty when none
 */
public record CheckOutcome(String id, String description, double demand, double limit, double ratio, boolean pass,
                           String combination, double at, Measure measure, CheckKind kind, String clause, String limitState,
                           Segment segment, Map<String, Double> factors) {
    public CheckOutcome {
        if (clause == null || clause.isBlank()) {
            throw new IllegalArgumentException("check " + id + " must cite the clause it applies");
        }
        factors = Collections.unmodifiableMap(new LinkedHashMap<>(factors));
    }

    /** An outcome with a single limit state, no segment and no factors. */
    public CheckOutcome(String id, String description, double demand, double limit, double ratio, boolean pass,
                        String combination, double at, Measure measure, CheckKind kind, String clause) {
        this(id, description, demand, limit, ratio, pass, combination, at, measure, kind, clause, null, null, Map.of());
    }

    /** A stretch of the beam, SI metres. */
    public record Segment(double from, double to) {}
}
