package org.beamfolio.model;

import org.beamfolio.model.Location;

/**
 * A support at {@code at} metres from the left end; {@code where} is its place in the job file.
 * {@code bearingLength} (m), when the job gives {@code bearing:}, is the length of bearing along
 * the beam, for the bearing checks of the design standards; null otherwise.
 */
public record Support(double at, SupportKind kind, Location where, Double bearingLength) {
    public Support {
        if (bearingLength != null && !(bearingLength > 0)) {
            throw new IllegalArgumentException("a bearing length must be positive, got " + bearingLength);
        }
    }

    /** A support without a bearing length. */
    public Support(double at, SupportKind kind, Location where) {
        this(at, kind, where, null);
    }
}
