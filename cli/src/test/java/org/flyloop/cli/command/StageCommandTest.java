package org.flyloop.cli.command;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import java.util.stream.Stream;
import org.flyloop.cli.CliRun;
import org.flyloop.cli.output.SafetyNotice;
import org.flyloop.cli.spec.Spec;
import org.flyloop.cli.spec.SpecLoader;
import org.flyloop.spec.ControlScheme;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/** The shipped examples run cleanly, and both output formats carry what they promise. */
class StageCommandTest {

    /** Surefire runs in the module directory; the examples live beside it at the root. */
    static final Path EXAMPLES = Path.of("..", "examples");
    static final List<String> REQUIRED_KEYS = List.of("vin", "iout", "mode", "duty", "duty2", "ipk", "ivalley",
            "iout_boundary", "vsw_max");
    static final ObjectMapper JSON = new ObjectMapper();

    static Stream<Path> examples() throws IOException {
        try (Stream<Path> files = Files.list(EXAMPLES)) {
            List<Path> list = files.filter(p -> p.toString().endsWith(".yaml")).sorted().toList();
            assertTrue(list.size() >= 3, "at least three examples");
            return list.stream();
        }
    }

    @ParameterizedTest
    @MethodSource("examples")
    void exampleSolvesAsATable(Path example) {
        CliRun run = CliRun.of("stage", example.toString());
        assertEquals(0, run.exitCode(), run.err());
        assertEquals("", run.err());
        Spec spec = SpecLoader.load(example);
        int corners = spec.stage().vin().corners().size() * spec.stage().iout().corners().size();
        String[] lines = run.out().split("\n");
        // title, operating-point header and rows, a blank line, the small-signal caption, header and
        // rows, one line per model warning, the caution
        long warnings = Stream.of(lines).filter(l -> l.startsWith("warning: ")).count();
        assertEquals(2 * corners + 6 + warnings, lines.length, run.out());
        assertEquals(spec.displayTitle(), lines[0]);
        assertTrue(lines[1].startsWith("vin[V]  iout[A]  mode"), lines[1]);
        assertEquals("", lines[corners + 2]);
        assertTrue(lines[corners + 3].startsWith("Control to output Gvc = vout/vc"), lines[corners + 3]);
        assertTrue(lines[corners + 4].startsWith("vin[V]  iout[A]  mode  poles[Hz]"), lines[corners + 4]);
        assertEquals(SafetyNotice.ONE_LINE, lines[lines.length - 1]);
    }

    @ParameterizedTest
    @MethodSource("examples")
    void exampleSolvesAsJson(Path example) throws IOException {
        CliRun run = CliRun.of("stage", example.toString(), "--json");
        assertEquals(0, run.exitCode(), run.err());
        JsonNode root = JSON.readTree(run.out());
        assertEquals(Set.of("points"), Set.copyOf(iterable(root.fieldNames())));
        Spec spec = SpecLoader.load(example);
        int corners = spec.stage().vin().corners().size() * spec.stage().iout().corners().size();
        assertEquals(corners, root.get("points").size());
        for (JsonNode p : root.get("points")) {
            for (String key : REQUIRED_KEYS) {
                assertTrue(p.has(key), key + " missing in " + p);
            }
            String mode = p.get("mode").asText();
            assertTrue(Set.of("CCM", "DCM", "boundary").contains(mode), mode);
            assertEquals(mode.equals("CCM"), p.get("duty2").isNull(), "duty2 null exactly in CCM: " + p);
            double duty = p.get("duty").asDouble();
            assertTrue(duty > 0 && duty <= spec.control().dutyMax(), "duty within (0, duty_max]: " + p);
        }
    }

    /** The example set must exercise both schemes and both conduction modes. */
    @Test
    void examplesCoverBothSchemesAndBothModes() throws IOException {
        Set<ControlScheme> schemes = EnumSet.noneOf(ControlScheme.class);
        Set<String> modes = new java.util.HashSet<>();
        for (Path example : (Iterable<Path>) examples()::iterator) {
            schemes.add(SpecLoader.load(example).control().scheme());
            for (JsonNode p : JSON.readTree(CliRun.of("stage", example.toString(), "--json").out()).get("points")) {
                modes.add(p.get("mode").asText());
            }
        }
        assertEquals(EnumSet.allOf(ControlScheme.class), schemes);
        assertTrue(modes.contains("CCM") && modes.contains("DCM"), modes.toString());
    }

    @Test
    void givenPointReplacesTheCorners() throws IOException {
        Path example = EXAMPLES.resolve("charger-universal.yaml");
        JsonNode points = JSON.readTree(CliRun.of("stage", example.toString(), "--vin", "230V", "--iout", "1500mA",
                "--json").out()).get("points");
        assertEquals(1, points.size());
        assertEquals(230, points.get(0).get("vin").asDouble(), 1e-12);
        assertEquals(1.5, points.get(0).get("iout").asDouble(), 1e-12);

        JsonNode vinOnly = JSON.readTree(CliRun.of("stage", example.toString(), "--vin", "230", "--json").out())
                .get("points");
        assertEquals(SpecLoader.load(example).stage().iout().corners().size(), vinOnly.size());
    }

    @Test
    void quietPrintsTheTableOnly() {
        CliRun run = CliRun.of("stage", EXAMPLES.resolve("telecom-5v.yaml").toString(), "--quiet");
        assertEquals(0, run.exitCode());
        assertTrue(run.out().startsWith("vin[V]"), run.out());
        assertFalse(run.out().contains("Caution"));
    }

    @Test
    void versionAndHelpExitZero() {
        CliRun version = CliRun.of("--version");
        assertEquals(0, version.exitCode());
        assertTrue(version.out().startsWith("flyloop "), version.out());
        CliRun help = CliRun.of("stage", "--help");
        assertEquals(0, help.exitCode());
        assertTrue(help.out().contains("--vin") && help.out().contains("--json"), help.out());
        for (String option : List.of("--bode", "--model", "--quantity", "--freq", "--transient", "--time", "--csv",
                "--netlist")) {
            assertTrue(help.out().contains(option), option + " in the help");
        }
    }

    private static <T> List<T> iterable(java.util.Iterator<T> it) {
        List<T> out = new java.util.ArrayList<>();
        it.forEachRemaining(out::add);
        return out;
    }
}
