package org.beamfolio.cli;

/**
 * The status of a run over many jobs. An internal failure outranks bad input, which outranks a
 * failing check, which outranks success: a job that could not be built at all is the more urgent
 * news, and a failing check is only known for the jobs that were built.
 */
final class ExitStatus {
    private boolean badInput;
    private boolean internalFailure;
    private boolean checksFail;

    void add(int status) {
        badInput |= status == Main.BAD_INPUT;
        internalFailure |= status == Main.INTERNAL_FAILURE;
        checksFail |= status == Main.CHECKS_FAIL;
    }

    int get() {
        return internalFailure ? Main.INTERNAL_FAILURE : badInput ? Main.BAD_INPUT : checksFail ? Main.CHECKS_FAIL : Main.OK;
    }
}
