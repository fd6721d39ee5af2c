package org.flyloop.cli.command;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.flyloop.averaged.AveragedFlybackModel;
import org.flyloop.averaged.AveragedInputs;
import org.flyloop.cli.CliRun;
import org.flyloop.cli.command.StageFiles.Csv;
import org.flyloop.cli.spec.Spec;
import org.flyloop.cli.spec.SpecLoader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code flyloop stage --transient}: the CSV layout, the step and its timing, and the end of the
 * record against the equilibrium the averaged model reaches after the step
 * ({@link AveragedFlybackModel#equilibrium}, a Newton solve of the same equations with all
 * derivatives zero, independent of the time integration that wrote the file).
 */
class StageTransientTest {

    @TempDir
    Path dir;

    /**
     * DCM at 48 V: 50 % → 100 % of 0.2 A. Open loop in DCM the output sags strongly (the stage
     * delivers about constant power at a fixed duty), so the 1 % check separates the new
     * equilibrium from the old one by a wide margin. The load is modelled as the library documents
     * for a load step: a resistor Vout/0.1 A, plus a 0.1 A current source switched on at the step.
     */
    @Test
    void loadStepEndsAtTheNewEquilibrium() throws Exception {
        Path file = dir.resolve("load.csv");
        CliRun run = CliRun.of("stage", StageFiles.BUS.toString(), "--iout", "0.2", "--transient",
                "load-step:50%..100%", "--csv", file.toString());
        assertEquals(0, run.exitCode(), run.err());
        Csv csv = Csv.read(file);
        assertEquals(List.of("time_s", "vout_v", "im_a"), csv.header().subList(0, 3));
        double[] t = csv.column("time_s");
        double[] vout = csv.column("vout_v");
        double[] control = csv.column("control");
        assertIncreasing(t);
        assertEquals(12, vout[0], 12e-6, "regulated before the step");
        int step = firstChange(vout);
        assertEquals(0.1, t[step] / t[t.length - 1], 0.01, "the step at 10 % of the window");

        Spec spec = SpecLoader.load(StageFiles.BUS);
        AveragedFlybackModel model = new AveragedFlybackModel(spec.stage(), spec.control());
        double after = model.equilibrium(new AveragedInputs(control[0], 48, 0.1), 12 / 0.1).voutV();
        assertTrue(Math.abs(after - 12) > 1, "the step must move the output well beyond 1 %: " + after);
        double end = vout[vout.length - 1];
        assertEquals(after, end, 0.01 * after, "end of record within 1 % of the new equilibrium");
        assertTrue(run.out().contains("wrote " + file + ": open-loop averaged model, load step 0.1 A to 0.2 A"),
                run.out());
    }

    /** duty-step:+2% is relative (d → 1.02·d) and --time sets the record length. */
    @Test
    void dutyStepIsRelativeAndTimeSetsTheWindow() throws Exception {
        Path file = dir.resolve("duty.csv");
        CliRun run = CliRun.of("stage", StageFiles.BUS.toString(), "--iout", "2", "--transient", "duty-step:+2%",
                "--time", "20m", "--csv", file.toString());
        assertEquals(0, run.exitCode(), run.err());
        Csv csv = Csv.read(file);
        double[] t = csv.column("time_s");
        double[] d = csv.column("d");
        assertIncreasing(t);
        assertEquals(20e-3, t[t.length - 1], 1e-12);
        int step = firstChange(d);
        assertEquals(2e-3, t[step], 20e-3 / 1000 + 1e-12, "the step at 10 % of 20 ms");
        assertEquals(1.02 * d[0], d[d.length - 1], 1e-9 * d[0]);
    }

    /**
     * Line step in voltage mode with the duty held: the record ends at the equilibrium for 60 V
     * with the same duty and the same 6 Ω load (Vout/Iout at 2 A).
     */
    @Test
    void lineStepEndsAtTheEquilibriumOfTheNewInputVoltage() throws Exception {
        Path file = dir.resolve("line.csv");
        CliRun run = CliRun.of("stage", StageFiles.BUS.toString(), "--iout", "2", "--transient", "line-step:40..60",
                "--csv", file.toString());
        assertEquals(0, run.exitCode(), run.err());
        Csv csv = Csv.read(file);
        double[] vout = csv.column("vout_v");
        double duty = csv.column("control")[0];
        assertEquals(12, vout[0], 12e-6, "regulated at 40 V before the step");
        Spec spec = SpecLoader.load(StageFiles.BUS);
        double after = new AveragedFlybackModel(spec.stage(), spec.control()).equilibrium(60, 2, duty).voutV();
        assertTrue(after > 14, "the open-loop output rises with the input: " + after);
        assertEquals(after, vout[vout.length - 1], 0.01 * after);
    }

    /** In current mode the control input is the comparator voltage: control-step moves it, and d follows. */
    @Test
    void controlStepInCurrentModeMovesTheComparatorVoltage() throws Exception {
        Path file = dir.resolve("vc.csv");
        CliRun run = CliRun.of("stage", StageFiles.CHARGER.toString(), "--vin", "90", "--iout", "2", "--transient",
                "control-step:-5%", "--time", "5m", "--csv", file.toString());
        assertEquals(0, run.exitCode(), run.err());
        Csv csv = Csv.read(file);
        double[] vc = csv.column("control");
        double[] d = csv.column("d");
        assertEquals(0.95 * vc[0], vc[vc.length - 1], 1e-9 * vc[0]);
        assertTrue(d[d.length - 1] < d[0], "a lower peak-current command lowers the duty");
        assertTrue(run.out().contains("comparator-voltage step -5%"), run.out());
    }

    private static int firstChange(double[] x) {
        for (int i = 1; i < x.length; i++) {
            if (x[i] != x[0]) {
                return i;
            }
        }
        throw new AssertionError("the record never changes");
    }

    private static void assertIncreasing(double[] t) {
        assertEquals(0, t[0], 0);
        for (int i = 1; i < t.length; i++) {
            assertTrue(t[i] > t[i - 1], "time increases at sample " + i);
        }
    }
}
