package org.flyloop.cli.command;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.Iterator;
import java.util.Set;
import org.flyloop.cli.CliRun;
import org.flyloop.cli.ExitCodes;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code flyloop check}: exit codes, failing corners, {@code --set} before/after, JSON shape. */
class CheckCommandTest {

    static final Path SPECS = Path.of("src", "test", "resources", "check");
    static final String TUNED = SPECS.resolve("wide-line-tuned.yaml").toString();
    static final String TOLERANCED = SPECS.resolve("wide-line-tolerances.yaml").toString();
    static final String RECHECK = Path.of("..", "examples", "telecom-5v-recheck.yaml").toString();
    static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path dir;

    private static Set<String> keys(JsonNode n) {
        Set<String> out = new HashSet<>();
        Iterator<String> it = n.fieldNames();
        it.forEachRemaining(out::add);
        return out;
    }

    @Test
    void aLoopTunedAtNominalFailsAtLowLineFullLoadAndSaysWhere() {
        CliRun run = CliRun.of("check", TUNED);
        assertEquals(ExitCodes.TARGETS_NOT_MET, run.exitCode(), run.err());
        String result = run.out().substring(run.out().indexOf("Result:"));
        assertTrue(result.contains("at vin=18 V, iout=4 A: closed loop unstable"), result);
        assertFalse(result.contains("vin=48 V, iout=3 A"), "the nominal point meets its targets: " + result);
        assertTrue(run.out().lines().anyMatch(l -> l.matches("\\s+48\\s+3\\s+CCM.*ok")), run.out());
    }

    @Test
    void aPassingCheckExitsZero() {
        CliRun run = CliRun.of("check", TOLERANCED, "--set", "targets.phase_margin=25");
        assertEquals(ExitCodes.OK, run.exitCode(), run.out() + run.err());
        assertTrue(run.out().contains("Result: every target met at every corner and in the tolerance worst case."));
    }

    @Test
    void theToleranceWorstCaseCanFailAlone() {
        CliRun run = CliRun.of("check", TOLERANCED, "--json");
        assertEquals(ExitCodes.TARGETS_NOT_MET, run.exitCode());
        JsonNode root = read(run.out());
        for (JsonNode p : root.get("points")) {
            assertTrue(p.get("targets_met").asBoolean(), "every corner meets its targets with nominal parts");
        }
        JsonNode w = root.get("worst_case");
        assertFalse(w.get("targets_met").asBoolean());
        assertTrue(w.get("phase_margin").get("deg").asDouble() < 40);
        assertEquals(18, w.get("phase_margin").get("at").get("vin").asDouble());
        assertEquals(-0.5, w.get("phase_margin").get("deviations").get("stage.esr").asDouble(), 1e-12);
        assertFalse(root.get("targets_met").asBoolean());
    }

    @Test
    void settingAValueTheSpecAlreadyHasChangesNothing() {
        CliRun plain = CliRun.of("check", TOLERANCED, "--json");
        CliRun same = CliRun.of("check", TOLERANCED, "--json", "--set", "stage.cout=2200u",
                "--set", "feedback.parts.r_zero=2k");
        assertEquals(plain.exitCode(), same.exitCode());
        ObjectNode after = (ObjectNode) read(same.out());
        JsonNode before = after.remove("before");
        assertEquals(read(plain.out()), after);
        assertEquals(after, before);
        CliRun text = CliRun.of("check", TOLERANCED, "--set", "stage.cout=2200u");
        assertTrue(text.out().lines().noneMatch(l -> l.contains("→") && l.matches(".*\\d !.*")),
                "nothing crossed a target:\n" + text.out());
    }

    @Test
    void aChangeThatCrossesATargetIsMarked() {
        CliRun run = CliRun.of("check", TOLERANCED, "--set", "stage.cout=4700u");
        assertEquals(ExitCodes.TARGETS_NOT_MET, run.exitCode());
        assertTrue(run.out().contains("Changed with --set: stage.cout=4700u"));
        String row = run.out().lines().filter(l -> l.matches("\\s+18\\s+4\\s+CCM.*")).findFirst().orElseThrow();
        // 46.8° before, below the 40° target after: marked; the gain margin stays clear of 6 dB: not marked
        assertTrue(row.matches(".*46\\.8 → 3\\d\\.\\d ! .*ok → MISS"), row);
        JsonNode root = read(CliRun.of("check", TOLERANCED, "--json", "--set", "stage.cout=4700u").out());
        assertTrue(root.get("before").get("points").get(2).get("targets_met").asBoolean());
        assertFalse(root.get("points").get(2).get("targets_met").asBoolean());
    }

    @Test
    void anUnknownSetPathIsBadInputWithASuggestion() {
        CliRun run = CliRun.of("check", TOLERANCED, "--set", "stage.cuot=470u");
        assertEquals(ExitCodes.BAD_INPUT, run.exitCode());
        assertEquals("", run.out());
        assertTrue(run.err().contains("--set stage.cuot: unknown key; did you mean stage.cout?"), run.err());
    }

