package org.beamfolio.seal;

/** Sealing or verifying cannot go on, for a reason the user can act on (exit status 2). */
public final class SealException extends Exception {
    public SealException(String message) {
        super(message);
    }

    public SealException(String message, Throwable cause) {
        super(message, cause);
    }
}
