package org.flyloop.cli.spec;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Stream;
import org.flyloop.spec.AmplifierKind;
import org.flyloop.spec.FeedbackSpec;
import org.flyloop.spec.SeriesSpec;
import org.flyloop.spec.ValueRange;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * {@code --set path=value}: restating a value changes nothing (record equality), a new value goes
 * through the same checks as the file, and bad settings are one-line errors at {@code --set <path>}.
 */
class SpecOverridesTest {

    private static final Path FULL = SpecFixtures.SHUNT_OPTO_FULL;

    @Test
    void restatingTheFileGivesAnEqualSpec() {
        Spec plain = SpecLoader.load(FULL);
        assertEquals(plain, SpecLoader.load(FULL, List.of()));
        // Each setting writes the file's value, some in another spelling of the same number.
        for (String setting : List.of("stage.cout=1000u", "stage.cout=1000uF", "stage.vin=[90, 375]",
                "stage.vin=\"90..375\"", "title=Adapter 12 V, shunt regulator and optocoupler",
                "feedback.ctr=[0.5, 1, 160%]", "feedback.parts.r_zero=22kohm", "feedback.type=2",
                "targets.phase_margin=55", "series.resistors=E48", "tolerances.esr=[-0.5, 2]",
                "tolerances.ctr=from feedback.ctr", "control.slope=30k")) {
            assertEquals(plain, SpecLoader.load(FULL, List.of(setting)), setting);
        }
    }

    @Test
    void restatingADefaultCreatesAnEqualSection() {
        Spec plain = SpecLoader.parse(SpecFixtures.STAGE_AND_CONTROL, "d.yaml");
        assertEquals(plain, SpecLoader.parse(SpecFixtures.STAGE_AND_CONTROL, "d.yaml",
                List.of("series.resistors=e96", "targets.phase_margin=45deg", "targets.crossover=auto",
                        "control.duty_max=75%")));
    }

    @Test
    void newValuesReplaceTheFilesAndLeaveTheRestAlone() {
        Spec plain = SpecLoader.load(FULL);
        Spec changed = SpecLoader.load(FULL, List.of("stage.cout=470u", "feedback.parts.r_zero=27k",
                "control.slope=0.05V/us", "stage.vin=[90, 264]"));
        assertEquals(470e-6, changed.stage().cout(), 470e-6 * 1e-12);
        assertEquals(27e3, changed.feedback().parts().get("r_zero"), 27e3 * 1e-12);
        // 0.05 V/µs = 5e4 V/s.
        assertEquals(5e4, changed.control().slopeVPerS(), 5e4 * 1e-12);
        assertEquals(ValueRange.between(90, 264), changed.stage().vin());
        assertEquals(plain.feedback().parts().get("c_zero"), changed.feedback().parts().get("c_zero"));
        assertEquals(plain.stage().lm(), changed.stage().lm());
        assertEquals(plain.targets(), changed.targets());
        assertEquals(plain.tolerances(), changed.tolerances());
        assertNotEquals(plain, changed);
    }

    @Test
    void laterSettingWins() {
        Spec s = SpecLoader.load(FULL, List.of("stage.cout=470u", "stage.cout=220u"));
        assertEquals(220e-6, s.stage().cout(), 220e-6 * 1e-12);
    }

    @Test
    void aMissingSectionIsCreatedFromKnownKeys() {
        Spec s = SpecLoader.parse(SpecFixtures.STAGE_AND_CONTROL, "d.yaml",
                List.of("feedback.amplifier=ota", "feedback.gm=200u", "feedback.parts.r_zero=10k"));
        FeedbackSpec f = s.feedback();
        assertEquals(AmplifierKind.OTA, f.amplifier());
        assertEquals(200e-6, f.gmS(), 200e-6 * 1e-12);
        assertEquals(Map.of("r_zero", 10e3), f.parts());
    }

    @Test
    void aWholeMappingCanBeSet() {
        Spec s = SpecLoader.load(FULL, List.of("feedback.parts={c_zero: 4.7n}", "series={capacitors: E24}"));
        assertEquals(Set.of("c_zero"), s.feedback().parts().keySet(), "the file's other parts are gone");
        assertEquals(4.7e-9, s.feedback().parts().get("c_zero"), 4.7e-9 * 1e-12);
        assertEquals(new SeriesSpec("E96", "E24"), s.series());
    }

