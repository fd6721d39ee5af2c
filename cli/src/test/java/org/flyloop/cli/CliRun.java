package org.flyloop.cli;

import java.io.PrintWriter;
import java.io.StringWriter;
import picocli.CommandLine;

/**
 * The result of running flyloop in-process with captured streams.
 *
 * @param exitCode what the process would exit with
 * @param out      everything written to stdout
 * @param err      everything written to stderr
 */
public record CliRun(int exitCode, String out, String err) {

    /** Runs {@code flyloop args...} in this JVM, with the same error handling as the real main. */
    public static CliRun of(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine cl = Main.newCommandLine();
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(err, true));
        int code = cl.execute(args);
        return new CliRun(code, out.toString(), err.toString());
    }

    /** The stderr lines, without the trailing empty one. */
    public String[] errLines() {
        return err.isEmpty() ? new String[0] : err.split("\\R");
    }
}
