package org.phasewright.cli;

/** The command line itself is wrong (unknown command or option, missing argument): exit code 2. */
final class UsageException extends Exception {
    private static final long serialVersionUID = 1L;

    UsageException(String message) {
        super(message);
    }
}
