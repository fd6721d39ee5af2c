package org.flyloop.averaged;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.File;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Assumptions;

/**
 * Runs ngspice in batch mode on a netlist written by {@link SpiceNetlistWriter} and reads the
 * {@code wrdata} tables it leaves behind. Without ngspice on PATH the calling test fails when the
 * environment variable CI is "true" and is skipped (with a message) otherwise.
 */
final class Ngspice {

    private Ngspice() {
    }

    /** The ngspice executable on PATH, after the CI / local policy for a missing one. */
    static Path executable() {
        String path = System.getenv("PATH");
        if (path != null) {
            for (String dir : path.split(File.pathSeparator)) {
                Path p = Path.of(dir, "ngspice");
                if (Files.isExecutable(p)) {
                    return p;
                }
            }
        }
        String message = "ngspice is not on PATH; install it (Debian/Ubuntu: apt-get install ngspice) to run the"
                + " SPICE cross-checks";
        if ("true".equalsIgnoreCase(System.getenv("CI"))) {
            fail(message + " (required when CI=true)");
        }
        Assumptions.abort(message);
        return null;
    }

    /**
     * Runs {@code ngspice -b} on {@code netlist} in {@code dir}; returns the rows of
     * {@code <base>_op.txt} and {@code <base>_ac.txt} (header dropped).
     */
    static Result run(Path dir, String netlist, String base) throws IOException, InterruptedException {
        Path cir = dir.resolve(base + ".cir");
        Files.writeString(cir, netlist, StandardCharsets.UTF_8);
        Process p = new ProcessBuilder(executable().toString(), "-b", cir.getFileName().toString())
                .directory(dir.toFile()).redirectErrorStream(true)
                .redirectOutput(dir.resolve(base + ".log").toFile()).start();
        if (!p.waitFor(300, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            fail("ngspice did not finish on " + cir);
        }
        String log = Files.readString(dir.resolve(base + ".log"));
        assertEquals(0, p.exitValue(), "ngspice exit status; log:\n" + log);
        return new Result(rows(dir.resolve(base + "_op.txt"), log), rows(dir.resolve(base + "_ac.txt"), log));
    }

    private static List<double[]> rows(Path file, String log) throws IOException {
        if (!Files.exists(file)) {
            fail("ngspice wrote no " + file.getFileName() + "; log:\n" + log);
        }
        List<double[]> out = new ArrayList<>();
        List<String> lines = Files.readAllLines(file);
        for (String line : lines.subList(1, lines.size())) {
            String t = line.trim();
            if (t.isEmpty()) {
                continue;
            }
            String[] parts = t.split("\\s+");
            double[] row = new double[parts.length];
            for (int i = 0; i < parts.length; i++) {
                row[i] = Double.parseDouble(parts[i]);
            }
            out.add(row);
        }
        return out;
    }

    /**
     * @param op one row: the scale column, then v(out), i(vil), v(nd), v(nd2)
     * @param ac rows: frequency, Re/Im v(out), Re/Im i(vil)
     */
    record Result(List<double[]> op, List<double[]> ac) {
    }
}
