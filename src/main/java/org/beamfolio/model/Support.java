package org.beamfolio.model;

import org.beamfolio.model.Location;

/** A support at {@code at} metres from the left end; {@code where} is its place in the job file. */
public record Support(double at, SupportKind kind, Location where) {}
