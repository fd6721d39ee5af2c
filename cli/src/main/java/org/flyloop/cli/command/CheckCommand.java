package org.flyloop.cli.command;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.flyloop.cli.ExitCodes;
import org.flyloop.cli.output.CheckJson;
import org.flyloop.cli.output.CheckText;
import org.flyloop.cli.output.DesignText;
import org.flyloop.cli.output.MonteCarloProgress;
import org.flyloop.cli.output.PendingOutput;
import org.flyloop.cli.report.CheckReport;
import org.flyloop.cli.spec.InputException;
import org.flyloop.cli.spec.Spec;
import org.flyloop.cli.spec.SpecLoader;
import org.flyloop.design.DesignRequest;
import org.flyloop.envelope.EnvelopeCheck;
import org.flyloop.envelope.GivenNetwork;
import org.flyloop.envelope.MonteCarloAnalysis;
import org.flyloop.network.CompensatorNetwork;
import org.flyloop.stage.InfeasibleOperatingPointException;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;

/**
 * {@code flyloop check SPEC}: analyses the compensator given in {@code feedback.parts} at every
 * envelope corner (line × load, the loads beside the CCM/DCM boundary, the CTR extremes), and
 * under the spec's tolerances (worst case; Monte Carlo with {@code --monte-carlo N}). With
 * {@code --set} changes, the spec without them is checked too and both are shown side by side.
 *
 * <p>Exit codes: 0 when every corner and the tolerance worst case meet every target, 3 when
 * anything misses (the report is printed in full first), 2 for bad input: no feedback section,
 * missing or foreign parts, an unknown {@code --set} path (with a did-you-mean).
 */
@Command(name = "check",
        mixinStandardHelpOptions = true,
        description = "Check the compensator given in feedback.parts at every envelope corner and under the "
                + "spec's tolerances; with --set, show before and after side by side.",
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {"0:every target met at every corner and in the tolerance worst case", "1:internal error",
            "2:bad input (no feedback section, missing parts, unknown --set path)",
            "3:a target is missed at some corner or in the tolerance worst case"})
public final class CheckCommand implements Callable<Integer> {

    @Mixin
    private SpecFileOptions specOptions;

    @Mixin
    private ReportOptions reportOptions;

    @Option(names = "--monte-carlo", paramLabel = "N",
            description = "Also draw N samples, each toleranced value uniform within its band, and report "
                    + "percentiles per corner (1 to " + MonteCarloAnalysis.MAX_SAMPLES + ").")
    private Integer monteCarlo;

    @Option(names = "--seed", paramLabel = "S", defaultValue = "1",
            description = "Seed of the Monte Carlo samples (default: ${DEFAULT-VALUE}); the same seed gives the "
                    + "same result on any number of cores.")
    private long seed;

    @picocli.CommandLine.Spec
    private CommandSpec command;

    @Override
    public Integer call() {
        if (monteCarlo != null && (monteCarlo < 1 || monteCarlo > MonteCarloAnalysis.MAX_SAMPLES)) {
            throw new ParameterException(command.commandLine(), "--monte-carlo must lie between 1 and "
                    + MonteCarloAnalysis.MAX_SAMPLES + ", got " + monteCarlo);
        }
        List<String> settings = command.findOption("--set").getValue();
        Spec spec = specOptions.loadSpec();
        EnvelopeCheck after = check(spec);
        if (monteCarlo != null) {
            after = withMonteCarlo(after, spec);
        }
        CheckText.Comparison comparison = settings.isEmpty() ? null : compareWith(settings);
        PendingOutput output = new PendingOutput();
        if (specOptions.json()) {
            output.print(CheckJson.render(after, comparison == null ? null : comparison.before()));
        } else {
            output.print(CheckText.render(after, comparison,
                    new DesignText.Style(spec.displayTitle(), specOptions.quiet(), colourWanted())));
        }
        if (reportOptions.wanted()) {
            Path dir = reportOptions.directory(spec);
            try {
                Path written = CheckReport.write(after, ReportOptions.specName(spec), CheckJson.of(after), dir);
                if (!specOptions.json()) {
                    output.print("report: " + written.resolve("report.html") + " (with report.md, pictures and data/)"
                            + System.lineSeparator());
                }
            } catch (IOException e) {
                throw new InputException("--out " + dir, "cannot write the report: " + e.getMessage(),
                        "give a writable directory");
            }
        }
        output.commit(command.commandLine().getOut());
        return after.meetsTargets() ? ExitCodes.OK : ExitCodes.TARGETS_NOT_MET;
    }

    /**
     * Checks the spec's given network over its envelope and tolerances.
     *
     * @throws InputException without a feedback section, with missing, foreign or invalid parts,
     *                        or at a corner the nominal stage cannot reach
     */
    public static EnvelopeCheck check(Spec spec) {
        if (!spec.hasFeedback()) {
            throw new InputException(spec.source() + ": feedback", "missing section; check needs the error amplifier "
                    + "and its parts", "add feedback: with amplifier, its keys and parts: {name: value, ...}");
        }
        DesignRequest request = new DesignRequest(spec.stage(), spec.control(), spec.feedback(), spec.targets(),
                spec.series());
        CompensatorNetwork network;
        try {
            network = GivenNetwork.from(spec.feedback(), spec.stage());
        } catch (IllegalArgumentException e) {
            throw new InputException(spec.source() + ": feedback.parts", e.getMessage(),
                    "list the " + GivenNetwork.kindOf(spec.feedback()).specName() + " network's parts under "
                            + "feedback.parts (r_upper and r_lower may come from the feedback keys), or run "
                            + "flyloop design");
        }
        try {
            return EnvelopeCheck.run(request, network, spec.tolerances());
        } catch (InfeasibleOperatingPointException e) {
            throw new InputException(spec.source(), e.getMessage(), null);
        }
    }

    /**
     * The spec file without the {@code --set} changes, checked. A file that only the changes make
     * valid has no "before": the comparison then says why.
     */
    private CheckText.Comparison compareWith(List<String> settings) {
        Path file = command.positionalParameters().get(0).getValue();
        try {
            return new CheckText.Comparison(settings, check(SpecLoader.load(file)), null);
        } catch (InputException e) {
            return new CheckText.Comparison(settings, null, e.getMessage());
        }
    }

    private EnvelopeCheck withMonteCarlo(EnvelopeCheck check, Spec spec) {
        MonteCarloProgress progress = MonteCarloProgress.forTerminal(command.commandLine().getErr(), monteCarlo);
        try {
            return check.withMonteCarlo(spec.tolerances(), monteCarlo, seed, Runtime.getRuntime().availableProcessors(),
                    progress);
        } catch (IllegalArgumentException e) {
            throw new InputException("--monte-carlo", e.getMessage(), "give the spec a tolerances section, e.g. "
                    + "tolerances: {lm: 10%, cout: 20%, parts: 1%}");
        } finally {
            progress.finish();
        }
    }

    /** Colour only on an interactive terminal and when NO_COLOR (https://no-color.org) is unset or empty. */
    private static boolean colourWanted() {
        String noColor = System.getenv("NO_COLOR");
        return System.console() != null && (noColor == null || noColor.isEmpty());
    }
}
