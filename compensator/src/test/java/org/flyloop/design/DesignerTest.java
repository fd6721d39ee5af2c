package org.flyloop.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import org.flyloop.eseries.ESeries;
import org.flyloop.network.NetworkKind;
import org.flyloop.network.PartNames;
import org.flyloop.network.PartRole;
import org.junit.jupiter.api.Test;

class DesignerTest {

    private static void assertOnSeries(DesignResult r) {
        for (Map.Entry<String, Double> e : r.rounded().parts().entrySet()) {
            PartRole role = PartNames.role(e.getKey());
            if (role == PartRole.RESISTOR) {
                assertTrue(ESeries.E96.contains(e.getValue()), e.getKey() + " = " + e.getValue() + " not in E96");
            } else if (role == PartRole.CAPACITOR && !e.getKey().equals(PartNames.C_OPTO)) {
                assertTrue(ESeries.E12.contains(e.getValue()), e.getKey() + " = " + e.getValue() + " not in E12");
            }
        }
    }

    @Test
    void voltageModeCcmOpAmpGetsTypeThreeAndMeetsTargets() {
        DesignResult r = Designer.design(DesignCases.voltageModeCcm(DesignCases.opamp(0)));
        assertEquals(NetworkKind.OPAMP_TYPE3, r.rounded().kind());
        assertTrue(r.targetsMet(), r.warnings().toString());
        assertOnSeries(r);
        // The gain is set at the corner with the largest stage gain at fc, so with ideal parts no
        // corner crosses above the design crossover (to the solver's accuracy).
        assertTrue(r.idealLoop().highestCrossoverHz() <= r.placement().crossoverHz() * (1 + 1e-6));
        assertEquals(r.placement().crossoverHz(), r.idealLoop().highestCrossoverHz(), 1e-6 * r.placement().crossoverHz());
        // Every crossover stays below each bound that applies.
        for (CrossoverLimit l : r.limits()) {
            assertTrue(r.placement().crossoverHz() <= l.frequencyHz() * (1 + 1e-9), l.toString());
        }
    }

    @Test
    void currentModeOtaGetsTypeTwo() {
        DesignResult r = Designer.design(DesignCases.currentMode(DesignCases.ota(1e-3)));
        assertEquals(NetworkKind.OTA, r.rounded().kind());
        assertTrue(r.targetsMet(), r.warnings().toString());
        assertOnSeries(r);
    }

    @Test
    void dcmOpAmpGetsTypeTwo() {
        DesignResult r = Designer.design(DesignCases.dcm(DesignCases.opamp(0)));
        assertEquals(NetworkKind.OPAMP_TYPE2, r.rounded().kind());
        assertTrue(r.targetsMet(), r.warnings().toString());
    }

    @Test
    void shuntOptoIsCheckedAtBothCtrExtremes() {
        DesignResult r = Designer.design(DesignCases.dcm(DesignCases.shuntOpto(0.5, 1.6, 8e3)));
        assertEquals(2 * 4, r.corners().size());
        assertTrue(r.corners().stream().anyMatch(c -> c.ctr() == 0.5));
        assertTrue(r.corners().stream().anyMatch(c -> c.ctr() == 1.6));
        // Loop gain scales with CTR: at each operating point the high-CTR corner crosses higher.
        var res = r.roundedLoop().results();
        for (int i = 0; i < res.size(); i += 2) {
            assertTrue(res.get(i + 1).margins().crossoverHz() > res.get(i).margins().crossoverHz());
        }
    }

    @Test
    void missedTargetsAreNamedPerCorner() {
        // A type 1 (integrator-only) network cannot give a voltage-mode CCM stage 50° of phase
        // margin at 2 kHz: above the LC double pole the stage alone lags by nearly 180°.
        DesignRequest base = DesignCases.voltageModeCcm(DesignCases.opamp(1));
        DesignRequest hard = new DesignRequest(base.stage(), base.control(), base.feedback(),
                new org.flyloop.spec.TargetsSpec(2e3, 50, 10, 0.25), base.series());
        DesignResult r = Designer.design(hard);
        assertTrue(!r.targetsMet());
        assertEquals(NetworkKind.OPAMP_TYPE1, r.rounded().kind());
        assertTrue(r.warnings().stream().anyMatch(w -> w.startsWith("target missed at vin=")), r.warnings().toString());
    }
}
