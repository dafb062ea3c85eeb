package org.beamfolio.checks;

/**
 * One check's outcome, in report units: demand against limit, their ratio, whether it passes,
 * the combination that governs and where (SI metres for {@code at}).
 */
public record CheckOutcome(String id, String description, double demand, double limit, double ratio, boolean pass,
                           String combination, double at, String unit) {}
