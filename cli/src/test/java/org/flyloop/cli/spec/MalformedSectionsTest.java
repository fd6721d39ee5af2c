package org.flyloop.cli.spec;

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
 * Bad feedback, targets, series and tolerances sections, run through {@code flyloop stage} (which
 * loads the whole spec): exit 2, one stderr line naming the key path, nothing on stdout.
 */
class MalformedSectionsTest {

    /** A valid spec with every new section; cases below change one line of it. */
    static final String GOOD = SpecFixtures.text(SpecFixtures.SHUNT_OPTO_FULL);
    /** The same stage with an op-amp feedback section. */
    static final String OPAMP = GOOD.substring(0, GOOD.indexOf("feedback:"))
            + "feedback:\n  amplifier: opamp\n  type: 2\n";

    @TempDir
    Path dir;

    static Stream<Arguments> cases() {
        return Stream.of(
                bad("wrong amplifier word", GOOD.replace("amplifier: shunt-opto", "amplifier: shunt-optp"),
                        "feedback.amplifier: 'shunt-optp' is not one of opamp, ota, shunt-opto; did you mean shunt-opto?"),
                bad("amplifier missing", GOOD.replace("  amplifier: shunt-opto\n", ""), "feedback.amplifier: missing"),
                bad("type 3 with ota", otaWith("type: 3"), "feedback.type: type 3 is not available for ota; write 2 or auto"),
                bad("type 1 with ota", otaWith("type: 1"), "feedback.type: type 1 is not available for ota"),
                bad("type 3 with shunt-opto", GOOD.replace("type: 2", "type: 3"),
                        "feedback.type: type 3 is not available for shunt-opto; write 1, 2 or auto"),
                bad("type as a word", GOOD.replace("type: 2", "type: two"), "feedback.type: 'two' is not a compensator type"),
                bad("placement typo", GOOD.replace("placement: k-factor", "placement: k-facter"),
                        "feedback.placement: 'k-facter' is not one of k-factor, poles-zeros, best; did you mean k-factor?"),
                bad("gm missing for ota", GOOD.substring(0, GOOD.indexOf("feedback:")) + "feedback: {amplifier: ota}\n",
                        "feedback.gm: missing"),
                bad("ctr missing for shunt-opto", GOOD.replace("  ctr: [50%, 100%, 1.6]\n", ""), "feedback.ctr: missing"),
                bad("r_pullup missing for shunt-opto", GOOD.replace("  r_pullup: 4.7k\n", ""), "feedback.r_pullup: missing"),
                bad("opto_pole and c_opto both", GOOD.replace("opto_pole: 5 kHz", "opto_pole: 5 kHz\n  c_opto: 3.3n"),
                        "feedback.c_opto: given together with opto_pole"),
                bad("gm with opamp", OPAMP + "  gm: 1m\n", "feedback.gm: applies to ota only, not opamp"),
                bad("ctr with ota", otaWith("ctr: 1"), "feedback.ctr: applies to shunt-opto only, not ota"),
                bad("gbw with shunt-opto", GOOD.replace("r_lower: 10k", "r_lower: 10k\n  gbw: 1meg"),
                        "feedback.gbw: applies to opamp only, not shunt-opto"),
                bad("reference above vout", GOOD.replace("reference: 2.495V", "reference: 12.5"),
                        "feedback.reference: must lie below stage.vout = 12 V, got 12.5 V"),
                bad("fb_min above pull-up supply", GOOD.replace("fb_min: 800mV", "fb_min: 6"),
                        "feedback.fb_min: must lie below pullup_supply = 5.5 V"),
                bad("ctr written as percent without %", GOOD.replace("ctr: [50%, 100%, 1.6]", "ctr: [50, 160]"),
                        "feedback.ctr: a CTR of 160 is 16000 %"),
                bad("descending ctr", GOOD.replace("ctr: [50%, 100%, 1.6]", "ctr: [1.6, 0.5]"),
                        "feedback.ctr: the values do not ascend"),
                bad("cap tolerance of 100 %", GOOD.replace("cap_tolerance: 5%", "cap_tolerance: 100%"),
                        "feedback.cap_tolerance: a band of ±100 % or more reaches zero"),
                bad("unknown feedback key", GOOD.replace("reference: 2.495V", "refrence: 2.495V"),
                        "feedback.refrence: unknown key; did you mean reference?"),
                bad("unknown part name", GOOD.replace("r_zero: 22k", "r_zro: 22k"),
                        "feedback.parts.r_zro: unknown key; did you mean r_zero?"),
                bad("capacitor part in ohms", GOOD.replace("c_zero: 10nF", "c_zero: 10kohm"),
                        "feedback.parts.c_zero: unit kohm does not fit a capacitance; write farads"),
                bad("resistor part in farads", GOOD.replace("r_bias: 1.2kohm", "r_bias: 1.2uF"),
                        "feedback.parts.r_bias: unit uF does not fit a resistance"),
                bad("part of another amplifier", GOOD.replace("r_zero: 22k", "r_zero: 22k, c_ff: 1n"),
                        "feedback.parts.c_ff: not a part of a shunt-opto network"),
                bad("part disagrees with its key", GOOD.replace("r_zero: 22k", "r_zero: 22k, r_upper: 39k"),
                        "feedback.parts.r_upper: differs from feedback.r_upper (39k against 38.3 kΩ)"),
                bad("negative part", GOOD.replace("r_zero: 22k", "r_zero: -22k"),
                        "feedback.parts.r_zero: must be zero or positive, got -22k"),
                bad("parts as a list", GOOD.replace(
                        "parts: {r_zero: 22k, c_zero: 10nF, c_pullup: 470p, r_bias: 1.2kohm, ctr: 80%, r_led_dynamic: 20}",
                        "parts: [22k, 10n]"), "feedback.parts: expected a mapping of keys, got a list"),
                bad("negative gain margin", GOOD.replace("gain_margin: 12 dB", "gain_margin: -3dB"),
                        "targets.gain_margin: must be zero or positive, got -3dB"),
                bad("phase margin as a percentage", GOOD.replace("phase_margin: 55deg", "phase_margin: 55%"),
                        "targets.phase_margin: a percentage does not fit here"),
                bad("phase margin of 180", GOOD.replace("phase_margin: 55deg", "phase_margin: 180deg"),
                        "targets.phase_margin: must lie below 180 degrees"),
                bad("phase margin in volts", GOOD.replace("phase_margin: 55deg", "phase_margin: 55V"),
                        "targets.phase_margin: unit V does not fit a dimensionless number; write degrees"),
                bad("rhp_zero_fraction 2", GOOD.replace("rhp_zero_fraction: 20%", "rhp_zero_fraction: 2"),
                        "targets.rhp_zero_fraction: must lie in (0, 1], got 2"),
                bad("zero crossover", GOOD.replace("crossover: 2kHz", "crossover: 0"),
                        "targets.crossover: must be positive, got 0"),
                bad("crossover as a word", GOOD.replace("crossover: 2kHz", "crossover: fast"),
                        "targets.crossover: 'fast' is not a number; write hertz, e.g. 65k or 65kHz, or auto"),
                bad("ambiguous crossover", GOOD.replace("crossover: 2kHz", "crossover: 2M"),
                        "targets.crossover: '2M': M is ambiguous"),
                bad("unknown targets key", GOOD.replace("phase_margin: 55deg", "phase_margn: 55deg"),
                        "targets.phase_margn: unknown key; did you mean phase_margin?"),
                bad("unknown series E7", GOOD.replace("resistors: e48", "resistors: E7"),
                        "series.resistors: 'E7' is not a preferred-number series; write one of E3, E6, E12, E24, E48, E96, E192"),
                bad("series as a number", GOOD.replace("capacitors: E6", "capacitors: [6]"),
                        "series.capacitors: expected a series name, got a list"),
                bad("tolerance -150%", GOOD.replace("lm: 10%", "lm: -150%"),
                        "tolerances.lm: a symmetric band needs a size of zero or more, got -150%"),
                bad("tolerance list low -150%", GOOD.replace("cout: [-20%, +20%]", "cout: [-150%, +20%]"),
                        "tolerances.cout[0]: the low end must lie above -100 % and at or below 0, got -150%"),
                bad("tolerance list reversed", GOOD.replace("cout: [-20%, +20%]", "cout: [20%, -20%]"),
                        "tolerances.cout[0]: the low end must lie above -100 %"),
                bad("tolerance of three values", GOOD.replace("esr: [-50%, +200%]", "esr: [-50%, 0, +200%]"),
                        "tolerances.esr: a list of 3 values"),
                bad("tolerance with a unit", GOOD.replace("fsw: 0.05", "fsw: 5kHz"),
                        "tolerances.fsw: unit kHz does not fit a dimensionless number"),
                bad("symmetric band of 100 %", GOOD.replace("parts: 1%", "parts: 100%"),
                        "tolerances.parts: a symmetric band of 100% reaches -100 %"),
                bad("ctr: from somewhere", GOOD.replace("ctr: from feedback.ctr", "ctr: from somewhere"),
                        "tolerances.ctr: 'from somewhere' is not accepted; write ctr: from feedback.ctr"),
                bad("ctr tolerance as a number", GOOD.replace("ctr: from feedback.ctr", "ctr: 30%"),
                        "tolerances.ctr: '30%' is not accepted"),
                bad("ctr tolerance without an optocoupler", OPAMP + "tolerances: {ctr: from feedback.ctr}\n",
                        "tolerances.ctr: there is no feedback.ctr: the amplifier is opamp"),
                bad("ctr tolerance without feedback", GOOD.substring(0, GOOD.indexOf("feedback:"))
                        + "tolerances: {ctr: from feedback.ctr}\n",
                        "tolerances.ctr: there is no feedback.ctr: the spec has no feedback section"),
                bad("unknown tolerances key", GOOD.replace("lm: 10%", "lmm: 10%"),
                        "tolerances.lmm: unknown key; did you mean lm?"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void badSectionGivesOneLineAndExitTwo(String name, String yaml, String expectedFragment) throws IOException {
        Path file = dir.resolve("bad.yaml");
        Files.writeString(file, yaml);
        assertOneLineError(CliRun.of("stage", file.toString()), "flyloop: " + file + ": " + expectedFragment);
    }

    @Test
    void theFixtureItselfIsGood() throws IOException {
        Path file = dir.resolve("good.yaml");
        Files.writeString(file, GOOD);
        CliRun run = CliRun.of("stage", file.toString());
        assertEquals(0, run.exitCode(), run.err());
        Files.writeString(file, OPAMP);
        assertEquals(0, CliRun.of("stage", file.toString()).exitCode());
    }

    private static Arguments bad(String name, String yaml, String expectedFragment) {
        return Arguments.of(name, yaml, expectedFragment);
    }

    private static String otaWith(String line) {
        return GOOD.substring(0, GOOD.indexOf("feedback:")) + "feedback:\n  amplifier: ota\n  gm: 1m\n  " + line + "\n";
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
