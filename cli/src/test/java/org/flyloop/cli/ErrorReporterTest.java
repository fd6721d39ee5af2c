package org.flyloop.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import org.flyloop.cli.spec.InputException;
import org.junit.jupiter.api.Test;
import picocli.CommandLine;

class ErrorReporterTest {

    private final StringWriter err = new StringWriter();

    private int handle(Exception e, boolean debug) {
        CommandLine cl = new CommandLine(new Main());
        cl.setErr(new PrintWriter(err, true));
        return new ErrorReporter(debug).handleExecutionException(e, cl, null);
    }

    @Test
    void inputProblemIsExitTwoOnOneLine() {
        assertEquals(ExitCodes.BAD_INPUT, handle(new InputException("f.yaml: stage.lm", "missing", "write henries"), false));
        assertEquals("flyloop: f.yaml: stage.lm: missing; write henries" + System.lineSeparator(), err.toString());
    }

    @Test
    void internalFaultIsExitOneOnOneLineWithoutDebug() {
        assertEquals(ExitCodes.INTERNAL_ERROR, handle(new IllegalStateException("broken\ninvariant"), false));
        assertEquals(1, err.toString().split("\\R").length, err.toString());
        assertTrue(err.toString().startsWith("flyloop: internal error: java.lang.IllegalStateException: broken invariant"));
    }

    @Test
    void debugAddsTheStackTrace() {
        assertEquals(ExitCodes.INTERNAL_ERROR, handle(new IllegalStateException("broken"), true));
        assertTrue(err.toString().contains("\tat "), err.toString());
    }
}
