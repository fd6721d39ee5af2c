package org.flyloop.cli;

import java.util.concurrent.Callable;
import org.flyloop.cli.command.CheckCommand;
import org.flyloop.cli.command.DesignCommand;
import org.flyloop.cli.command.StageCommand;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** The {@code flyloop} command: version, help and the subcommands. */
@Command(name = "flyloop",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        description = "Design and verify the feedback loop of a flyback converter from a YAML spec.",
        subcommands = {DesignCommand.class, CheckCommand.class, StageCommand.class, CommandLine.HelpCommand.class},
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {
            "0:ok",
            "1:internal error (set FLYLOOP_DEBUG=1 for a stack trace)",
            "2:bad input: spec file or options",
            "3:analysis ran but targets are not met",
        })
public final class Main implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    public static void main(String[] args) {
        System.exit(newCommandLine().execute(args));
    }

    /**
     * The command line with flyloop's error handling installed: use this (not a bare
     * {@code new CommandLine(new Main())}) wherever exit codes and messages matter, tests included.
     */
    public static CommandLine newCommandLine() {
        ErrorReporter reporter = ErrorReporter.fromEnvironment();
        return new CommandLine(new Main())
                .setExecutionExceptionHandler(reporter)
                .setParameterExceptionHandler(reporter);
    }

    /** Without a subcommand there is nothing to do: a usage error. */
    @Override
    public Integer call() {
        throw new ParameterException(spec.commandLine(), "no command given (try flyloop design SPEC.yaml)");
    }
}