    @Test
    void aValueTheReaderRefusesIsLocatedAtTheSetting() {
        assertError(List.of("stage.cout=4.7uH"), "--set stage.cout",
                "--set stage.cout: unit uH does not fit a capacitance; write farads, e.g. 4.7u or 4.7uF");
        assertError(List.of("stage.vin=[90, 0]"), "--set stage.vin[1]", "--set stage.vin[1]: must be positive");
        assertError(List.of("feedback.parts.r_zero=-1k"), "--set feedback.parts.r_zero",
                "--set feedback.parts.r_zero: must be zero or positive, got -1k");
        assertError(List.of("targets.rhp_zero_fraction=2"), "--set targets.rhp_zero_fraction",
                "--set targets.rhp_zero_fraction: must lie in (0, 1]");
        assertError(List.of("stage.esr="), "--set stage.esr", "--set stage.esr: no value");
    }

    @Test
    void aKeyLeftInvalidByASettingIsLocatedInTheFile() {
        // Switching the amplifier leaves the file's ctr key behind; the error names the file's key.
        InputException e = assertThrows(InputException.class,
                () -> SpecLoader.load(FULL, List.of("feedback.amplifier=opamp")));
        assertEquals(FULL + ": feedback.ctr", e.where());
        assertTrue(e.problem().startsWith("applies to shunt-opto only, not opamp"), e.problem());
    }

    static Stream<Arguments> badSettings() {
        return Stream.of(
                Arguments.of("stage.cuot=470u", "--set stage.cuot",
                        "--set stage.cuot: unknown key; did you mean stage.cout? (stage keys: vin, vout,"),
                Arguments.of("stag.cout=470u", "--set stag", "--set stag: unknown key; did you mean stage? (sections:"),
                Arguments.of("feedback.parts.r_zer=22k", "--set feedback.parts.r_zer",
                        "--set feedback.parts.r_zer: unknown key; did you mean feedback.parts.r_zero? "
                                + "(feedback.parts keys: r_upper,"),
                Arguments.of("feedback.part.r_zero=22k", "--set feedback.part",
                        "--set feedback.part: unknown key; did you mean feedback.parts?"),
                Arguments.of("targets.bandwidth=2k", "--set targets.bandwidth",
                        "--set targets.bandwidth: unknown key; targets keys: crossover, phase_margin"),
                Arguments.of("stage.cout", "--set stage.cout",
                        "--set stage.cout: no '=' between key path and value; write --set path=value"),
                Arguments.of("=470u", "--set =470u", "--set =470u: no key path before '='"),
                Arguments.of("stage..cout=1", "--set stage..cout", "--set stage..cout: empty key in the path"),
                Arguments.of("stage.cout.min=1", "--set stage.cout.min",
                        "--set stage.cout.min: stage.cout holds a value, not keys; write --set stage.cout=VALUE"),
                Arguments.of("title.main=x", "--set title.main", "--set title.main: title holds a value, not keys"),
                Arguments.of("stage.vin=[90, 264", "--set stage.vin", "--set stage.vin: not valid YAML"),
                Arguments.of("title=a: b", "--set title", "--set title: not valid YAML"),
                Arguments.of("stage.cout=!!float 1", "--set stage.cout", "--set stage.cout: YAML tags (!!float)"),
                Arguments.of("stage.cout=470u\nstage.esr=1", "--set stage.cout=470u stage.esr=1",
                        "--set stage.cout=470u stage.esr=1: spans more than one line"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("badSettings")
    void badSettingIsAOneLineError(String setting, String where, String messageStart) {
        assertError(List.of(setting), where, messageStart);
    }

    @Test
    void settingsAreCheckedBeforeTheFileIsOpened() {
        InputException e = assertThrows(InputException.class,
                () -> SpecLoader.load(Path.of("no", "such.yaml"), List.of("stage.cuot=1")));
        assertEquals("--set stage.cuot", e.where());
    }

    @Test
    void aSettingThroughAFileValueIsAFileError() {
        String text = SpecFixtures.STAGE_AND_CONTROL + "feedback: opamp\n";
        InputException e = assertThrows(InputException.class,
                () -> SpecLoader.parse(text, "f.yaml", List.of("feedback.amplifier=opamp")));
        assertEquals("f.yaml: feedback", e.where());
        assertTrue(e.problem().startsWith("expected a mapping of keys, got 'opamp'"), e.problem());
    }

    @Test
    void pathsAreReportedInOrder() {
        assertEquals(List.of("stage.cout", "feedback.parts.r_zero"),
                SpecOverrides.parse(List.of("stage.cout=1u", "feedback.parts.r_zero=1k")).paths());
        assertTrue(SpecOverrides.none().isEmpty());
    }

    private static void assertError(List<String> settings, String where, String messageStart) {
        InputException e = assertThrows(InputException.class, () -> SpecLoader.load(FULL, settings));
        assertEquals(where, e.where());
        assertTrue(e.getMessage().startsWith(messageStart), "expected to start with\n  " + messageStart
                + "\nbut was\n  " + e.getMessage());
        assertTrue(!e.getMessage().contains("\n"), "one line");
    }
}
