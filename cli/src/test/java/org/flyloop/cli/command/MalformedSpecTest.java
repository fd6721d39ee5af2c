package org.flyloop.cli.command;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.flyloop.cli.CliRun;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Bad specs and bad options: each must give exit 2, exactly one line on stderr that starts with
 * {@code flyloop: } and names the offending key, nothing on stdout, and no stack trace.
 */
class MalformedSpecTest {

    /** A valid voltage-mode spec; cases below replace one line of it. */
    static final String GOOD = String.join("\n",
            "title: test stage",
            "stage:",
            "  vin: [90, 375]",
            "  vout: 12",
            "  iout: [0.1, 2]",
            "  fsw: 65k",
            "  lm: 700u",
            "  turns: 8",
            "  cout: 1000u",
            "  esr: 40m",
            "control:",
            "  scheme: voltage",
            "  ramp: 2.5",
            "");

    @TempDir
    Path dir;

    static Stream<Arguments> cases() {
        return Stream.of(
                Arguments.of("missing key", GOOD.replace("  lm: 700u\n", ""), "stage.lm: missing"),
                Arguments.of("negative inductance", GOOD.replace("lm: 700u", "lm: -700u"),
                        "stage.lm: must be positive, got -700u"),
                Arguments.of("bare M", GOOD.replace("fsw: 65k", "fsw: 1M"), "stage.fsw: '1M': M is ambiguous"),
                Arguments.of("MHz", GOOD.replace("fsw: 65k", "fsw: 0.1MHz"), "stage.fsw: '0.1MHz': M is ambiguous"),
                Arguments.of("wrong unit", GOOD.replace("cout: 1000u", "cout: 4.7uH"),
                        "stage.cout: unit uH does not fit a capacitance; write farads, e.g. 4.7u or 4.7uF"),
                Arguments.of("unknown key", GOOD.replace("fsw: 65k", "fws: 65k"),
                        "stage.fws: unknown key; did you mean fsw?"),
                Arguments.of("unknown section", GOOD.replace("control:", "contrl:"),
                        "contrl: unknown key; did you mean control?"),
                Arguments.of("misspelt optional section", GOOD + "target:\n  crossover: 2k\n",
                        "target: unknown key; did you mean targets?"),
                Arguments.of("missing section", GOOD.substring(0, GOOD.indexOf("control:")), "control: missing section"),
                Arguments.of("empty file", "", "the file is empty"),
                Arguments.of("comments only", "# nothing here\n", "the file is empty"),
                Arguments.of("not YAML", "stage: [1, 2\n", "line 1: not valid YAML"),
                Arguments.of("not a mapping", "- 1\n- 2\n", "the top level is not a mapping"),
                Arguments.of("scalar document", "just words\n", "the top level is not a mapping"),
                Arguments.of("list for a scalar", GOOD.replace("vout: 12", "vout: [5, 12]"),
                        "stage.vout: expected a single value, got a list"),
                Arguments.of("mapping for a scalar", GOOD.replace("vout: 12", "vout: {value: 12}"),
                        "stage.vout: expected a single value, got a mapping"),
                Arguments.of("section is a scalar", GOOD.replace("control:\n  scheme: voltage\n  ramp: 2.5\n",
                        "control: voltage\n"), "control: expected a mapping of keys"),
                Arguments.of("bad scheme word", GOOD.replace("scheme: voltage", "scheme: voltag"),
                        "control.scheme: 'voltag' is not one of voltage, current; did you mean voltage?"),
                Arguments.of("duplicate key", GOOD.replace("vout: 12", "vout: 12\n  vout: 15"), "stage.vout: duplicate key"),
                Arguments.of("empty value", GOOD.replace("vout: 12", "vout:"), "stage.vout: no value"),
                Arguments.of("null value", GOOD.replace("vout: 12", "vout: ~"), "stage.vout: no value"),
                Arguments.of("zero load", GOOD.replace("iout: [0.1, 2]", "iout: [0, 2]"), "stage.iout[0]: must be positive"),
                Arguments.of("descending range", GOOD.replace("iout: [0.1, 2]", "iout: [2, 0.1]"),
                        "stage.iout: the values do not ascend"),
                Arguments.of("four-value range", GOOD.replace("vin: [90, 375]", "vin: [90, 100, 200, 375]"),
                        "stage.vin: a list of 4 values"),
                Arguments.of("bad text range", GOOD.replace("vin: [90, 375]", "vin: \"90..abc\""),
                        "stage.vin: 'abc' is not a number"),
                Arguments.of("unit on turns", GOOD.replace("turns: 8", "turns: 8V"),
                        "stage.turns: unit V does not fit a dimensionless number"),
                Arguments.of("duty_max of 1", GOOD + "  duty_max: 1\n", "control.duty_max: must be below 1"),
                Arguments.of("current-mode key in voltage mode", GOOD + "  sense: 0.5\n",
                        "control.sense: applies to current mode only"),
                Arguments.of("current mode without sense", GOOD.replace("scheme: voltage\n  ramp: 2.5", "scheme: current"),
                        "control.sense: missing"),
                Arguments.of("yes is not a number", GOOD.replace("esr: 40m", "esr: yes"), "stage.esr: 'yes' is not a number"),
                Arguments.of("code-carrying tag", GOOD.replace("title: test stage",
                        "title: !!javax.script.ScriptEngineManager [!!java.net.URLClassLoader "
                                + "[[!!java.net.URL [\"http://localhost:1/\"]]]]"),
                        "title: YAML tags (!!javax.script.ScriptEngineManager) are not accepted"),
                Arguments.of("alias", GOOD.replace("vout: 12", "vout: &v 12").replace("turns: 8", "turns: *v"),
                        "stage.turns: YAML aliases (*v) are not accepted"),
                Arguments.of("anchored mapping", GOOD.replace("stage:", "stage: &s"), "stage: YAML anchors (&s) are not accepted"),
                Arguments.of("two documents", GOOD + "---\n" + GOOD, "more than one YAML document"),
                Arguments.of("multi-line text value", GOOD.replace("lm: 700u", "lm: |\n    700u\n    H"),
                        "stage.lm: '700u H' has an unknown suffix or unit"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void badSpecGivesOneLineAndExitTwo(String name, String yaml, String expectedFragment) throws IOException {
        Path file = dir.resolve("bad.yaml");
        Files.writeString(file, yaml);
        CliRun run = CliRun.of("stage", file.toString());
        assertOneLineError(run, "flyloop: " + file + ": " + expectedFragment);
    }

    @Test
    void dutyBeyondItsLimitIsAnInputError() throws IOException {
        // 8:1 turns with 12.5 V reflected is 100 V; at 90 V in CCM the duty is 100/190 ≈ 0.53,
        // so a 0.4 limit cannot be met (volt-second balance Vin·D = N·Vo'·(1 − D)).
        Path file = dir.resolve("duty.yaml");
        Files.writeString(file, GOOD.replace("  vout: 12\n", "  vout: 12\n  rectifier_drop: 0.5\n")
                .replace("iout: [0.1, 2]", "iout: [1.9, 2]") + "  duty_max: 0.4\n");
        CliRun run = CliRun.of("stage", file.toString());
        assertOneLineError(run, "flyloop: " + file + ": at vin=90 V");
        assertTrue(run.err().contains("control.duty_max"), run.err());
    }

    @Test
    void unreachableOutputIsAnInputError() throws IOException {
        // Hand check with the CCM volt-second and charge balances, Vin·D − Rds·Im·D = Vr·(1 − D)
        // and Iout = N·Im·(1 − D): with a = Rds·Iout/N = 100·2/8 = 25 V, Vr = 8·12 = 96 V (no
        // rectifier drop) and Vin = 90 V, g(D) = D(1 − D)·Vin − D·a − (1 − D)²·Vr peaks at
        // D = (Vin − a + 2Vr)/(2(Vin + Vr)) = 0.691 with g = −7.2 V < 0: no duty cycle delivers 2 A,
        // and at light load DCM needs even more volt-seconds.
        Path file = dir.resolve("reach.yaml");
        Files.writeString(file, GOOD.replace("  vout: 12\n", "  vout: 12\n  switch_resistance: 100\n"));
        CliRun run = CliRun.of("stage", file.toString());
        assertOneLineError(run, "flyloop: " + file + ": at vin=90 V");
        assertTrue(run.err().contains("stage.switch_resistance"), run.err());
    }

    @Test
    void missingFileIsAnInputError() {
        Path file = dir.resolve("nowhere.yaml");
        assertOneLineError(CliRun.of("stage", file.toString()), "flyloop: " + file + ": no such file");
    }

    @Test
    void ambiguousOptionValueIsAnInputError() throws IOException {
        Path file = dir.resolve("ok.yaml");
        Files.writeString(file, GOOD);
        assertOneLineError(CliRun.of("stage", file.toString(), "--vin", "1M"), "flyloop: --vin: '1M': M is ambiguous");
        assertOneLineError(CliRun.of("stage", file.toString(), "--iout", "-2"), "flyloop: --iout: must be positive");
        assertOneLineError(CliRun.of("stage", file.toString(), "--iout", "2V"), "flyloop: --iout: unit V does not fit a current");
    }

    @Test
    void unknownOptionAndMissingArgumentAreInputErrors() {
        assertOneLineError(CliRun.of("stage", "x.yaml", "--bogus"), "flyloop: Unknown option: '--bogus'");
        assertOneLineError(CliRun.of("stage"), "flyloop: Missing required parameter: 'SPEC'");
        assertOneLineError(CliRun.of(), "flyloop: no command given");
        assertOneLineError(CliRun.of("stagger"), "flyloop: Unmatched argument");
    }

    static void assertOneLineError(CliRun run, String expectedStart) {
        assertAll(
                () -> assertEquals(2, run.exitCode(), run.err()),
                () -> assertEquals("", run.out(), "stdout must stay empty"),
                () -> assertEquals(1, run.errLines().length, "exactly one line on stderr: " + run.err()),
                () -> assertTrue(run.err().startsWith(expectedStart),
                        "expected to start with\n  " + expectedStart + "\nbut was\n  " + run.err()),
                () -> assertFalse(run.err().contains("Exception") || run.err().contains("\tat "), run.err()));
    }
}
