package org.flyloop.cli.command;

import java.io.IOException;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.flyloop.cli.ExitCodes;
import org.flyloop.cli.output.DesignJson;
import org.flyloop.cli.output.DesignText;
import org.flyloop.cli.output.PendingOutput;
import org.flyloop.cli.report.DesignReport;
import org.flyloop.cli.spec.InputException;
import org.flyloop.cli.spec.Spec;
import org.flyloop.design.DesignRequest;
import org.flyloop.design.DesignResult;
import org.flyloop.design.Designer;
import org.flyloop.envelope.RobustDesigner;
import org.flyloop.stage.InfeasibleOperatingPointException;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code flyloop design SPEC}: designs the compensator of the spec's {@code feedback} section with
 * parts on the spec's preferred series, and reports the loop at every corner.
 *
 * <p>Exit codes: 0 when the built network meets every target at every corner, 3 when it misses
 * one anywhere (the report is printed in full first), 2 for bad input, including a spec without
 * a feedback section or one no network can be placed for.
 */
@Command(name = "design",
        mixinStandardHelpOptions = true,
        description = "Design the compensator (parts on E-series) and report crossover and margins at every corner.",
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {"0:every target met at every corner", "1:internal error",
            "2:bad input (including a spec without a feedback section)", "3:a target is missed at some corner"})
public final class DesignCommand implements Callable<Integer> {

    @Mixin
    private SpecFileOptions specOptions;

    @Mixin
    private ReportOptions reportOptions;

    @picocli.CommandLine.Option(names = "--robust",
            description = "Move the zeros and poles to maximise the worst-case phase margin over the envelope "
                    + "(including the CCM/DCM boundary) and the spec's tolerances, at the same crossover (slower).")
    private boolean robust;

    @picocli.CommandLine.Spec
    private CommandSpec command;

    @Override
    public Integer call() {
        Spec spec = specOptions.loadSpec();
        DesignResult result = design(spec);
        if (robust) {
            result = robust(result, spec);
        }
        PendingOutput output = new PendingOutput();
        if (specOptions.json()) {
            output.print(DesignJson.render(result));
        } else {
            DesignText.print(output, result, new DesignText.Style(spec.displayTitle(), specOptions.quiet(),
                    colourWanted()));
        }
        if (reportOptions.wanted()) {
            Path dir = reportOptions.directory(spec);
            try {
                Path html = DesignReport.write(result, ReportOptions.specName(spec), DesignJson.of(result), dir);
                if (!specOptions.json()) {
                    output.print("report: " + html.resolve("report.html") + " (with report.md, pictures and data/)"
                            + System.lineSeparator());
                }
            } catch (IOException e) {
                throw new InputException("--out " + dir, "cannot write the report: " + e.getMessage(),
                        "give a writable directory");
            }
        }
        output.commit(command.commandLine().getOut());
        return result.targetsMet() ? ExitCodes.OK : ExitCodes.TARGETS_NOT_MET;
    }

    /**
     * Runs the designer on the spec.
     *
     * @throws InputException without a feedback section, at a corner the stage cannot reach, or
     *                        when the designer finds the request cannot be built
     */
    public static DesignResult design(Spec spec) {
        if (!spec.hasFeedback()) {
            throw new InputException(spec.source() + ": feedback", "missing section; design needs the error "
                    + "amplifier and its network", "add feedback: with amplifier (opamp, ota or shunt-opto) and its "
                    + "keys, e.g. feedback: {amplifier: opamp, reference: 2.5}");
        }
        DesignRequest request = new DesignRequest(spec.stage(), spec.control(), spec.feedback(), spec.targets(),
                spec.series());
        try {
            return Designer.design(request);
        } catch (InfeasibleOperatingPointException e) {
            throw new InputException(spec.source(), e.getMessage(), null);
        } catch (IllegalArgumentException e) {
            // The designer's refusals (no realisable placement, a reference above the output) are
            // about the spec, not about flyloop.
            throw new InputException(spec.source(), e.getMessage(), "change the spec's targets or feedback choices");
        }
    }

    /** The robust placement from the designer's result; see {@link RobustDesigner}. */
    private static DesignResult robust(DesignResult start, Spec spec) {
        try {
            return RobustDesigner.design(start, spec.tolerances()).design();
        } catch (InfeasibleOperatingPointException e) {
            throw new InputException(spec.source(), e.getMessage(), null);
        }
    }

    /**
     * Colour only on an interactive terminal and when NO_COLOR (https://no-color.org) is unset or
     * empty; never in pipes, files or tests.
     */
    private static boolean colourWanted() {
        String noColor = System.getenv("NO_COLOR");
        return System.console() != null && (noColor == null || noColor.isEmpty());
    }
}
