package org.beamfolio.analysis;

/** The beam is a mechanism or numerically singular; the input must change. */
public final class UnstableBeamException extends Exception {
    private final transient Instability instability;

    public UnstableBeamException(Instability instability) {
        super(instability.message());
        this.instability = instability;
    }

    public Instability instability() {
        return instability;
    }
}
