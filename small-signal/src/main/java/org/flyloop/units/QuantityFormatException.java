package org.flyloop.units;

/**
 * A piece of text that is not an acceptable quantity. The message has two parts so that callers
 * can put the location in front: {@link #problem()} says what is wrong, {@link #accepted()} what
 * would be accepted instead. Neither part contains a line break.
 */
public final class QuantityFormatException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    private final String problem;
    private final String accepted;

    public QuantityFormatException(String problem, String accepted) {
        super(problem + "; " + accepted);
        this.problem = problem;
        this.accepted = accepted;
    }

    /** What is wrong, e.g. {@code unit uH does not fit a capacitance}. */
    public String problem() {
        return problem;
    }

    /** What is accepted, e.g. {@code write farads, e.g. 1000u or 1000uF}. */
    public String accepted() {
        return accepted;
    }
}
