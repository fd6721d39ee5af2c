package org.flyloop.cli.spec;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import org.flyloop.spec.AmplifierKind;
import org.flyloop.spec.FeedbackSpec;
import org.flyloop.spec.PlacementMethod;
import org.flyloop.spec.ValueRange;
import org.junit.jupiter.api.Test;

/**
 * The feedback section, text to SI values. Expected numbers are the decimals written in the
 * fixtures scaled by hand with the SI prefixes (BIPM, "The International System of Units", 9th
 * ed., 2019, Table 7) and % = 1/100 (ibid., section 5.4.7).
 */
class FeedbackSectionTest {

    private static final double REL = 1e-12;

    @Test
    void shuntOptoReadsEveryKey() {
        FeedbackSpec f = SpecLoader.load(SpecFixtures.SHUNT_OPTO_FULL).feedback();
        assertEquals(AmplifierKind.SHUNT_OPTO, f.amplifier());
        assertEquals(2, f.type());
        assertEquals(PlacementMethod.K_FACTOR, f.placement());
        assertClose(2.495, f.referenceV());
        assertClose(10e3, f.rLower());
        assertClose(38.3e3, f.rUpper());
        // [50%, 100%, 1.6]: a percentage and a plain ratio mix in one list.
        assertClose(0.5, f.ctr().min());
        assertClose(1.0, f.ctr().nominal());
        assertClose(1.6, f.ctr().max());
        assertClose(4.7e3, f.rPullup());
        assertClose(5.5, f.pullupSupplyV());
        assertClose(0.8, f.fbMinV());
        assertClose(5e3, f.optoPoleHz());
        assertTrue(Double.isNaN(f.cOpto()), "c_opto not given");
        assertClose(1e3, f.rLed());
        assertClose(1.1, f.ledDropV());
        assertClose(2.6, f.shuntMinVoltageV());
        assertClose(1.5e-3, f.shuntMinCurrentA());
        assertClose(0.05, f.capTolerance());
        assertTrue(Double.isNaN(f.gbwHz()) && Double.isNaN(f.gmS()), "op-amp and OTA values do not apply");
        Map<String, Double> parts = f.parts();
        assertEquals(6, parts.size(), parts.toString());
        assertClose(22e3, parts.get("r_zero"));
        assertClose(10e-9, parts.get("c_zero"));
        assertClose(470e-12, parts.get("c_pullup"));
        assertClose(1.2e3, parts.get("r_bias"));
        assertClose(0.8, parts.get("ctr"));
        assertClose(20, parts.get("r_led_dynamic"));
    }

    @Test
    void optoPoleBecomesTheCapacitanceOfAnRcPoleAtThePullup() {
        // f = 1/(2π·R·C) for a first-order RC low-pass, so C = 1/(2π·5 kHz·4.7 kΩ)
        // = 1/(147 655) = 6.7726e-9 F (hand calculation).
        FeedbackSpec f = SpecLoader.load(SpecFixtures.SHUNT_OPTO_FULL).feedback();
        assertEquals(6.7726e-9, f.optoCapacitance(), 6.7726e-9 * 1e-4);
    }

    @Test
    void opAmpReadsTypeGainBandwidthAndParts() {
        FeedbackSpec f = SpecLoader.load(SpecFixtures.OPAMP_TYPE3).feedback();
        assertEquals(AmplifierKind.OPAMP, f.amplifier(), "the amplifier word is read in any case");
        assertEquals(3, f.type());
        assertEquals(PlacementMethod.POLES_ZEROS, f.placement());
        assertClose(1.25, f.referenceV());
        assertClose(1e6, f.gbwHz());
        assertEquals(ValueRange.of(1), f.ctr(), "CTR is 1 when there is no optocoupler");
        assertTrue(Double.isNaN(f.rLower()) && Double.isNaN(f.rUpper()), "divider keys not given");
        for (double shuntOnly : new double[] {f.rPullup(), f.pullupSupplyV(), f.fbMinV(), f.optoPoleHz(), f.cOpto(),
                f.rLed(), f.ledDropV(), f.shuntMinVoltageV(), f.shuntMinCurrentA()}) {
            assertTrue(Double.isNaN(shuntOnly), "shunt-opto values do not apply to an op-amp");
        }
        assertEquals(0, f.optoCapacitance());
        assertEquals(8, f.parts().size());
        assertClose(30e3, f.parts().get("r_upper"));
        assertClose(220e-12, f.parts().get("c_pole"));
        assertClose(4.7e-9, f.parts().get("c_ff"));
        // gbw: 1meg and parts.gbw: 1megHz are the same 1e6 Hz, so giving it twice is accepted.
        assertClose(1e6, f.parts().get("gbw"));
    }

