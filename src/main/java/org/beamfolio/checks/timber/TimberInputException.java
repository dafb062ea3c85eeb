package org.beamfolio.checks.timber;

import org.beamfolio.model.Location;

/**
 * A job that the NDS does not allow and that shows only once the beam is solved (a slenderness
 * ratio RB above 50): bad input, reported at its place in the job file.
 */
public final class TimberInputException extends RuntimeException {
    private static final long serialVersionUID = 1L;
    private final transient Location where;
    private final String keyPath;

    public TimberInputException(Location where, String keyPath, String message) {
        super(message);
        this.where = where;
        this.keyPath = keyPath;
    }

    public Location where() {
        return where;
    }

    public String keyPath() {
        return keyPath;
    }
}
