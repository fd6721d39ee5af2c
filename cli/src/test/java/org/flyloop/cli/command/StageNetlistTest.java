package org.flyloop.cli.command;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.apache.commons.math3.complex.Complex;
import org.flyloop.cli.CliRun;
import org.flyloop.cli.command.StageFiles.Csv;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code flyloop stage --netlist}: ngspice runs the written file unchanged and its AC analysis
 * (its own DC Newton solution and analytic derivatives of the behavioural sources) agrees with the
 * averaged model's Bode file from the same command line. Without ngspice on PATH the test is
 * skipped, unless the environment variable CI is "true", where it fails.
 */
class StageNetlistTest {

    @TempDir
    Path dir;

    /**
     * Voltage mode, 48 V, 2 A (CCM): the AC source drives the duty node, so ngspice's v(out) is
     * v̂o/d̂, the "duty" quantity. Both sweep 10 Hz to 10 kHz at 50 points per decade, so every
     * ngspice frequency is also on the Bode grid. Tolerance 0.1 dB / 0.5°, as the small-signal
     * module's own ngspice cross-check (NgspiceCrossCheckTest).
     */
    @Test
    void ngspiceRunsTheNetlistAndAgreesWithTheAveragedBode() throws Exception {
        Path netlist = dir.resolve("bus ccm.cir");
        Path bode = dir.resolve("duty.csv");
        CliRun run = CliRun.of("stage", StageFiles.BUS.toString(), "--iout", "2", "--netlist", netlist.toString(),
                "--bode", bode.toString(), "--model", "averaged", "--quantity", "duty", "--freq", "10..10k", "--quiet");
        assertEquals(0, run.exitCode(), run.err());
        assertTrue(run.out().contains("wrote " + netlist + ": averaged model at vin 48 V, iout 2 A (CCM)"), run.out());
        assertTrue(run.out().contains("ngspice -b writes bus_ccm_op.txt and bus_ccm_ac.txt"), run.out());

        String log = ngspice(netlist);
        List<double[]> op = rows(dir.resolve("bus_ccm_op.txt"), log);
        assertEquals(12, op.get(0)[1], 12e-6, "ngspice's DC output voltage is the regulated 12 V");
        List<double[]> ac = rows(dir.resolve("bus_ccm_ac.txt"), log);
        assertEquals(151, ac.size(), "3 decades at 50 per decade");

        Csv csv = Csv.read(bode);
        Map<Long, double[]> byFrequency = new HashMap<>();
        for (double[] r : csv.rows()) {
            byFrequency.put(key(r[0]), r);
        }
        double worstDb = 0;
        double worstDeg = 0;
        for (double[] row : ac) {
            double[] ours = byFrequency.get(key(row[0]));
            assertTrue(ours != null, "no Bode sample at " + row[0] + " Hz");
            Complex spice = new Complex(row[1], row[2]);
            worstDb = Math.max(worstDb, Math.abs(20 * Math.log10(spice.abs()) - ours[1]));
            double deg = Math.toDegrees(spice.getArgument()) - ours[2];
            deg -= 360 * Math.rint(deg / 360);
            worstDeg = Math.max(worstDeg, Math.abs(deg));
        }
        System.out.printf("stage --netlist vs --bode averaged (ngspice): worst %.3g dB, %.3g°%n", worstDb, worstDeg);
        assertTrue(worstDb < 0.1, "worst magnitude difference " + worstDb + " dB");
        assertTrue(worstDeg < 0.5, "worst phase difference " + worstDeg + "°");
    }

    /** Current mode: the AC source sits on the comparator voltage, and ngspice still runs the file as written. */
    @Test
    void currentModeNetlistRunsToo() throws Exception {
        Path netlist = dir.resolve("charger.cir");
        CliRun run = CliRun.of("stage", StageFiles.CHARGER.toString(), "--vin", "375", "--iout", "2", "--netlist",
                netlist.toString(), "--quiet");
        assertEquals(0, run.exitCode(), run.err());
        assertTrue(Files.readString(netlist).contains("Vvc nvc 0 DC "), "AC source on the comparator voltage");
        String log = ngspice(netlist);
        assertTrue(rows(dir.resolve("charger_ac.txt"), log).size() > 100, "AC data written");
    }

    /** Frequencies on a 50-per-decade grid, rounded to a key that ignores the last few bits. */
    private static long key(double hz) {
        return Math.round(Math.log10(hz) * 50 * 1000);
    }

    /** Runs {@code ngspice -b} in the netlist's directory; returns the log after checking exit status 0. */
    private static String ngspice(Path netlist) throws Exception {
        Path log = netlist.resolveSibling(netlist.getFileName() + ".log");
        Process p = new ProcessBuilder(executable().toString(), "-b", netlist.getFileName().toString())
                .directory(netlist.getParent().toFile()).redirectErrorStream(true).redirectOutput(log.toFile()).start();
        if (!p.waitFor(300, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            fail("ngspice did not finish");
        }
        String text = Files.readString(log);
        assertEquals(0, p.exitValue(), "ngspice exit status; log:\n" + text);
        return text;
    }

    private static Path executable() {
        String path = System.getenv("PATH");
        if (path != null) {
            for (String d : path.split(File.pathSeparator)) {
                Path p = Path.of(d, "ngspice");
                if (Files.isExecutable(p)) {
                    return p;
                }
            }
        }
        String message = "ngspice is not on PATH; install it (Debian/Ubuntu: apt-get install ngspice)";
        if ("true".equalsIgnoreCase(System.getenv("CI"))) {
            fail(message + " (required when CI=true)");
        }
        Assumptions.abort(message);
        return null;
    }

    /** The rows of a wrdata table, header dropped. */
    private static List<double[]> rows(Path file, String log) throws Exception {
        assertTrue(Files.exists(file), "ngspice wrote no " + file.getFileName() + "; log:\n" + log);
        List<String> lines = Files.readAllLines(file);
        List<double[]> out = new ArrayList<>();
        for (String line : lines.subList(1, lines.size())) {
            String t = line.trim();
            if (!t.isEmpty()) {
                String[] parts = t.split("\\s+");
                double[] row = new double[parts.length];
                for (int i = 0; i < parts.length; i++) {
                    row[i] = Double.parseDouble(parts[i]);
                }
                out.add(row);
            }
        }
        return out;
    }
}
