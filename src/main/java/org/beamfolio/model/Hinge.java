package org.beamfolio.model;

import org.beamfolio.job.Location;

/** An internal moment release at {@code at} metres. */
public record Hinge(double at, Location where) {}
