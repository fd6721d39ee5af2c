package org.flyloop.cli.command;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import org.flyloop.cli.CliRun;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The small-signal summary per point: JSON keys and values, and the table section. */
class StageModelSummaryTest {

    private static final ObjectMapper JSON = new ObjectMapper();
    private static final List<String> ADDED = List.of("poles", "zeros", "f_rhpz_hz", "qp", "slope_for_qp1", "warnings");

    @TempDir
    Path dir;

    @Test
    void everyPointCarriesPolesZerosAndTheModeDependentKeys() throws Exception {
        for (Path spec : List.of(StageFiles.BUS, StageFiles.CHARGER, StageFiles.TELECOM)) {
            CliRun run = CliRun.of("stage", spec.toString(), "--json");
            assertEquals(0, run.exitCode(), run.err());
            JsonNode root = JSON.readTree(run.out());
            assertEquals(Set.of("points"), Set.copyOf(fieldNames(root)), "no files key without files");
            boolean current = spec != StageFiles.BUS;
            for (JsonNode p : root.get("points")) {
                for (String key : StageCommandTest.REQUIRED_KEYS) {
                    assertTrue(p.has(key), key + " kept");
                }
                for (String key : ADDED) {
                    assertTrue(p.has(key), key + " added");
                }
                assertTrue(p.get("poles").size() >= 1, "a stage has at least its output pole: " + p);
                for (JsonNode pz : List.of(p.get("poles"), p.get("zeros"))) {
                    for (JsonNode e : pz) {
                        assertEquals(Set.of("hz", "q", "order", "label", "rhp"), Set.copyOf(fieldNames(e)));
                        assertTrue(e.get("hz").asDouble() > 0 && e.get("rhp").isBoolean() && e.get("label").isTextual());
                    }
                }
                boolean dcm = p.get("mode").asText().equals("DCM");
                assertEquals(dcm, p.get("f_rhpz_hz").isNull(), "f_rhpz_hz null exactly in DCM: " + p);
                boolean ccmCurrent = current && !dcm;
                assertEquals(!ccmCurrent, p.get("qp").isNull(), "qp only in current-mode CCM: " + p);
                assertEquals(!ccmCurrent, p.get("slope_for_qp1").isNull(), "slope only in current-mode CCM: " + p);
                assertTrue(p.get("warnings").isArray());
                if (!dcm) {
                    double rhpz = p.get("f_rhpz_hz").asDouble();
                    assertTrue(hasRhpZeroAt(p.get("zeros"), rhpz), "the RHP zero is also among the zeros: " + p);
                }
            }
        }
    }

    /**
     * Lossless voltage-mode CCM at 48 V, 2 A (numbers as in StageBodeTest): Erickson &amp;
     * Maksimović, Fundamentals of Power Electronics, 2nd ed., 2001, table 8.2 (buck-boost,
     * transformer referred): f0 = D'/(2π√(Ls·C)) = 692.0 Hz, Q = D'·R·√(C/Ls) = 12.26,
     * RHP zero ωz = D'²·R/(D·Ls) → 25.46 kHz; with D = 1/3, D' = 2/3, R = 6 Ω, Ls = 50 µH, C = 470 µF.
     */
    @Test
    void losslessCcmPolesAndRhpZeroFollowTheCanonicalModel() throws Exception {
        JsonNode p = JSON.readTree(CliRun.of("stage", StageFiles.BUS_LOSSLESS.toString(), "--iout", "2", "--json")
                .out()).get("points").get(0);
        double d = 1.0 / 3;
        double dp = 2.0 / 3;
        double ls = 50e-6;
        double c = 470e-6;
        double r = 6;
        JsonNode pair = p.get("poles").get(0);
        assertEquals(2, pair.get("order").asInt());
        assertEquals(dp / (2 * Math.PI * Math.sqrt(ls * c)), pair.get("hz").asDouble(), 0.005 * 692, "f0");
        assertEquals(dp * r * Math.sqrt(c / ls), pair.get("q").asDouble(), 0.01 * 12.26, "Q");
        double rhpz = dp * dp * r / (d * ls) / (2 * Math.PI);
        assertEquals(rhpz, p.get("f_rhpz_hz").asDouble(), 0.005 * rhpz, "RHP zero");
        assertTrue(p.get("qp").isNull());
    }

