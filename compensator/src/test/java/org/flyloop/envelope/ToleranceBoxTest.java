package org.flyloop.envelope;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.flyloop.design.DesignRequest;
import org.flyloop.design.Designer;
import org.flyloop.network.CompensatorNetwork;
import org.flyloop.network.OpAmpType3Network;
import org.flyloop.spec.StageSpec;
import org.flyloop.spec.Tolerance;
import org.flyloop.spec.TolerancesSpec;
import org.junit.jupiter.api.Test;

class ToleranceBoxTest {

    private static List<String> names(ToleranceBox box) {
        return box.parameters().stream().map(ToleranceParameter::name).toList();
    }

    private static ToleranceBox box(DesignRequest r, CompensatorNetwork n, TolerancesSpec t, boolean sampleCtr) {
        return ToleranceBox.of(r.stage(), n, t, r.feedback(), SweepGrid.logarithmic(0.1, 50e3, 100), sampleCtr);
    }

    @Test
    void partsThatCannotMoveTheLoopAreLeftOut() {
        DesignRequest r = EnvelopeCases.voltageModeCcm(EnvelopeCases.opamp(3));
        CompensatorNetwork ideal = EnvelopeCases.tunedAtNominal();
        // an ideal op-amp holds its inverting input at virtual earth: r_lower sets only the DC point
        assertEquals(List.of("stage.lm", "stage.cout", "stage.esr", "stage.fsw", "parts.r_upper", "parts.r_zero",
                "parts.c_zero", "parts.c_pole", "parts.r_ff", "parts.c_ff"), names(box(r, ideal, EnvelopeCases.full(), false)));
        // a finite gain-bandwidth makes the noise gain, and so r_lower, count
        CompensatorNetwork real = ((OpAmpType3Network) ideal).withGainBandwidth(1e6);
        assertTrue(names(box(r, real, EnvelopeCases.full(), false)).contains("parts.r_lower"));
    }

    @Test
    void anIdealLedLeavesTheBiasResistorOut() {
        DesignRequest r = EnvelopeCases.dcm(EnvelopeCases.shuntOpto(0.5, 1.6, 8e3));
        CompensatorNetwork n = Designer.design(r).rounded();
        List<String> names = names(box(r, n, EnvelopeCases.partsOnly(), false));
        assertFalse(names.contains("parts.r_bias"), names.toString());
        assertFalse(names.contains("parts.r_lower"), names.toString());
        assertTrue(names.contains("parts.r_led"), names.toString());
    }

    @Test
    void zeroWidthBandsAndAZeroEsrAreLeftOut() {
        DesignRequest r = EnvelopeCases.voltageModeCcm(EnvelopeCases.opamp(3));
        StageSpec noEsr = r.stage().withEsr(0);
        TolerancesSpec t = new TolerancesSpec(Tolerance.symmetric(0.2), Tolerance.NONE, Tolerance.symmetric(0.5),
                Tolerance.NONE, false, Tolerance.NONE, Tolerance.NONE);
        ToleranceBox b = ToleranceBox.of(noEsr, EnvelopeCases.tunedAtNominal(), t, r.feedback(),
                SweepGrid.logarithmic(0.1, 50e3, 100), false);
        assertEquals(List.of("stage.lm"), names(b));
    }

    @Test
    void vertexPointsGiveTheBandEnds() {
        DesignRequest r = EnvelopeCases.voltageModeCcm(EnvelopeCases.opamp(3));
        CompensatorNetwork n = EnvelopeCases.tunedAtNominal();
        ToleranceBox b = box(r, n, EnvelopeCases.full(), false);
        double[] u = new double[b.size()];
        u[0] = 1;   // lm high
        u[2] = 0;   // esr low
        u[6] = 1;   // c_zero high
        StageSpec s = b.stageAt(r.stage(), u);
        assertEquals(60e-6 * 1.2, s.lm(), 1e-18);
        assertEquals(20e-3 * 0.5, s.esr(), 1e-15);
        assertEquals(2200e-6 * 0.8, s.cout(), 1e-15);
        Map<String, Double> parts = b.partsAt(n, u);
        assertEquals(470e-12 * 1.1, parts.get("c_zero"), 1e-24);
        assertEquals(38.3e3 * 0.99, parts.get("r_upper"), 1e-9);
        assertEquals(0.2, b.deviations(u).get("stage.lm"), 1e-15);
        assertEquals(-0.5, b.deviations(u).get("stage.esr"), 1e-15);
    }

    @Test
    void aSampledCtrSpansFeedbackCtr() {
        DesignRequest r = EnvelopeCases.dcm(EnvelopeCases.shuntOpto(0.5, 1.6, 8e3));
        CompensatorNetwork n = Designer.design(r).rounded();
        ToleranceBox b = box(r, n, TolerancesSpec.none(), true);
        assertEquals(List.of("ctr"), names(b));
        assertEquals(0.5, b.ctrAt(new double[] {0}), 1e-12);
        assertEquals(1.6, b.ctrAt(new double[] {1}), 1e-12);
    }
}
