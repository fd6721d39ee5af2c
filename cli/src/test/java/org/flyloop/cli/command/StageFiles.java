package org.flyloop.cli.command;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/** Test fixtures for the stage command's file outputs: the test specs and a CSV reader. */
final class StageFiles {

    /** 48 V → 12 V voltage mode, lossy parts; one vin, iout 0.2 A (DCM) and 2 A (CCM). */
    static final Path BUS = Path.of("src", "test", "resources", "stage", "bus-voltage-mode.yaml");
    /** The same stage with ideal parts, for the textbook closed forms. */
    static final Path BUS_LOSSLESS = Path.of("src", "test", "resources", "stage", "bus-voltage-mode-lossless.yaml");
    /** Universal-input charger, current mode: CCM at 90 V / 2 A, DCM elsewhere. */
    static final Path CHARGER = Path.of("..", "examples", "charger-universal.yaml");
    /** Telecom 36–75 V → 5 V, current mode with no added slope. */
    static final Path TELECOM = Path.of("..", "examples", "telecom-5v.yaml");

    private StageFiles() {
    }

    /**
     * A CSV file: its header cells and its numeric rows (a text cell, such as the transient's
     * mode column, reads as NaN).
     */
    record Csv(List<String> header, List<double[]> rows) {

        static Csv read(Path file) throws IOException {
            assertTrue(Files.exists(file), file + " was not written");
            List<String> lines = Files.readAllLines(file);
            List<String> header = Arrays.asList(lines.get(0).split(",", -1));
            List<double[]> rows = new ArrayList<>();
            for (String line : lines.subList(1, lines.size())) {
                String[] cells = line.split(",", -1);
                assertTrue(cells.length == header.size(), "row width: " + line);
                double[] row = new double[cells.length];
                for (int i = 0; i < cells.length; i++) {
                    row[i] = parse(cells[i]);
                }
                rows.add(row);
            }
            return new Csv(header, rows);
        }

        /** Column {@code name} as an array. */
        double[] column(String name) {
            int k = header.indexOf(name);
            assertTrue(k >= 0, "no column " + name + " in " + header);
            return rows.stream().mapToDouble(r -> r[k]).toArray();
        }

        private static double parse(String cell) {
            try {
                return Double.parseDouble(cell);
            } catch (NumberFormatException e) {
                return Double.NaN;
            }
        }
    }
}
