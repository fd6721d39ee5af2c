package org.flyloop.cli.spec;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.flyloop.spec.ControlScheme;
import org.junit.jupiter.api.Test;

/**
 * Spec text to SI values. Expected numbers are the decimal values written in each document,
 * scaled by hand with the SI prefixes (BIPM SI Brochure, 9th ed., 2019, Table 7).
 */
class SpecLoaderTest {

    private static final double REL = 1e-12;

    private static final String CURRENT_MODE = String.join("\n",
            "title: '  A   spaced  title '",
            "stage:",
            "  vin: \"90V..375V\"",
            "  vout: 12V",
            "  iout: [100mA, 1, 2A]",
            "  fsw: 65 kHz",
            "  lm: 0.7mH",
            "  turns: 8",
            "  cout: 1000µF",
            "  esr: 0",
            "  rectifier_drop: 500m",
            "  switch_resistance: 900mΩ",
            "control:",
            "  scheme: Current",
            "  sense: 0.5V/A",
            "  slope: 0.03V/us",
            "  duty_max: 70%",
            "  fb_gain: 0.5",
            "");

    @Test
    void readsEveryKeyInSiUnits() {
        Spec spec = SpecLoader.parse(CURRENT_MODE, "t.yaml");
        assertEquals("A spaced title", spec.title());
        assertEquals(90, spec.stage().vin().min(), 90 * REL);
        assertEquals(375, spec.stage().vin().max(), 375 * REL);
        assertTrue(Double.isNaN(spec.stage().vin().nominal()), "a text range has no nominal");
        assertEquals(12, spec.stage().vout(), 12 * REL);
        assertEquals(0.1, spec.stage().iout().min(), 0.1 * REL);
        assertEquals(1, spec.stage().iout().nominal(), REL);
        assertEquals(2, spec.stage().iout().max(), 2 * REL);
        assertEquals(65e3, spec.stage().fswHz(), 65e3 * REL);
        assertEquals(700e-6, spec.stage().lm(), 700e-6 * REL);
        assertEquals(8, spec.stage().turns(), 8 * REL);
        assertEquals(1e-3, spec.stage().cout(), 1e-3 * REL);
        assertEquals(0, spec.stage().esr());
        assertEquals(0.5, spec.stage().rectifierDrop(), 0.5 * REL);
        assertEquals(0.9, spec.stage().switchResistance(), 0.9 * REL);
        assertEquals(ControlScheme.CURRENT, spec.control().scheme());
        assertEquals(0.5, spec.control().senseVPerA(), 0.5 * REL);
        // 0.03 V/µs = 0.03 V / 1e-6 s = 3e4 V/s.
        assertEquals(3e4, spec.control().slopeVPerS(), 3e4 * REL);
        assertEquals(0.7, spec.control().dutyMax(), 0.7 * REL);
        assertEquals(0.5, spec.control().fbGain(), 0.5 * REL);
    }

    @Test
    void appliesDocumentedDefaults() {
        String minimal = String.join("\n",
                "stage: {vin: 300, vout: 12, iout: 2, fsw: 65k, lm: 700u, turns: 8, cout: 1000u, esr: 40m}",
                "control: {scheme: voltage, ramp: 2.5}", "");
        Spec spec = SpecLoader.parse(minimal, "m.yaml");
        assertEquals("", spec.title());
        assertEquals("m.yaml", spec.displayTitle());
        assertTrue(spec.stage().vin().isSingle());
        assertEquals(0, spec.stage().rectifierDrop());
        assertEquals(0, spec.stage().switchResistance());
        assertEquals(0.75, spec.control().dutyMax());
        assertEquals(1, spec.control().fbGain());
        assertEquals(2.5, spec.control().rampV());
        assertTrue(Double.isNaN(spec.control().senseVPerA()));
    }

    @Test
    void leadingZeroIsDecimalNotOctal() {
        // YAML 1.1 would read 010 as octal 8; a spec value means what it shows.
        Spec spec = SpecLoader.parse(CURRENT_MODE.replace("turns: 8", "turns: 010"), "t.yaml");
        assertEquals(10, spec.stage().turns());
    }

    @Test
    void codeCarryingTagIsRefusedBeforeAnythingIsBuilt() {
        // The classic SnakeYAML gadget: a loader that constructs tagged types would instantiate a
        // ScriptEngineManager with a remote class loader. Ours reads events only and refuses tags.
        String hostile = "stage: !!javax.script.ScriptEngineManager [!!java.net.URLClassLoader "
                + "[[!!java.net.URL [\"http://localhost:1/\"]]]]\ncontrol: {scheme: voltage, ramp: 1}\n";
        InputException e = assertThrows(InputException.class, () -> SpecLoader.parse(hostile, "h.yaml"));
        assertEquals("h.yaml: stage", e.where());
        assertTrue(e.problem().startsWith("YAML tags (!!javax.script.ScriptEngineManager)"), e.problem());
    }

    @Test
    void aliasExpansionIsRefused() {
        String laughs = "a: &a [x, x, x, x, x, x, x, x, x]\nb: &b [*a, *a, *a, *a, *a, *a, *a, *a, *a]\n"
                + "c: [*b, *b, *b, *b, *b, *b, *b, *b, *b]\n";
        InputException e = assertThrows(InputException.class, () -> SpecLoader.parse(laughs, "l.yaml"));
        assertTrue(e.problem().startsWith("YAML anchors") || e.problem().startsWith("YAML aliases"), e.problem());
    }

    @Test
    void nestedDuplicateKeyIsNamedWithItsPath() {
        String dup = CURRENT_MODE.replace("  fb_gain: 0.5", "  fb_gain: 0.5\n  fb_gain: 1");
        InputException e = assertThrows(InputException.class, () -> SpecLoader.parse(dup, "d.yaml"));
        assertEquals("d.yaml: control.fb_gain", e.where());
    }
}
