package org.flyloop.cli.command;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.flyloop.cli.CliRun;
import org.flyloop.cli.command.StageFiles.Csv;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code flyloop stage --bode}: columns, frequency grid, continuous phase, and the two models side by side. */
class StageBodeTest {

    private static final List<String> SINGLE = List.of("freq_hz", "mag_db", "phase_deg");
    private static final List<String> BOTH = List.of("freq_hz", "analytic_mag_db", "analytic_phase_deg",
            "averaged_mag_db", "averaged_phase_deg", "diff_mag_db", "diff_phase_deg");

    @TempDir
    Path dir;

    @Test
    void defaultFileIsTheAnalyticControlResponseFromTenHertzToHalfFsw() throws Exception {
        Path file = dir.resolve("gvc.csv");
        CliRun run = CliRun.of("stage", StageFiles.BUS.toString(), "--iout", "2", "--bode", file.toString());
        assertEquals(0, run.exitCode(), run.err());
        assertEquals("", run.err());
        Csv csv = Csv.read(file);
        assertEquals(SINGLE, csv.header());
        double[] f = csv.column("freq_hz");
        assertEquals(10, f[0], 0, "default low end");
        assertEquals(100e3 / 2, f[f.length - 1], 0, "default high end fsw/2");
        assertDense(f, 50);
        assertContinuous(csv.column("phase_deg"));
        List<String> wrote = run.out().lines().filter(l -> l.startsWith("wrote ")).toList();
        assertEquals(1, wrote.size(), run.out());
        assertTrue(wrote.get(0).startsWith("wrote " + file + ": control to output"), wrote.get(0));
    }

    @Test
    void freqOptionSetsTheRangeAndTheGridKeepsFiftyPointsPerDecade() throws Exception {
        Path file = dir.resolve("narrow.csv");
        CliRun run = CliRun.of("stage", StageFiles.BUS.toString(), "--iout", "2", "--bode", file.toString(),
                "--freq", "100Hz..2.5k");
        assertEquals(0, run.exitCode(), run.err());
        double[] f = Csv.read(file).column("freq_hz");
        assertEquals(100, f[0], 0);
        assertEquals(2500, f[f.length - 1], 0);
        assertDense(f, 50);
        // log10(25) decades at 50 per decade, plus the points the grid adds around the Q ≈ 6 double pole
        assertTrue(f.length >= Math.ceil(50 * Math.log10(25)) + 1, "points: " + f.length);
    }

    /**
     * Lossless voltage-mode CCM, 48 V in, N = 2, 12 V / 2 A, Lm = 200 µH, C = 470 µF, ramp 1.5 V.
     * Erickson & Maksimović, Fundamentals of Power Electronics, 2nd ed., 2001, table 8.2 (buck-boost,
     * here with the transformer referred: Vg' = Vin/N = 24 V, Ls = Lm/N² = 50 µH, R = 6 Ω):
     * D = V/(V + Vg') = 1/3, and the DC duty-to-output gain is Vg'/D'² (the averaged inductor
     * equation at DC, 0 = D·v̂g + D'·v̂ + (Vg' + V)·d̂ with v̂g = 0, gives v̂/d̂ = (Vg' + V)/D' = Vg'/D'²)
     * = 54, so Gvc(0) = 54/1.5 = 36 → 31.126 dB. The double pole at f0 = D'/(2π√(Ls·C)) = 692 Hz
     * lowers |Gvc(10 Hz)| by (10/692)² ≈ 2e-4 (0.002 dB), so 0.01 dB separates right from wrong.
     * The magnitude peaks at f0·√(1 − 1/(2Q²)) ≈ f0 for Q = D'·R·√(C/Ls) = 12.3.
     */
    @Test
    void losslessCcmMatchesTheCanonicalModelClosedForms() throws Exception {
        Path file = dir.resolve("lossless.csv");
        CliRun run = CliRun.of("stage", StageFiles.BUS_LOSSLESS.toString(), "--iout", "2", "--bode", file.toString(),
                "--model", "averaged");
        assertEquals(0, run.exitCode(), run.err());
        Csv csv = Csv.read(file);
        assertEquals(SINGLE, csv.header());
        double dPrime = 2.0 / 3;
        double gvc0 = 24 / (dPrime * dPrime) / 1.5;
        assertEquals(20 * Math.log10(gvc0), csv.rows().get(0)[1], 0.01, "DC gain, E&M table 8.2");
        double f0 = dPrime / (2 * Math.PI * Math.sqrt(50e-6 * 470e-6));
        double[] mag = csv.column("mag_db");
        int peak = 0;
        for (int i = 1; i < mag.length; i++) {
            peak = mag[i] > mag[peak] ? i : peak;
        }
        assertEquals(f0, csv.rows().get(peak)[0], 0.01 * f0, "resonance at D'/(2π√(Ls·C))");
    }

