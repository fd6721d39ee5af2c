package org.flyloop.stage;

/**
 * Thrown when a stage cannot run at a requested point: the duty cycle would exceed its limit, the
 * output cannot be reached, or the DCM intervals would not fit in one period. The message is one
 * line fit for an engineer.
 */
public final class InfeasibleOperatingPointException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public InfeasibleOperatingPointException(String message) {
        super(message);
    }
}
