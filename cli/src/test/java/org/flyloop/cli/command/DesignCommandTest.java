package org.flyloop.cli.command;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import org.flyloop.cli.CliRun;
import org.flyloop.cli.ExitCodes;
import org.flyloop.cli.output.SafetyNotice;
import org.flyloop.cli.spec.SpecLoader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code flyloop design}: output shapes, exit codes, and {@code --set} through the command line. */
class DesignCommandTest {

    static final Path EXAMPLES = Path.of("..", "examples");
    static final String OPAMP = EXAMPLES.resolve("telecom-12v-opamp.yaml").toString();
    static final String OPTO = EXAMPLES.resolve("charger-universal.yaml").toString();
    static final ObjectMapper JSON = new ObjectMapper();

    /** The documented keys of a corner; {@code ctr} comes on top for optocoupler networks. */
    static final Set<String> POINT_KEYS = Set.of("vin", "iout", "mode", "crossover_hz", "phase_margin_deg",
            "gain_margin_db", "delay_margin_s", "peak_sensitivity", "stable", "targets_met", "misses",
            "gain_crossovers", "phase_crossovers");

    @TempDir
    Path dir;

    @Test
    void jsonHasTheDocumentedShapeAndTypes() throws IOException {
        CliRun run = CliRun.of("design", OPAMP, "--json");
        assertEquals(ExitCodes.OK, run.exitCode(), run.err());
        assertEquals("", run.err());
        JsonNode root = JSON.readTree(run.out());
        assertEquals(Set.of("network", "parts", "ideal_parts", "crossover_target_hz", "limits", "points", "worst",
                "targets", "targets_met", "warnings", "rules_of_thumb"), keys(root));

        JsonNode network = root.get("network");
        assertEquals("opamp", network.get("amplifier").asText());
        assertTrue(network.get("type").isInt());
        assertEquals("opamp-type3", network.get("kind").asText());
        assertTrue(Set.of("k-factor", "poles-zeros").contains(network.get("placement").asText()));

        for (String section : List.of("parts", "ideal_parts")) {
            assertEquals(Set.of("r_upper", "r_lower", "r_zero", "c_zero", "c_pole", "r_ff", "c_ff", "gbw"),
                    keys(root.get(section)), section);
            root.get(section).forEach(v -> assertTrue(v.isDouble() && v.doubleValue() > 0, section + ": " + v));
        }
        // Built parts are on their series, ideal ones almost never are: r_upper is 38 kΩ exactly
        // from r_lower = 10 kΩ and 12 V / 2.5 V, and E96 has no 38.0 (its neighbours are 37.4 and 38.3).
        assertEquals(10e3 * (12 - 2.5) / 2.5, root.get("ideal_parts").get("r_upper").doubleValue(), 1e-6);
        assertEquals(38.3e3, root.get("parts").get("r_upper").doubleValue(), 1e-6);

        assertTrue(root.get("crossover_target_hz").isDouble());
        assertTrue(root.get("limits").size() >= 2);
        for (JsonNode l : root.get("limits")) {
            assertEquals(Set.of("name", "hz", "basis"), keys(l));
            assertTrue(l.get("name").isTextual() && l.get("hz").isDouble() && l.get("basis").isTextual());
        }

        assertEquals(6, root.get("points").size(), "3 vin × 2 iout corners");
        for (JsonNode p : root.get("points")) {
            assertEquals(POINT_KEYS, keys(p), "no ctr without an optocoupler");
            assertTrue(p.get("vin").isDouble() && p.get("iout").isDouble() && p.get("mode").isTextual());
            assertTrue(p.get("crossover_hz").isDouble() && p.get("phase_margin_deg").isDouble());
            assertTrue(p.get("gain_margin_db").isDouble() || p.get("gain_margin_db").isNull());
            assertTrue(p.get("stable").isBoolean() && p.get("targets_met").isBoolean());
            assertTrue(p.get("misses").isArray() && p.get("gain_crossovers").isArray());
            for (JsonNode g : p.get("gain_crossovers")) {
                assertEquals(Set.of("hz", "pm_deg"), keys(g));
            }
            for (JsonNode g : p.get("phase_crossovers")) {
                assertEquals(Set.of("hz", "gm_db"), keys(g));
            }
            // The summary crossover is the highest gain crossover.
            JsonNode crossings = p.get("gain_crossovers");
            assertEquals(crossings.get(crossings.size() - 1).get("hz").doubleValue(), p.get("crossover_hz").doubleValue());
        }

        JsonNode worst = root.get("worst");
        assertEquals(Set.of("phase_margin_deg", "phase_margin_at", "gain_margin_db", "gain_margin_at"), keys(worst));
        assertEquals(Set.of("vin", "iout"), keys(worst.get("phase_margin_at")));
        double smallest = Double.POSITIVE_INFINITY;
        for (JsonNode p : root.get("points")) {
            smallest = Math.min(smallest, p.get("phase_margin_deg").doubleValue());
        }
        assertEquals(smallest, worst.get("phase_margin_deg").doubleValue());

        JsonNode targets = root.get("targets");
        assertEquals(Set.of("phase_margin_deg", "gain_margin_db", "crossover_hz"), keys(targets));
        assertEquals(50, targets.get("phase_margin_deg").doubleValue(), "as written in the example");
        assertTrue(targets.get("crossover_hz").isNull(), "auto crossover is null");
        assertTrue(root.get("targets_met").booleanValue());
        assertTrue(root.get("warnings").isArray());
        assertTrue(root.get("rules_of_thumb").size() > 0);
        root.get("rules_of_thumb").forEach(r -> assertTrue(r.asText().contains("common practice"), r.asText()));
    }

