package org.flyloop.cli.spec;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import org.flyloop.eseries.ESeries;
import org.flyloop.spec.SeriesSpec;
import org.flyloop.spec.TargetsSpec;
import org.flyloop.spec.Tolerance;
import org.flyloop.spec.TolerancesSpec;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The targets, series and tolerances sections. Numbers are the fixture's decimals with SI
 * prefixes and % = 1/100 (BIPM SI Brochure, 9th ed., 2019, Table 7 and section 5.4.7); series
 * names are those of IEC 60063:2015.
 */
class TargetsSeriesTolerancesTest {

    private static final double REL = 1e-12;

    @Test
    void targetsReadEveryForm() {
        TargetsSpec t = SpecLoader.load(SpecFixtures.SHUNT_OPTO_FULL).targets();
        assertClose(2e3, t.crossoverHz());
        assertFalse(t.autoCrossover());
        assertClose(55, t.phaseMarginDeg());
        assertClose(12, t.gainMarginDb());
        assertClose(0.2, t.rhpZeroFraction());
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "55|55", "55deg|55", "55 deg|55", "55°|55", "55 degrees|55", "47.5DEG|47.5", "0.1|0.1", "179.9|179.9"})
    void phaseMarginForms(String written, double degrees) {
        TargetsSpec t = targets("phase_margin: \"" + written + "\"");
        assertClose(degrees, t.phaseMarginDeg());
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {"10|10", "10dB|10", "6 db|6", "0|0"})
    void gainMarginForms(String written, double decibels) {
        assertClose(decibels, targets("gain_margin: " + written).gainMarginDb());
    }

    @Test
    void autoCrossoverAndDefaults() {
        assertTrue(targets("crossover: auto").autoCrossover());
        assertTrue(targets("crossover: AUTO").autoCrossover());
        assertEquals(TargetsSpec.defaults(), targets("crossover: auto"));
        assertEquals(TargetsSpec.defaults(), SpecLoader.parse(SpecFixtures.STAGE_AND_CONTROL, "d.yaml").targets());
        // The documented defaults: automatic crossover, 45 degrees, 10 dB, a quarter of the RHP zero.
        TargetsSpec d = TargetsSpec.defaults();
        assertTrue(d.autoCrossover());
        assertEquals(45, d.phaseMarginDeg());
        assertEquals(10, d.gainMarginDb());
        assertEquals(0.25, d.rhpZeroFraction());
        assertClose(1, targets("rhp_zero_fraction: 1").rhpZeroFraction());
        assertClose(1.5e3, targets("crossover: 1.5k").crossoverHz());
    }

    @Test
    void seriesNamesAreCanonical() {
        assertEquals(new SeriesSpec("E48", "E6"), SpecLoader.load(SpecFixtures.SHUNT_OPTO_FULL).series());
        assertEquals(SeriesSpec.defaults(), SpecLoader.parse(SpecFixtures.STAGE_AND_CONTROL, "d.yaml").series());
        assertEquals(new SeriesSpec("E96", "E12"), SeriesSpec.defaults());
    }

    @Test
    void everyIecSeriesIsAccepted() {
        // IEC 60063:2015 defines E3, E6, E12, E24, E48, E96 and E192.
        for (String name : new String[] {"E3", "E6", "E12", "E24", "E48", "E96", "E192"}) {
            SeriesSpec s = SpecLoader.parse(SpecFixtures.STAGE_AND_CONTROL + "series: {resistors: "
                    + name.toLowerCase(java.util.Locale.ROOT) + ", capacitors: " + name + "}\n", "s.yaml").series();
            assertEquals(new SeriesSpec(name, name), s);
        }
        assertEquals(7, Arrays.stream(ESeries.values()).count());
    }

    @Test
    void tolerancesReadSymmetricAndAsymmetricBands() {
        TolerancesSpec t = SpecLoader.load(SpecFixtures.SHUNT_OPTO_FULL).tolerances();
        assertEquals(band(-0.1, 0.1), t.lm());
        assertEquals(band(-0.2, 0.2), t.cout());
        assertEquals(band(-0.5, 2.0), t.esr());
        assertEquals(band(-0.05, 0.05), t.fsw(), "a plain fraction 0.05 is 5 %");
        assertTrue(t.ctrFromFeedback());
        assertEquals(band(-0.01, 0.01), t.resistors());
        // Capacitors follow feedback.cap_tolerance: 5 % in the fixture.
        assertEquals(band(-0.05, 0.05), t.capacitors());
    }

    @Test
    void absentTolerancesAreNone() {
        assertEquals(TolerancesSpec.none(), SpecLoader.parse(SpecFixtures.STAGE_AND_CONTROL, "n.yaml").tolerances());
        assertEquals(TolerancesSpec.none(), SpecLoader.load(SpecFixtures.OPAMP_TYPE3).tolerances());
    }

    @Test
    void capacitorsTakeTheTenPercentDefaultWithoutFeedback() {
        TolerancesSpec t = SpecLoader.parse(SpecFixtures.STAGE_AND_CONTROL + "tolerances: {lm: 15%}\n", "t.yaml")
                .tolerances();
        assertEquals(band(-0.15, 0.15), t.lm());
        assertEquals(Tolerance.NONE, t.cout());
        assertEquals(Tolerance.NONE, t.resistors());
        assertFalse(t.ctrFromFeedback());
        assertEquals(band(-0.1, 0.1), t.capacitors());
    }

    @Test
    void oneSidedBandsAndZero() {
        TolerancesSpec t = SpecLoader.parse(SpecFixtures.STAGE_AND_CONTROL
                + "tolerances: {lm: 0, cout: [0, 30%], esr: [-99%, 0]}\n", "t.yaml").tolerances();
        assertTrue(t.lm().isNone());
        assertEquals(band(0, 0.3), t.cout());
        assertEquals(band(-0.99, 0), t.esr());
    }

    private static Tolerance band(double low, double high) {
        return new Tolerance(low, high);
    }

    private static TargetsSpec targets(String line) {
        return SpecLoader.parse(SpecFixtures.STAGE_AND_CONTROL + "targets:\n  " + line + "\n", "t.yaml").targets();
    }

    private static void assertClose(double expected, double actual) {
        assertEquals(expected, actual, Math.abs(expected) * REL);
    }
}
