package org.flyloop.cli.command;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.flyloop.averaged.AcSweep;
import org.flyloop.averaged.AveragedFlybackModel;
import org.flyloop.averaged.Equilibrium;
import org.flyloop.averaged.Scenario;
import org.flyloop.averaged.SpiceNetlistWriter;
import org.flyloop.averaged.Transient;
import org.flyloop.cli.ExitCodes;
import org.flyloop.cli.command.StageBodeOptions.Model;
import org.flyloop.cli.command.StageSweepOptions.FrequencyRange;
import org.flyloop.cli.command.StageTransientOptions.Step;
import org.flyloop.cli.output.BodeCsv;
import org.flyloop.cli.output.NumberText;
import org.flyloop.cli.output.OperatingPointTable;
import org.flyloop.cli.output.PendingOutput;
import org.flyloop.cli.output.SafetyNotice;
import org.flyloop.cli.output.StageModelFile;
import org.flyloop.cli.output.StageModelJson;
import org.flyloop.cli.output.StageModelQuantity;
import org.flyloop.cli.output.StageModelTable;
import org.flyloop.cli.spec.InputException;
import org.flyloop.cli.spec.Spec;
import org.flyloop.linear.FrequencyGrid;
import org.flyloop.linear.FrequencyResponse;
import org.flyloop.linear.TransferFunction;
import org.flyloop.spec.ControlScheme;
import org.flyloop.stage.InfeasibleOperatingPointException;
import org.flyloop.stage.OperatingPoint;
import org.flyloop.stage.model.AnalyticStageModel;
import org.flyloop.stage.model.StageTransferFunctions;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code flyloop stage SPEC}: the steady-state operating points of the power stage at every
 * vin × iout corner (or at the point given with {@code --vin}/{@code --iout}) with the
 * small-signal summary of each; optionally a Bode file ({@code --bode}), an open-loop averaged
 * transient ({@code --transient}) and a SPICE netlist ({@code --netlist}) at one chosen point.
 *
 * <p>The command only loads, calls and formats: it computes every point and every file before
 * printing or writing anything, so bad input or an infeasible point leaves no output behind.
 */
@Command(name = "stage",
        mixinStandardHelpOptions = true,
        description = {"Operating points (duty cycles, currents, switch stress) at every vin x iout corner, with"
                + " the poles and zeros of the control-to-output function.",
            "--bode, --transient and --netlist write files at one point: give --vin and --iout when the spec"
                + " has several corners."},
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {"0:ok", "1:internal error", "2:bad input, or a point the stage cannot reach"})
public final class StageCommand implements Callable<Integer> {

    @Mixin
    private SpecFileOptions specOptions;

    @Mixin
    private OperatingPointOptions pointOptions;

    @Mixin
    private StageBodeOptions bodeOptions;

    @Mixin
    private StageSweepOptions sweepOptions;

    @Mixin
    private StageTransientOptions transientOptions;

    @Mixin
    private StageNetlistOptions netlistOptions;

    @picocli.CommandLine.Spec
    private CommandSpec command;

    /**
     * Load, check the options, solve, build every output, then commit: a failure anywhere leaves
     * stdout empty and no file written.
     */
    @Override
    public Integer call() {
        Spec spec = specOptions.loadSpec();
        checkOptions(spec);
        List<OperatingPoint> points = pointOptions.solve(spec);
        List<StageTransferFunctions> models = new ArrayList<>();
        for (OperatingPoint p : points) {
            models.add(AnalyticStageModel.at(spec.stage(), spec.control(), p));
        }
        PendingOutput output = new PendingOutput();
        List<StageModelFile> files = new ArrayList<>();
        List<String> notes = new ArrayList<>();
        AveragedPoint averaged = new AveragedPoint(new AveragedFlybackModel(spec.stage(), spec.control()));
        if (bodeOptions.requested()) {
            files.add(bode(spec, models, averaged, output, notes));
        }
        if (transientOptions.requested()) {
            files.add(transientRecord(spec, points, averaged, output));
        }
        if (netlistOptions.requested()) {
            files.add(netlist(spec, points, averaged, output));
        }
        if (specOptions.json()) {
            output.print(StageModelJson.render(points, models, files));
        } else {
            if (!specOptions.quiet()) {
                output.print(spec.displayTitle() + "\n");
            }
            output.print(OperatingPointTable.render(points));
            output.print("\n");
            output.print(StageModelTable.render(models, spec.stage().fswHz()));
            for (StageModelFile f : files) {
                output.print(f.line() + "\n");
            }
            if (!specOptions.quiet()) {
                output.print(SafetyNotice.ONE_LINE + "\n");
            }
        }
        output.commit(command.commandLine().getOut());
        PrintWriter err = command.commandLine().getErr();
        notes.forEach(n -> err.println("flyloop: note: " + n));
        err.flush();
        return ExitCodes.OK;
    }

