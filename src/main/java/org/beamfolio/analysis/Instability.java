package org.beamfolio.analysis;

import org.beamfolio.model.Location;

/** Why a beam cannot carry load: a mechanism, with the place in the job file to point at. */
public record Instability(String keyPath, Location where, String message) {}