    @Test
    void optocouplerCornersCarryTheirCtr() throws IOException {
        JsonNode root = JSON.readTree(CliRun.of("design", OPTO, "--json").out());
        assertEquals("shunt-opto", root.get("network").get("amplifier").asText());
        var spec = SpecLoader.load(Path.of(OPTO));
        int operatingPoints = spec.stage().vin().corners().size() * spec.stage().iout().corners().size();
        assertEquals(2 * operatingPoints, root.get("points").size(), "each point at the lowest and highest CTR");
        Set<Double> ctrs = new TreeSet<>();
        for (JsonNode p : root.get("points")) {
            assertTrue(p.has("ctr"), p.toString());
            ctrs.add(p.get("ctr").doubleValue());
        }
        assertEquals(Set.of(spec.feedback().ctr().min(), spec.feedback().ctr().max()), ctrs);
        assertTrue(root.get("worst").get("phase_margin_at").has("ctr"));
    }

    @Test
    void textHasThePartsTableTheCornersAndTheCaution() throws IOException {
        CliRun run = CliRun.of("design", OPAMP);
        assertEquals(ExitCodes.OK, run.exitCode(), run.err());
        String out = run.out();
        String[] lines = out.split("\n");
        assertEquals(SpecLoader.load(Path.of(OPAMP)).displayTitle(), lines[0]);
        assertTrue(out.matches("(?s).*\npart +ideal +built +built/ideal\n.*"), out);
        JsonNode parts = JSON.readTree(CliRun.of("design", OPAMP, "--json").out()).get("parts");
        for (Map.Entry<String, JsonNode> e : (Iterable<Map.Entry<String, JsonNode>>) parts::fields) {
            assertTrue(out.matches("(?s).*\n" + e.getKey() + " +\\S+ \\S+ +\\S+ \\S+ +\\d\\.\\d{3}\n.*"),
                    "a row for " + e.getKey() + ":\n" + out);
        }
        assertTrue(out.contains("38.3 kΩ"), "built r_upper in engineering notation");
        assertTrue(out.contains("vin[V]  iout[A]  mode  fc[Hz]  PM[°]  GM[dB]"), out);
        assertTrue(out.contains("Load step, linear model:"), out);
        assertTrue(out.contains("Rules of thumb used:"), out);
        assertEquals(SafetyNotice.ONE_LINE, lines[lines.length - 1]);
        assertFalse(out.contains("\u001B"), "no colour outside a terminal");
    }

    @Test
    void quietDropsTitleRulesAndCaution() {
        CliRun run = CliRun.of("design", OPAMP, "--quiet");
        assertEquals(ExitCodes.OK, run.exitCode(), run.err());
        assertTrue(run.out().startsWith("Network: "), run.out());
        assertFalse(run.out().contains("Caution"));
        assertFalse(run.out().contains("Rules of thumb"));
        assertTrue(run.out().contains("built/ideal"));
    }