    /** Every option check that needs no model, so a mistyped command line fails at once. */
    private void checkOptions(Spec spec) {
        ControlScheme scheme = spec.control().scheme();
        sweepOptions.check();
        bodeOptions.check();
        transientOptions.check(scheme);
        if (sweepOptions.given() && !bodeOptions.requested() && !netlistOptions.requested()) {
            throw new InputException("--freq", "applies to --bode and --netlist only",
                    "add --bode FILE.csv or --netlist FILE.cir");
        }
        if (bodeOptions.requested() && bodeOptions.model().usesAveraged()
                && !bodeOptions.quantity().hasAveragedCounterpart(scheme)) {
            throw new InputException("--quantity", "duty has no averaged counterpart in current mode: the averaged"
                    + " model's control input is the comparator voltage", "use --model analytic, or --quantity control");
        }
        Map<Path, String> outputs = new LinkedHashMap<>();
        outputs.put(Path.of(spec.source()).toAbsolutePath().normalize(), "the spec file");
        checkOutputPath("--bode", bodeOptions.file(), outputs);
        checkOutputPath("--csv", transientOptions.csvFile(), outputs);
        checkOutputPath("--netlist", netlistOptions.file(), outputs);
    }

    /**
     * Refuses an output path that another output (or the spec) already uses, or whose directory
     * does not exist, before anything is computed; the atomic write would otherwise fail only
     * after other files were already in place.
     */
    private static void checkOutputPath(String option, Path path, Map<Path, String> taken) {
        if (path == null) {
            return;
        }
        Path absolute = path.toAbsolutePath().normalize();
        String other = taken.putIfAbsent(absolute, option);
        if (other != null) {
            throw new InputException(option, path + " is also " + other, "give every output its own file");
        }
        Path dir = absolute.getParent();
        if (dir == null || !Files.isDirectory(dir)) {
            throw new InputException(option, "directory " + dir + " does not exist", "create it first");
        }
        if (Files.isDirectory(absolute)) {
            throw new InputException(option, path + " is a directory", "give a file name");
        }
    }

    private StageModelFile bode(Spec spec, List<StageTransferFunctions> models, AveragedPoint averaged,
                                PendingOutput output, List<String> notes) {
        List<OperatingPoint> points = models.stream().map(StageTransferFunctions::point).toList();
        OperatingPoint p = onePoint(points, "--bode", true);
        StageTransferFunctions analytic = models.get(points.indexOf(p));
        Model model = bodeOptions.model();
        StageModelQuantity quantity = bodeOptions.quantity();
        FrequencyRange range = sweepOptions.range(spec.stage().fswHz());
        TransferFunction tf = quantity.analytic(analytic);
        FrequencyGrid grid = FrequencyGrid.refinedFor(range.lowHz(), range.highHz(),
                StageSweepOptions.POINTS_PER_DECADE, tf);
        FrequencyResponse fromAnalytic = model.usesAnalytic() ? FrequencyResponse.of(tf, grid) : null;
        FrequencyResponse fromAveraged = null;
        if (model.usesAveraged()) {
            Equilibrium eq = averaged.regulated(p, "--model");
            fromAveraged = FrequencyResponse.of(quantity.averaged(averaged.model.linearize(eq), spec.control()), grid);
            if (spec.control().scheme() == ControlScheme.CURRENT) {
                notes.add("current mode: the averaged model has no current-loop sampling effect (no double pole at"
                        + " fsw/2, Ridley 1991); read it only up to about fsw/10");
            }
        }
        String csv = model == Model.BOTH ? BodeCsv.compared(fromAnalytic, fromAveraged)
                : BodeCsv.single(model == Model.ANALYTIC ? fromAnalytic : fromAveraged);
        output.file(bodeOptions.file(), csv);
        String source = switch (model) {
            case ANALYTIC -> "analytic model";
            case AVERAGED -> "averaged model (numerical linearization)";
            case BOTH -> "analytic and averaged models with their difference";
        };
        return new StageModelFile(bodeOptions.file().toString(), "bode", quantity.description() + ", " + source
                + ", " + at(p) + ", " + StageModelTable.engineering(grid.lowHz()) + "Hz to "
                + StageModelTable.engineering(grid.highHz()) + "Hz, " + grid.size() + " points");
    }

