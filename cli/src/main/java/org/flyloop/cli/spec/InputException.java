package org.flyloop.cli.spec;

/**
 * Bad input from the user (a spec file or a command-line option), reported as one line and exit
 * code 2. The message reads {@code <where>: <what is wrong>; <what is accepted>}, where
 * {@code where} is e.g. {@code ex.yaml: stage.cout} or {@code --vin}; the command-line front end
 * puts {@code flyloop: } in front. No part contains a line break.
 */
public final class InputException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    private final String where;
    private final String problem;
    private final String accepted;

    /**
     * @param where    location of the bad input, e.g. {@code ex.yaml: stage.cout}
     * @param problem  what is wrong
     * @param accepted what would be accepted instead, or null when there is nothing to suggest
     */
    public InputException(String where, String problem, String accepted) {
        super(oneLine(where) + ": " + oneLine(problem) + (accepted == null ? "" : "; " + oneLine(accepted)));
        this.where = where;
        this.problem = problem;
        this.accepted = accepted;
    }

    /** Location of the bad input. */
    public String where() {
        return where;
    }

    /** What is wrong. */
    public String problem() {
        return problem;
    }

    /** What would be accepted, or null. */
    public String accepted() {
        return accepted;
    }

    /** Collapses line breaks so a message can never span lines whatever the input held. */
    private static String oneLine(String s) {
        return s.replaceAll("[\\r\\n\\t\\u000b\\f\\u0085\\u2028\\u2029]+", " ");
    }
}
