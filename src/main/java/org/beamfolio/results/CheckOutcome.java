package org.beamfolio.results;

import java.util.List;
import java.util.Map;

/**
 * One check's outcome, in report units: demand against limit, their ratio, whether it passes,
 * the combination that governs and where (SI metres for {@code at}), and what the check is: its
 * {@code kind} (flexure, shear, bearing, deflection, stress), the standard, edition and clause
 * ({@code AISC 360-16 F2.2}, or null), the limit state that governs (or null), the unbraced
 * segment of a flexure check (SI metres, from and to; empty otherwise) and the factors it was
 * worked with ({@code Cb}; empty otherwise).
 */
public record CheckOutcome(String id, String description, double demand, double limit, double ratio, boolean pass,
                           String combination, double at, String unit, String kind, String clause, String limitState,
                           List<Double> segment, Map<String, Double> factors) {
    public CheckOutcome {
        segment = List.copyOf(segment);
        factors = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(factors));
    }

    /** A check that is not to a design standard's clause. */
    public CheckOutcome(String id, String description, double demand, double limit, double ratio, boolean pass,
                        String combination, double at, String unit) {
        this(id, description, demand, limit, ratio, pass, combination, at, unit, null, null, null, List.of(), Map.of());
    }
}
