package org.flyloop.envelope;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import org.flyloop.network.CompensatorNetwork;
import org.flyloop.network.NetworkKind;
import org.flyloop.spec.FeedbackSpec;
import org.flyloop.spec.StageSpec;
import org.junit.jupiter.api.Test;

class GivenNetworkTest {

    private static final StageSpec STAGE = EnvelopeCases.voltageModeCcm(EnvelopeCases.opamp(0)).stage();

    private static FeedbackSpec opampAuto(Map<String, Double> parts) {
        return EnvelopeCases.opamp(0).withParts(parts);
    }

    @Test
    void anAutoOpAmpTypeIsReadFromItsParts() {
        assertEquals(NetworkKind.OPAMP_TYPE1, GivenNetwork.kindOf(opampAuto(Map.of("c_fb", 1e-9))));
        assertEquals(NetworkKind.OPAMP_TYPE3, GivenNetwork.kindOf(opampAuto(Map.of("r_ff", 1e3))));
        assertEquals(NetworkKind.OPAMP_TYPE3, GivenNetwork.kindOf(opampAuto(Map.of("c_ff", 1e-9))));
        assertEquals(NetworkKind.OPAMP_TYPE2, GivenNetwork.kindOf(opampAuto(Map.of("r_zero", 1e3))));
        assertEquals(NetworkKind.OPAMP_TYPE3, GivenNetwork.kindOf(EnvelopeCases.opamp(3).withParts(Map.of())));
    }

    @Test
    void theDividerIsCompletedThroughTheReference() {
        // feedback.r_lower = 10 kΩ, reference 2.5 V, vout 12 V: r_upper = 10k·(12 − 2.5)/2.5 = 38 kΩ
        CompensatorNetwork n = GivenNetwork.from(opampAuto(Map.of("r_zero", 10e3, "c_zero", 10e-9,
                "c_pole", 1e-9)), STAGE);
        assertEquals(NetworkKind.OPAMP_TYPE2, n.kind());
        assertEquals(38e3, n.parts().get("r_upper"), 1e-9);
        assertEquals(10e3, n.parts().get("r_lower"), 1e-12);
    }

    @Test
    void shuntOptoTakesItsDeviceValuesFromTheFeedbackKeys() {
        FeedbackSpec fb = EnvelopeCases.shuntOpto(0.5, 2.0, 8e3).withParts(Map.of("r_zero", 4.7e3, "c_zero", 22e-9,
                "r_led", 1e3, "r_bias", 1e3));
        CompensatorNetwork n = GivenNetwork.from(fb, STAGE);
        assertEquals(1.0, n.parts().get("ctr"), 1e-12); // √(0.5·2.0)
        assertEquals(10e3, n.parts().get("r_pullup"));
        // the optocoupler pole at 8 kHz with the 10 kΩ pull-up
        assertEquals(1 / (2 * Math.PI * 8e3 * 10e3), n.parts().get("c_opto"), 1e-20);
    }

    @Test
    void missingOrForeignPartsAreNamed() {
        IllegalArgumentException none = assertThrows(IllegalArgumentException.class,
                () -> GivenNetwork.from(opampAuto(Map.of()), STAGE));
        assertTrue(none.getMessage().contains("no parts"), none.getMessage());
        IllegalArgumentException missing = assertThrows(IllegalArgumentException.class,
                () -> GivenNetwork.from(opampAuto(Map.of("r_zero", 10e3, "c_zero", 10e-9)), STAGE));
        assertTrue(missing.getMessage().contains("c_pole"), missing.getMessage());
        IllegalArgumentException foreign = assertThrows(IllegalArgumentException.class,
                () -> GivenNetwork.from(EnvelopeCases.opamp(2).withParts(Map.of("r_zero", 10e3, "c_zero", 10e-9,
                        "c_pole", 1e-9, "r_ff", 1e3)), STAGE));
        assertTrue(foreign.getMessage().contains("r_ff"), foreign.getMessage());
    }
}