    /**
     * Peak current mode without added slope (telecom example): Ridley, "A new, continuous-time
     * model for current-mode control", IEEE Trans. Power Electronics 6(2), 1991:
     * Qp = 1/(π·(mc·D' − 0.5)) with mc = 1 + Se/Sn = 1 when Se = 0, whatever Sn is; so Qp follows
     * from the duty cycle alone.
     */
    @Test
    void currentModeQpFollowsRidleyWithoutSlope() throws Exception {
        JsonNode points = JSON.readTree(CliRun.of("stage", StageFiles.TELECOM.toString(), "--json", "--set", "control.slope=0").out())
                .get("points");
        int checked = 0;
        for (JsonNode p : points) {
            if (p.get("mode").asText().equals("CCM")) {
                double dPrime = 1 - p.get("duty").asDouble();
                assertEquals(1 / (Math.PI * (dPrime - 0.5)), p.get("qp").asDouble(), 1e-9, "Qp at " + p.get("vin"));
                assertTrue(p.get("slope_for_qp1").asDouble() > 0, "Qp > 1 needs slope: " + p);
                checked++;
            }
        }
        assertEquals(3, checked, "three CCM corners at 3 A");
        // Qp = 2.55 > 2 at 36 V: the model warns, and the table repeats the warning
        JsonNode lowLine = points.get(1);
        assertEquals(36, lowLine.get("vin").asDouble(), 0);
        assertEquals(1, lowLine.get("warnings").size(), lowLine.toString());
        String table = CliRun.of("stage", StageFiles.TELECOM.toString(), "--set", "control.slope=0").out();
        assertTrue(table.contains("warning: vin 36 V, iout 3 A: subharmonic risk"), table);
    }

    @Test
    void tableHasOneSmallSignalRowPerPoint() {
        CliRun run = CliRun.of("stage", StageFiles.BUS.toString(), "--quiet");
        assertEquals(0, run.exitCode(), run.err());
        List<String> lines = run.out().lines().toList();
        int caption = lines.indexOf(lines.stream().filter(l -> l.startsWith("Control to output")).findFirst()
                .orElseThrow());
        assertEquals("", lines.get(caption - 1), "a blank line between the tables");
        assertTrue(lines.get(caption).contains("fsw/10 = 10kHz"), lines.get(caption));
        assertTrue(lines.get(caption + 1).startsWith("vin[V]  iout[A]  mode  poles[Hz]"), lines.get(caption + 1));
        String dcm = lines.get(caption + 2);
        String ccm = lines.get(caption + 3);
        assertTrue(dcm.contains("DCM") && dcm.contains(" rhp"), "the DCM RHP zero is marked among the zeros: " + dcm);
        assertTrue(ccm.contains("CCM") && ccm.contains(" Q") && !ccm.contains(" rhp"),
                "the CCM RHP zero has its own column: " + ccm);
        assertEquals(caption + 4, lines.size(), run.out());
        assertFalse(run.out().contains("wrote "));
    }

    @Test
    void jsonListsTheFilesWritten() throws Exception {
        Path file = dir.resolve("g.csv");
        CliRun run = CliRun.of("stage", StageFiles.BUS.toString(), "--iout", "2", "--json", "--bode", file.toString());
        assertEquals(0, run.exitCode(), run.err());
        JsonNode files = JSON.readTree(run.out()).get("files");
        assertEquals(1, files.size());
        assertEquals(file.toString(), files.get(0).get("path").asText());
        assertEquals("bode", files.get(0).get("kind").asText());
    }

    private static boolean hasRhpZeroAt(JsonNode zeros, double hz) {
        for (JsonNode z : zeros) {
            if (z.get("rhp").asBoolean() && z.get("hz").asDouble() == hz) {
                return true;
            }
        }
        return false;
    }

    private static List<String> fieldNames(JsonNode node) {
        List<String> out = new java.util.ArrayList<>();
        node.fieldNames().forEachRemaining(out::add);
        return out;
    }
}
