package org.flyloop.cli.command;

import java.util.List;
import java.util.concurrent.Callable;
import org.flyloop.cli.ExitCodes;
import org.flyloop.cli.output.OperatingPointJson;
import org.flyloop.cli.output.OperatingPointTable;
import org.flyloop.cli.output.PendingOutput;
import org.flyloop.cli.output.SafetyNotice;
import org.flyloop.cli.spec.Spec;
import org.flyloop.stage.OperatingPoint;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code flyloop stage SPEC}: the steady-state operating points of the power stage at every
 * vin × iout corner (or at the point given with {@code --vin}/{@code --iout}).
 *
 * <p>The command only loads, calls and formats: it computes every point before printing, so an
 * infeasible corner leaves stdout empty.
 */
@Command(name = "stage",
        mixinStandardHelpOptions = true,
        description = "Operating points (duty cycles, currents, switch stress) at every vin x iout corner.",
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {"0:ok", "1:internal error", "2:bad input, or a point the stage cannot reach"})
public final class StageCommand implements Callable<Integer> {

    @Mixin
    private SpecFileOptions specOptions;

    @Mixin
    private OperatingPointOptions pointOptions;

    @picocli.CommandLine.Spec
    private CommandSpec command;

    /**
     * Load, solve, format, then commit. Options added later (other models, plots, netlists) add
     * their own sections or files to the same {@link PendingOutput} before the commit, so a
     * failure in any of them still leaves no output behind.
     */
    @Override
    public Integer call() {
        Spec spec = specOptions.loadSpec();
        List<OperatingPoint> points = pointOptions.solve(spec);
        PendingOutput output = new PendingOutput();
        if (specOptions.json()) {
            output.print(OperatingPointJson.render(points));
        } else {
            if (!specOptions.quiet()) {
                output.print(spec.displayTitle() + "\n");
            }
            output.print(OperatingPointTable.render(points));
            if (!specOptions.quiet()) {
                output.print(SafetyNotice.ONE_LINE + "\n");
            }
        }
        output.commit(command.commandLine().getOut());
        return ExitCodes.OK;
    }
}
