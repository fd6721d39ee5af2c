package org.flyloop.cli;

import java.io.PrintWriter;
import org.flyloop.cli.spec.InputException;
import picocli.CommandLine;
import picocli.CommandLine.IExecutionExceptionHandler;
import picocli.CommandLine.IParameterExceptionHandler;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.ParseResult;

/**
 * The one place where exceptions become exit codes and messages. Bad input (an
 * {@link InputException} or a command-line parse error) gives exit 2 and one line on stderr;
 * anything else is a fault inside flyloop: exit 1, one line, and the stack trace only when the
 * environment variable {@code FLYLOOP_DEBUG} is set.
 */
final class ErrorReporter implements IExecutionExceptionHandler, IParameterExceptionHandler {

    private final boolean debug;

    /** @param debug print stack traces for internal errors */
    ErrorReporter(boolean debug) {
        this.debug = debug;
    }

    /** Reads {@code FLYLOOP_DEBUG} from the environment: any non-empty value switches it on. */
    static ErrorReporter fromEnvironment() {
        String v = System.getenv("FLYLOOP_DEBUG");
        return new ErrorReporter(v != null && !v.isEmpty());
    }

    @Override
    public int handleExecutionException(Exception ex, CommandLine commandLine, ParseResult parseResult) {
        PrintWriter err = commandLine.getErr();
        if (ex instanceof InputException) {
            err.println("flyloop: " + ex.getMessage());
        } else {
            err.println("flyloop: internal error: " + oneLine(String.valueOf(ex)));
            if (debug) {
                ex.printStackTrace(err);
            }
        }
        err.flush();
        return ex instanceof InputException ? ExitCodes.BAD_INPUT : ExitCodes.INTERNAL_ERROR;
    }

    @Override
    public int handleParseException(ParameterException ex, String[] args) {
        CommandLine cl = ex.getCommandLine();
        PrintWriter err = cl.getErr();
        err.println("flyloop: " + oneLine(ex.getMessage()) + "; see " + cl.getCommandSpec().qualifiedName() + " --help");
        err.flush();
        return ExitCodes.BAD_INPUT;
    }

    private static String oneLine(String s) {
        return s.replaceAll("\\s*\\R\\s*", " ").strip();
    }
}
