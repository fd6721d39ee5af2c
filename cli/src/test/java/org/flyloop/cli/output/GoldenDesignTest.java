package org.flyloop.cli.output;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.flyloop.cli.CliRun;
import org.flyloop.cli.spec.SpecLoader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Golden files: {@code flyloop design --json} of every example with a feedback section, compared
 * with {@code src/test/resources/golden/<example>.json} within the tolerances of
 * {@link GoldenJson} (0.1 % on frequencies and parts, 0.1° and 0.1 dB on margins, exact on text,
 * booleans and structure).
 *
 * <p>These are regression snapshots, not references: the numbers come from flyloop itself, and
 * the models behind them are checked against independent references in the small-signal and
 * compensator modules. Their job is to make a change of any number visible in review. After an
 * intended change, regenerate them with
 * <pre>
 *   mvn -B -o test -pl cli -am -Dtest=GoldenDesignTest -Dsurefire.failIfNoSpecifiedTests=false \
 *       -Dflyloop.golden.update=true
 * </pre>
 * and review the diff of the golden files like any other change.
 */
class GoldenDesignTest {

    static final Path EXAMPLES = Path.of("..", "examples");
    static final Path GOLDEN = Path.of("src", "test", "resources", "golden");
    static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    static Stream<Path> designExamples() throws IOException {
        try (Stream<Path> files = Files.list(EXAMPLES)) {
            List<Path> list = files.filter(p -> p.toString().endsWith(".yaml"))
                    .filter(p -> SpecLoader.load(p).hasFeedback()).sorted().toList();
            assertTrue(list.size() >= 4, "at least four design examples, got " + list);
            return list.stream();
        }
    }

    static Path goldenFile(Path example) {
        return GOLDEN.resolve(example.getFileName().toString().replaceFirst("\\.yaml$", ".json"));
    }

    @ParameterizedTest
    @MethodSource("designExamples")
    void designMatchesItsGoldenFile(Path example) throws IOException {
        CliRun run = CliRun.of("design", example.toString(), "--json");
        assertEquals(0, run.exitCode(), "every example meets its targets: " + run.err());
        JsonNode actual = JSON.readTree(run.out());
        Path golden = goldenFile(example);
        if (Boolean.getBoolean("flyloop.golden.update")) {
            Files.writeString(golden, JSON.writeValueAsString(actual) + "\n", StandardCharsets.UTF_8);
            return;
        }
        assertTrue(Files.exists(golden), golden + " is missing; generate it with -Dflyloop.golden.update=true");
        List<String> diffs = GoldenJson.differences(JSON.readTree(golden.toFile()), actual);
        assertTrue(diffs.isEmpty(), example + " differs from " + golden + ":\n  " + String.join("\n  ", diffs));
    }

    /** Every golden file belongs to an example: a renamed example must not leave a stale file behind. */
    @Test
    void everyGoldenFileHasItsExample() throws IOException {
        List<Path> expected = designExamples().map(GoldenDesignTest::goldenFile).toList();
        try (Stream<Path> files = Files.list(GOLDEN)) {
            for (Path f : files.filter(p -> p.toString().endsWith(".json")).toList()) {
                assertTrue(expected.contains(f), f + " has no example under " + EXAMPLES);
            }
        }
    }

    /** The comparison itself catches changes just outside each tolerance and accepts ones inside. */
    @Test
    void toleranceBoundariesAreEnforced() throws IOException {
        JsonNode golden = JSON.readTree(goldenFile(EXAMPLES.resolve("telecom-12v-opamp.yaml")).toFile());
        assertTrue(GoldenJson.differences(golden, golden.deepCopy()).isEmpty());

        ObjectNode part = golden.deepCopy();
        double r = part.get("parts").get("r_upper").doubleValue();
        ((ObjectNode) part.get("parts")).put("r_upper", r * 1.0005);
        assertTrue(GoldenJson.differences(golden, part).isEmpty(), "0.05 % on a part is inside");
        ((ObjectNode) part.get("parts")).put("r_upper", r * 1.002);
        assertEquals(1, GoldenJson.differences(golden, part).size(), "0.2 % on a part is outside");

        ObjectNode margin = golden.deepCopy();
        ObjectNode point = (ObjectNode) margin.get("points").get(0);
        double pm = point.get("phase_margin_deg").doubleValue();
        point.put("phase_margin_deg", pm + 0.05);
        assertTrue(GoldenJson.differences(golden, margin).isEmpty(), "0.05° is inside");
        point.put("phase_margin_deg", pm + 0.2);
        assertEquals(1, GoldenJson.differences(golden, margin).size(), "0.2° is outside");

        ObjectNode text = golden.deepCopy();
        ((ObjectNode) text.get("network")).put("placement", "k-factor-x");
        assertEquals(1, GoldenJson.differences(golden, text).size(), "strings are exact");

        ObjectNode shape = golden.deepCopy();
        ((ObjectNode) shape.get("points").get(0)).remove("stable");
        assertEquals(1, GoldenJson.differences(golden, shape).size(), "a missing key is a difference");
    }
}
