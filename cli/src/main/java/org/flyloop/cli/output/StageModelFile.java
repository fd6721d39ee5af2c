package org.flyloop.cli.output;

/**
 * A file the stage command wrote, as reported after the results.
 *
 * @param path        the path as given on the command line
 * @param kind        {@code bode}, {@code transient} or {@code netlist}
 * @param description one line saying what the file holds
 */
public record StageModelFile(String path, String kind, String description) {

    /** The line printed after the human-readable output. */
    public String line() {
        return "wrote " + path + ": " + description;
    }
}