    @Test
    void missingPartsAreBadInputNamingFeedbackParts() throws IOException {
        Path spec = dir.resolve("incomplete.yaml");
        Files.writeString(spec, Files.readString(Path.of(TUNED)).replace("    c_ff: 1n\n", ""));
        CliRun run = CliRun.of("check", spec.toString());
        assertEquals(ExitCodes.BAD_INPUT, run.exitCode());
        assertTrue(run.err().contains("feedback.parts: opamp-type3 needs part c_ff"), run.err());
        Path none = dir.resolve("none.yaml");
        Files.writeString(none, Files.readString(Path.of(TUNED)).replaceAll("(?s)  parts:.*?targets:", "targets:"));
        CliRun empty = CliRun.of("check", none.toString());
        assertEquals(ExitCodes.BAD_INPUT, empty.exitCode());
        assertTrue(empty.err().contains("feedback.parts: no parts given"), empty.err());
    }

    @Test
    void theJsonHasTheDesignShapePlusTheCheck() {
        CliRun run = CliRun.of("check", TOLERANCED, "--json", "--monte-carlo", "400", "--seed", "5",
                "--set", "targets.phase_margin=25");
        assertEquals(ExitCodes.OK, run.exitCode(), run.err());
        JsonNode root = read(run.out());
        assertEquals(Set.of("network", "parts", "ideal_parts", "crossover_target_hz", "limits", "points", "worst",
                "targets", "targets_met", "warnings", "rules_of_thumb", "worst_case", "monte_carlo", "before"),
                keys(root));
        assertEquals("given", root.get("network").get("placement").asText());
        assertEquals(keys(root.get("parts")), keys(root.get("ideal_parts")));
        assertEquals(DesignCommandTest.POINT_KEYS, keys(root.get("points").get(0)));
        JsonNode mc = root.get("monte_carlo");
        assertEquals(400, mc.get("n").asInt());
        assertEquals(5, mc.get("seed").asLong());
        for (String k : new String[] {"pm_p01", "pm_p50", "pm_p99", "gm_p01", "fraction_failing"}) {
            assertTrue(mc.get(k).isNumber(), k);
        }
        assertEquals(root.get("points").size(), mc.get("corners").size());
        assertTrue(mc.get("corners").get(0).get("pm_p50").isNumber());
        assertFalse(root.get("before").has("monte_carlo"), "Monte Carlo runs on the changed spec only");
    }

    @Test
    void theSeedMakesMonteCarloRepeatable() {
        JsonNode a = read(CliRun.of("check", TOLERANCED, "--json", "--monte-carlo", "200", "--seed", "9").out());
        JsonNode b = read(CliRun.of("check", TOLERANCED, "--json", "--monte-carlo", "200", "--seed", "9").out());
        JsonNode c = read(CliRun.of("check", TOLERANCED, "--json", "--monte-carlo", "200", "--seed", "10").out());
        assertEquals(a.get("monte_carlo"), b.get("monte_carlo"));
        assertNotEquals(a.get("monte_carlo"), c.get("monte_carlo"));
    }

    @Test
    void monteCarloNeedsSomethingToSample() {
        CliRun run = CliRun.of("check", TUNED, "--monte-carlo", "100");
        assertEquals(ExitCodes.BAD_INPUT, run.exitCode());
        assertTrue(run.err().startsWith("flyloop: --monte-carlo: nothing to sample"), run.err());
        CliRun zero = CliRun.of("check", TOLERANCED, "--monte-carlo", "0");
        assertEquals(ExitCodes.BAD_INPUT, zero.exitCode());
    }

    @Test
    void shuntOptoCornersIncludeTheBoundaryAndBothCtrExtremes() {
        CliRun run = CliRun.of("check", RECHECK, "--json");
        assertEquals(ExitCodes.OK, run.exitCode(), run.err());
        JsonNode points = read(run.out()).get("points");
        // 3 vin × (0.3 A, 0.98× and 1.02× boundary, 3 A) × 2 CTR
        assertEquals(24, points.size());
        long boundary = 0;
        for (JsonNode p : points) {
            assertTrue(p.has("ctr"));
            boundary += p.has("boundary_factor") ? 1 : 0;
        }
        assertEquals(12, boundary);
    }

    @Test
    void robustDesignKeepsTheDesignShape() {
        CliRun run = CliRun.of("design", TOLERANCED, "--robust", "--json");
        assertTrue(run.exitCode() == ExitCodes.OK || run.exitCode() == ExitCodes.TARGETS_NOT_MET, run.err());
        JsonNode root = read(run.out());
        assertTrue(root.has("parts") && root.has("points"));
        assertTrue(Set.of("robust", "k-factor", "poles-zeros").contains(root.get("network").get("placement").asText()));
    }

    private static JsonNode read(String json) {
        try {
            return JSON.readTree(json);
        } catch (IOException e) {
            throw new AssertionError("not JSON: " + json, e);
        }
    }
}
