package org.flyloop.network;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Bias limits by hand. Scenario: 12 V output, 5 V feedback supply, the pin must reach 0.8 V,
 * CTR min 0.5, r_pullup 20 kΩ, defaults (LED 1.0 V, shunt 2.5 V and 1 mA):
 * <pre>
 *   i_c      = (5 − 0.8)/20k          = 0.21 mA
 *   i_led    = 0.21 mA/0.5            = 0.42 mA
 *   i_bias   = 1.0 V/1k               = 1.00 mA   (r_bias = 1 kΩ)
 *   headroom = 12 − 1.0 − 2.5         = 8.5 V
 *   r_led ≤ 8.5/(0.42 mA + 1.00 mA)   = 5985.92 Ω
 *   r_bias ≤ 1.0 V/1 mA               = 1000 Ω
 * </pre>
 */
class ShuntOptoBiasTest {
    private static final ShuntOptoBias BIAS = ShuntOptoBias.withDefaults(12, 5, 0.8, 0.5);

    @Test
    void currentsAndLimitsMatchTheHandCalculation() {
        assertEquals(0.21e-3, BIAS.collectorCurrentNeededA(20e3), 1e-15);
        assertEquals(0.42e-3, BIAS.ledCurrentNeededA(20e3), 1e-15);
        assertEquals(1.0e-3, BIAS.biasCurrentA(1e3), 1e-15);
        assertEquals(8.5, BIAS.ledResistorHeadroomV(), 1e-12);
        assertEquals(5985.915492957746, BIAS.maxLedResistance(20e3, 1e3), 1e-6);
        assertEquals(1000, BIAS.maxBiasResistance(), 1e-9);
    }

    @Test
    void aNetworkWithinTheLimitsHasNoViolations() {
        ShuntOptoNetwork n = new ShuntOptoNetwork(38.3e3, 10e3, 4.7e3, 47e-9, 4.7e3, 1e3, 1.0, 20e3, 0, 1e-9, 0);
        assertEquals(List.of(), BIAS.violations(n));
    }

    @Test
    void tooLargeLedResistorIsReported() {
        List<String> v = BIAS.violations(6.8e3, 1e3, 20e3);
        assertEquals(1, v.size(), v.toString());
        assertTrue(v.get(0).startsWith("r_led"), v.get(0));
    }

    @Test
    void tooLargeBiasResistorIsReportedAndRaisesTheLedLimit() {
        // r_bias = 1.2k: i_bias = 0.8333 mA, r_led ≤ 8.5/1.25333 mA = 6781.9 Ω, so 4.7k passes.
        assertEquals(6781.914893617021, BIAS.maxLedResistance(20e3, 1.2e3), 1e-6);
        List<String> v = BIAS.violations(4.7e3, 1.2e3, 20e3);
        assertEquals(1, v.size(), v.toString());
        assertTrue(v.get(0).startsWith("r_bias"), v.get(0));
    }

    @Test
    void everyViolationIsReportedAtOnce() {
        assertEquals(2, BIAS.violations(10e3, 2.2e3, 20e3).size());
    }

    @Test
    void aLowOutputLeavesNoHeadroom() {
        // 3.3 − 1.0 − 2.5 = −0.2 V.
        List<String> v = ShuntOptoBias.withDefaults(3.3, 5, 0.8, 0.5).violations(100, 1e3, 20e3);
        assertEquals(1, v.size(), v.toString());
        assertTrue(v.get(0).contains("headroom"), v.get(0));
    }

    @Test
    void aPinMinimumAboveTheSupplyIsReported() {
        List<String> v = ShuntOptoBias.withDefaults(12, 3.3, 3.5, 0.5).violations(1e3, 1e3, 20e3);
        assertEquals(1, v.size(), v.toString());
        assertTrue(v.get(0).startsWith("fb_min"), v.get(0));
    }
}
