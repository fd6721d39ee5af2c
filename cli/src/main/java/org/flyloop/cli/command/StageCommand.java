package org.flyloop.cli.command;

import java.io.PrintWriter;
import java.util.List;
import java.util.concurrent.Callable;
import org.flyloop.cli.ExitCodes;
import org.flyloop.cli.output.OperatingPointJson;
import org.flyloop.cli.output.OperatingPointTable;
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

    @Override
    public Integer call() {
        Spec spec = specOptions.loadSpec();
        List<OperatingPoint> points = pointOptions.solve(spec);
        String text = specOptions.json() ? OperatingPointJson.render(points) : humanReadable(spec, points);
        PrintWriter out = command.commandLine().getOut();
        out.print(text);
        out.flush();
        return ExitCodes.OK;
    }

    private String humanReadable(Spec spec, List<OperatingPoint> points) {
        String table = OperatingPointTable.render(points);
        if (specOptions.quiet()) {
            return table;
        }
        return spec.displayTitle() + "\n" + table + SafetyNotice.ONE_LINE + "\n";
    }
}