    /**
     * A spec tuned to miss: 89° of phase margin with the crossover fixed at 3 kHz. Above the
     * double pole a voltage-mode CCM stage lags by nearly 180° and its RHP zero adds more, while
     * the designer caps a type 3 network's boost at 160°, so the margin stays well short of 89°
     * at every corner. The report is printed in full, then exit 3.
     */
    @Test
    void missedTargetGivesExitThreeAfterTheFullReport() throws IOException {
        CliRun text = CliRun.of("design", OPAMP, "--set", "targets.phase_margin=89", "--set", "targets.crossover=3k");
        assertEquals(ExitCodes.TARGETS_NOT_MET, text.exitCode(), text.err());
        assertEquals("", text.err());
        assertTrue(text.out().contains("MISS"), text.out());
        assertTrue(text.out().contains("Result: targets missed at"), text.out());
        assertTrue(text.out().contains(SafetyNotice.ONE_LINE));

        CliRun json = CliRun.of("design", OPAMP, "--json", "--set", "targets.phase_margin=89",
                "--set", "targets.crossover=3k");
        assertEquals(ExitCodes.TARGETS_NOT_MET, json.exitCode());
        JsonNode root = JSON.readTree(json.out());
        assertFalse(root.get("targets_met").booleanValue());
        assertEquals(3000, root.get("targets").get("crossover_hz").doubleValue(), 1e-9);
        assertEquals(3000, root.get("crossover_target_hz").doubleValue(), 1e-9, "a fixed crossover is designed for");
        boolean anyMiss = false;
        for (JsonNode p : root.get("points")) {
            assertEquals(p.get("misses").isEmpty(), p.get("targets_met").booleanValue(), p.toString());
            anyMiss |= !p.get("targets_met").booleanValue();
        }
        assertTrue(anyMiss);
    }

    @Test
    void specWithoutFeedbackIsBadInputNamingTheSection() throws IOException {
        Path spec = dir.resolve("nofb.yaml");
        String withoutFeedback = Files.readString(EXAMPLES.resolve("telecom-12v-opamp.yaml"))
                .replaceAll("(?s)\nfeedback:.*", "\n");
        Files.writeString(spec, withoutFeedback);
        CliRun run = CliRun.of("design", spec.toString());
        assertEquals(ExitCodes.BAD_INPUT, run.exitCode());
        assertEquals("", run.out());
        assertEquals(1, run.errLines().length, run.err());
        assertTrue(run.err().startsWith("flyloop: " + spec + ": feedback: missing section"), run.err());
        assertTrue(run.err().contains("amplifier"), "says what to write: " + run.err());
    }

    @Test
    void setOverridesReachTheStageCommand() throws IOException {
        JsonNode points = JSON.readTree(CliRun.of("stage", OPAMP, "--json", "--set", "stage.iout=2.5",
                "--set", "stage.vin=[40, 60]").out()).get("points");
        assertEquals(2, points.size());
        assertEquals(40, points.get(0).get("vin").doubleValue(), 1e-12);
        assertEquals(60, points.get(1).get("vin").doubleValue(), 1e-12);
        assertEquals(2.5, points.get(0).get("iout").doubleValue(), 1e-12);
    }

    /** A --set value goes through the same checks as the file: here the same as editing the file. */
    @Test
    void setOverrideEqualsEditingTheFile() throws IOException {
        Path edited = dir.resolve("edited.yaml");
        Files.writeString(edited, Files.readString(EXAMPLES.resolve("telecom-5v-recheck.yaml"))
                .replace("cout: 680uF", "cout: 470uF"));
        CliRun viaSet = CliRun.of("design", EXAMPLES.resolve("telecom-5v-recheck.yaml").toString(), "--json",
                "--set", "stage.cout=470u");
        CliRun viaFile = CliRun.of("design", edited.toString(), "--json");
        assertEquals(viaFile.exitCode(), viaSet.exitCode());
        assertEquals(JSON.readTree(viaFile.out()), JSON.readTree(viaSet.out()));
        assertTrue(viaSet.out().contains("\"r_zero\""));
    }

    @Test
    void badSetIsBadInput() {
        CliRun run = CliRun.of("design", OPAMP, "--set", "stage.cuot=470u");
        assertEquals(ExitCodes.BAD_INPUT, run.exitCode());
        assertEquals("", run.out());
        assertTrue(run.err().startsWith("flyloop: --set stage.cuot: unknown key; did you mean stage.cout?"), run.err());
    }

    @Test
    void helpListsTheCommandAndItsOptions() {
        CliRun top = CliRun.of("--help");
        assertTrue(top.out().contains("design"), top.out());
        CliRun help = CliRun.of("design", "--help");
        assertEquals(0, help.exitCode());
        for (String option : List.of("--json", "--quiet", "--set")) {
            assertTrue(help.out().contains(option), help.out());
        }
    }

    private static Set<String> keys(JsonNode node) {
        Set<String> s = new TreeSet<>();
        Iterator<String> it = node.fieldNames();
        it.forEachRemaining(s::add);
        return s;
    }
}
