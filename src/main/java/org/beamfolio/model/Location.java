package org.beamfolio.model;

/** A place in a job file: 1-based line and column. */
public record Location(int line, int column) {
    public static final Location START = new Location(1, 1);
}
