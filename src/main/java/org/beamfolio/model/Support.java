package org.beamfolio.model;

import org.beamfolio.job.Location;

/**
 * A support at {@code at} metres from the left end; {@code where} is its place in the job file;
 * {@code bearing} the bearing length along the beam for a bearing check (m), or null.
 */
public record Support(double at, SupportKind kind, Location where, Double bearing) {
    public Support(double at, SupportKind kind, Location where) {
        this(at, kind, where, null);
    }
}