    @Test
    void otaAppliesDefaults() {
        FeedbackSpec f = SpecLoader.load(SpecFixtures.OTA_AUTO).feedback();
        assertEquals(AmplifierKind.OTA, f.amplifier());
        assertEquals(0, f.type());
        assertTrue(f.autoType());
        assertEquals(PlacementMethod.BEST, f.placement());
        assertClose(2.5, f.referenceV());
        assertClose(200e-6, f.gmS());
        assertClose(0.1, f.capTolerance());
        assertTrue(Double.isNaN(f.gbwHz()));
        assertTrue(f.parts().isEmpty());
    }

    @Test
    void shuntOptoAppliesDocumentedDefaults() {
        Spec spec = SpecLoader.parse(SpecFixtures.STAGE_AND_CONTROL
                + "feedback: {amplifier: shunt-opto, ctr: 1, r_pullup: 10k, type: auto}\n", "d.yaml");
        FeedbackSpec f = spec.feedback();
        assertEquals(0, f.type());
        assertEquals(ValueRange.of(1), f.ctr());
        assertClose(2.5, f.referenceV());
        assertClose(5, f.pullupSupplyV());
        assertClose(1.0, f.fbMinV());
        assertClose(1.0, f.ledDropV());
        assertClose(2.5, f.shuntMinVoltageV());
        assertClose(1e-3, f.shuntMinCurrentA());
        assertClose(0.1, f.capTolerance());
        assertTrue(Double.isNaN(f.optoPoleHz()) && Double.isNaN(f.cOpto()), "no optocoupler pole");
        assertEquals(0, f.optoCapacitance());
        assertTrue(Double.isNaN(f.rLed()), "the designer picks r_led");
    }

    @Test
    void cOptoInFaradsAndCtrAsTextRange() {
        Spec spec = SpecLoader.parse(SpecFixtures.STAGE_AND_CONTROL
                + "feedback: {amplifier: shunt-opto, ctr: \"40%..120%\", r_pullup: 10k, c_opto: 2.2n}\n", "c.yaml");
        assertClose(2.2e-9, spec.feedback().cOpto());
        assertClose(2.2e-9, spec.feedback().optoCapacitance());
        assertClose(0.4, spec.feedback().ctr().min());
        assertClose(1.2, spec.feedback().ctr().max());
        assertTrue(!spec.feedback().ctr().hasNominal());
    }

    @Test
    void aPartRestatingItsKeyInAnotherSpellingIsAccepted() {
        // 8.06k scales to 8060.000000000001 (8.06 is not exact in binary) while 8060 is exact:
        // the same value to a part in 1e16.
        Spec spec = SpecLoader.parse(SpecFixtures.STAGE_AND_CONTROL
                + "feedback: {amplifier: opamp, r_upper: 8.06k, parts: {r_upper: 8060}}\n", "r.yaml");
        assertEquals(8060, spec.feedback().parts().get("r_upper"));
        assertTrue(spec.feedback().rUpper() != 8060, "the spellings do differ in the last bit");
    }

    @Test
    void noSectionMeansNoFeedback() {
        Spec spec = SpecLoader.parse(SpecFixtures.STAGE_AND_CONTROL, "n.yaml");
        assertNull(spec.feedback());
        assertTrue(!spec.hasFeedback());
    }

    private static void assertClose(double expected, double actual) {
        assertEquals(expected, actual, Math.abs(expected) * REL);
    }
}
