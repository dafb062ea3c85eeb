package org.beamfolio.model;

/**
 * Steel design to a governing specification, as the job asks for it ({@code design.steel},
 * {@code design.method}).
 *
 * @param specification as the job file writes it, e.g. {@code AISC360-16}
 * @param lrfd load and resistance factor design (true) or allowable strength design (false)
 */
public record SteelDesign(String specification, boolean lrfd) {}
