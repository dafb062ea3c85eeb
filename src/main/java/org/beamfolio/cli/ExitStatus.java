package org.beamfolio.cli;

/** The status of a run over many jobs: an internal failure outranks bad input, which outranks success. */
final class ExitStatus {
    private boolean badInput;
    private boolean internalFailure;

    void add(int status) {
        badInput |= status == Main.BAD_INPUT;
        internalFailure |= status == Main.INTERNAL_FAILURE;
    }

    int get() {
        return internalFailure ? Main.INTERNAL_FAILURE : badInput ? Main.BAD_INPUT : Main.OK;
    }
}
