package org.phasewright.cli;

/** Process exit codes, documented in the README. */
final class ExitCodes {
    private ExitCodes() {
    }

    static final int OK = 0;
    /** A model has errors (or a file is missing). */
    static final int MODEL_ERRORS = 1;
    /** The command line is wrong. */
    static final int USAGE = 2;
    /** An analysis ended early (blow-up, step underflow, budget); results written so far are kept. */
    static final int ANALYSIS_FAILED = 3;
    /** An internal fault: a bug in Phasewright, reported without a stack trace. */
    static final int INTERNAL = 70;
}