    /**
     * The two models of a voltage-mode CCM point agree within 0.1 dB and 0.5° up to fsw/2: the
     * tolerance the small-signal module holds them to (AnalyticVersusAveragedTest, the analytic
     * model against the numerical linearization of the averaged switch model).
     */
    @Test
    void bothModelsSideBySideWithTheirDifference() throws Exception {
        Path file = dir.resolve("both.csv");
        CliRun run = CliRun.of("stage", StageFiles.BUS.toString(), "--iout", "2", "--bode", file.toString(),
                "--model", "both");
        assertEquals(0, run.exitCode(), run.err());
        assertEquals("", run.err(), "no sampling note in voltage mode");
        Csv csv = Csv.read(file);
        assertEquals(BOTH, csv.header());
        assertEquals(50e3, csv.column("freq_hz")[csv.rows().size() - 1], 0);
        assertDiffColumns(csv);
        double worstDb = csv.rows().stream().mapToDouble(r -> Math.abs(r[5])).max().orElseThrow();
        double worstDeg = csv.rows().stream().mapToDouble(r -> Math.abs(r[6])).max().orElseThrow();
        System.out.printf("stage --bode --model both, voltage-mode CCM: worst %.3g dB, %.3g° to fsw/2%n", worstDb,
                worstDeg);
        for (double[] r : csv.rows()) {
            assertTrue(Math.abs(r[5]) < 0.1, "dB difference at " + r[0] + " Hz: " + r[5]);
            assertTrue(Math.abs(r[6]) < 0.5, "phase difference at " + r[0] + " Hz: " + r[6]);
        }
        assertContinuous(csv.column("analytic_phase_deg"));
        assertContinuous(csv.column("averaged_phase_deg"));
    }

    /** Line, duty and output impedance go to the averaged model's matching channels, with their signs. */
    @Test
    void everyQuantityAgreesBetweenTheModelsInVoltageModeCcm() throws Exception {
        for (String q : List.of("duty", "line", "zout")) {
            Path file = dir.resolve(q + ".csv");
            CliRun run = CliRun.of("stage", StageFiles.BUS.toString(), "--iout", "2", "--bode", file.toString(),
                    "--model", "both", "--quantity", q, "--freq", "10..10k");
            assertEquals(0, run.exitCode(), run.err());
            Csv csv = Csv.read(file);
            assertDiffColumns(csv);
            for (double[] r : csv.rows()) {
                assertTrue(Math.abs(r[5]) < 0.1 && Math.abs(r[6]) < 0.5, q + " at " + r[0] + " Hz: " + r[5] + " dB, "
                        + r[6] + "°");
            }
        }
    }

    /**
     * Current mode: the analytic model carries Ridley's sampling double pole at fsw/2, the averaged
     * model does not; a note on stderr says so, and the difference column shows it. Below fsw/10 they
     * agree within the 1 dB / 5° of the small-signal module's comparison. The phase runs past −180°
     * (output pole, sampling pair, ESR zero, RHP zero: −270° in the end), so it is never wrapped.
     */
    @Test
    void currentModeShowsTheSamplingEffectAndANote() throws Exception {
        Path file = dir.resolve("cm.csv");
        CliRun run = CliRun.of("stage", StageFiles.CHARGER.toString(), "--vin", "90", "--iout", "2",
                "--bode", file.toString(), "--model", "both", "--freq", "10..1meg");
        assertEquals(0, run.exitCode(), run.err());
        assertEquals(1, run.errLines().length, run.err());
        assertTrue(run.err().startsWith("flyloop: note: current mode: the averaged model has no current-loop sampling"
                + " effect"), run.err());
        Csv csv = Csv.read(file);
        assertDiffColumns(csv);
        double fsw = 65e3;
        double worstBelow = 0;
        double worstNearHalf = 0;
        for (double[] r : csv.rows()) {
            if (r[0] <= fsw / 10) {
                worstBelow = Math.max(worstBelow, Math.abs(r[6]));
                assertTrue(Math.abs(r[5]) < 1, "dB difference at " + r[0]);
            } else if (r[0] <= fsw / 2) {
                worstNearHalf = Math.max(worstNearHalf, Math.abs(r[6]));
            }
        }
        System.out.printf("stage --bode --model both, current-mode CCM: %.3g° below fsw/10, %.3g° up to fsw/2%n",
                worstBelow, worstNearHalf);
        assertTrue(worstBelow < 5, "phase difference below fsw/10: " + worstBelow);
        assertTrue(worstNearHalf > 20, "the sampling pair shows near fsw/2: " + worstNearHalf);
        double[] phase = csv.column("analytic_phase_deg");
        assertContinuous(phase);
        assertContinuous(csv.column("averaged_phase_deg"));
        assertTrue(phase[phase.length - 1] < -200, "phase beyond -180°: " + phase[phase.length - 1]);
    }

    private static void assertDiffColumns(Csv csv) {
        for (double[] r : csv.rows()) {
            // each column is written to 10 significant digits, so the written difference may differ
            // from the difference of the written values by a unit in that digit
            assertEquals(r[1] - r[3], r[5], 1e-8 * (1 + Math.abs(r[1]) + Math.abs(r[3])), "dB difference");
            assertEquals(r[2] - r[4], r[6], 1e-8 * (1 + Math.abs(r[2]) + Math.abs(r[4])), "phase difference");
        }
    }

    /** Ascending, and no gap wider than one step of a {@code perDecade} logarithmic grid. */
    static void assertDense(double[] f, int perDecade) {
        double widest = Math.pow(10, 1.0 / perDecade) * (1 + 1e-9);
        for (int i = 1; i < f.length; i++) {
            assertTrue(f[i] > f[i - 1], "ascending at " + i);
            assertTrue(f[i] / f[i - 1] <= widest, "gap " + f[i - 1] + " to " + f[i] + " Hz");
        }
    }

    /**
     * No jump between neighbouring samples that a wrap into ±180° would leave: on these grids the
     * phase moves at most a few tens of degrees per sample even across the Q ≈ 6 double pole.
     */
    static void assertContinuous(double[] phaseDeg) {
        for (int i = 1; i < phaseDeg.length; i++) {
            assertTrue(Math.abs(phaseDeg[i] - phaseDeg[i - 1]) < 90,
                    "phase jumps from " + phaseDeg[i - 1] + " to " + phaseDeg[i] + " at sample " + i);
        }
    }
}
