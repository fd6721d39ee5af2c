package org.flyloop.cli;

/** The process exit codes every flyloop command uses. */
public final class ExitCodes {
    /** The command ran and everything it checked is fine. */
    public static final int OK = 0;
    /** A fault inside flyloop; one line on stderr, a stack trace too when FLYLOOP_DEBUG is set. */
    public static final int INTERNAL_ERROR = 1;
    /** Bad input: the spec file or the command-line options. Nothing was written to stdout. */
    public static final int BAD_INPUT = 2;
    /** The analysis ran but the design misses one or more of its targets. */
    public static final int TARGETS_NOT_MET = 3;

    private ExitCodes() {
    }
}
