package org.beamfolio.model;

import org.beamfolio.model.Location;

/** An internal moment release at {@code at} metres. */
public record Hinge(double at, Location where) {}