    private StageModelFile transientRecord(Spec spec, List<OperatingPoint> points, AveragedPoint averaged,
                                           PendingOutput output) {
        ControlScheme scheme = spec.control().scheme();
        Step step = transientOptions.step(scheme);
        OperatingPoint p = onePoint(points, "--transient", step.usesChosenVin());
        AveragedFlybackModel model = averaged.model;
        double provisionalStepS = 1;
        Scenario scenario;
        try {
            scenario = StageTransientOptions.scenario(step, model, p.vin(), p.iout(), provisionalStepS);
        } catch (InfeasibleOperatingPointException e) {
            throw new InputException("--transient", "the averaged model cannot hold the output before the step: "
                    + e.getMessage(), null);
        } catch (RuntimeException e) {
            throw new IllegalStateException("averaged model, steady state before the step at " + at(p) + ": " + e, e);
        }
        double windowS = transientOptions.windowS();
        if (Double.isNaN(windowS)) {
            windowS = StageTransientOptions.defaultWindowS(model, scenario, provisionalStepS);
        }
        double stepS = StageTransientOptions.STEP_FRACTION * windowS;
        Transient record = model.simulate(StageTransientOptions.retimed(scenario, provisionalStepS, stepS), windowS);
        output.file(transientOptions.csvFile(), record.toCsv());
        String where = step.usesChosenVin() ? ", " + at(p) : "";
        return new StageModelFile(transientOptions.csvFile().toString(), "transient", "open-loop averaged model, "
                + StageTransientOptions.describe(step, scheme, p.iout()) + " at " + StageModelTable.engineering(stepS)
                + "s" + where + ", " + StageModelTable.engineering(windowS) + "s record, " + record.samples().size()
                + " samples");
    }

    private StageModelFile netlist(Spec spec, List<OperatingPoint> points, AveragedPoint averaged,
                                   PendingOutput output) {
        OperatingPoint p = onePoint(points, "--netlist", true);
        Equilibrium eq = averaged.regulated(p, "--netlist");
        FrequencyRange range = sweepOptions.range(spec.stage().fswHz());
        String base = netlistOptions.outputBaseName();
        String text = new SpiceNetlistWriter(spec.stage(), spec.control())
                .write(eq, new AcSweep(StageSweepOptions.POINTS_PER_DECADE, range.lowHz(), range.highHz()), base);
        output.file(netlistOptions.file(), text);
        String input = spec.control().scheme() == ControlScheme.CURRENT ? "comparator voltage vc" : "duty cycle d";
        return new StageModelFile(netlistOptions.file().toString(), "netlist", "averaged model at " + at(p) + " ("
                + eq.mode().label() + "), AC source on the " + input + ", " + StageModelTable.engineering(range.lowHz())
                + "Hz to " + StageModelTable.engineering(range.highHz()) + "Hz; ngspice -b writes " + base
                + "_op.txt and " + base + "_ac.txt");
    }

    /**
     * The one point a file option works at. {@code vinMatters} is false for a step that brings its
     * own input voltages; the load must then still be a single value.
     */
    static OperatingPoint onePoint(List<OperatingPoint> points, String option, boolean vinMatters) {
        List<Double> vins = points.stream().map(OperatingPoint::vin).distinct().toList();
        List<Double> iouts = points.stream().map(OperatingPoint::iout).distinct().toList();
        boolean manyVin = vinMatters && vins.size() > 1;
        boolean manyIout = iouts.size() > 1;
        if (!manyVin && !manyIout) {
            return points.get(0);
        }
        String where = manyVin && manyIout ? "--vin/--iout" : manyVin ? "--vin" : "--iout";
        List<String> what = new ArrayList<>();
        if (manyVin) {
            what.add(vins.size() + " input voltages (" + list(vins) + " V)");
        }
        if (manyIout) {
            what.add(iouts.size() + " loads (" + list(iouts) + " A)");
        }
        String example = (manyVin ? "--vin " + NumberText.significant(vins.get(0), 4) : "")
                + (manyVin && manyIout ? " " : "") + (manyIout ? "--iout " + NumberText.significant(
                iouts.get(iouts.size() - 1), 4) : "");
        throw new InputException(where, option + " works at one operating point and there are "
                + String.join(" and ", what), "choose one with " + example);
    }

    private static String list(List<Double> values) {
        return String.join(", ", values.stream().map(v -> NumberText.significant(v, 4)).toList());
    }

    private static String at(OperatingPoint p) {
        return "vin " + NumberText.significant(p.vin(), 4) + " V, iout " + NumberText.significant(p.iout(), 4) + " A";
    }

    /** The averaged model with the regulated equilibrium solved once for all outputs at one point. */
    private static final class AveragedPoint {
        private final AveragedFlybackModel model;
        private final Map<List<Double>, Equilibrium> regulated = new LinkedHashMap<>();

        AveragedPoint(AveragedFlybackModel model) {
            this.model = model;
        }

        /** The equilibrium of the averaged model that holds the spec's Vout at the point. */
        Equilibrium regulated(OperatingPoint p, String option) {
            List<Double> key = List.of(p.vin(), p.iout());
            Equilibrium eq = regulated.get(key);
            if (eq == null) {
                try {
                    eq = model.regulatedEquilibrium(p.vin(), p.iout());
                } catch (InfeasibleOperatingPointException e) {
                    throw new InputException(option, "the averaged model cannot hold the output at " + at(p) + ": "
                            + e.getMessage(), null);
                } catch (RuntimeException e) {
                    // a solver failure inside the model is flyloop's fault, not the user's: say where
                    throw new IllegalStateException("averaged model, regulated equilibrium at " + at(p) + ": " + e, e);
                }
                regulated.put(key, eq);
            }
            return eq;
        }
    }
}
