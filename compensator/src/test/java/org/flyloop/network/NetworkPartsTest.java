package org.flyloop.network;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.flyloop.eseries.ESeries;
import org.junit.jupiter.api.Test;

/** The part names as a contract, building from parts, replacing parts, and validation. */
class NetworkPartsTest {

    private static final OpAmpType3Network TYPE3 =
            OpAmpType3Network.ideal(10e3, 2.61e3, 22e3, 10e-9, 220e-12, 1e3, 4.7e-9);
    private static final ShuntOptoNetwork SHUNT =
            new ShuntOptoNetwork(38.3e3, 10e3, 4.7e3, 47e-9, 1e3, 1e3, 1.0, 20e3, 470e-12, 1e-9, 0);

    @Test
    void partNamesAreTheContractNames() {
        assertEquals(List.of("r_upper", "r_lower", "c_fb"),
                List.copyOf(OpAmpType1Network.ideal(10e3, 2.61e3, 47e-9).parts().keySet()));
        assertEquals(List.of("r_upper", "r_lower", "r_zero", "c_zero", "c_pole", "gbw"),
                List.copyOf(OpAmpType2Network.ideal(10e3, 2.61e3, 22e3, 10e-9, 220e-12)
                        .withGainBandwidth(1e6).parts().keySet()));
        assertEquals(List.of("r_upper", "r_lower", "r_zero", "c_zero", "c_pole", "r_ff", "c_ff"),
                List.copyOf(TYPE3.parts().keySet()));
        assertEquals(List.of("gm", "r_upper", "r_lower", "r_zero", "c_zero", "c_pole"),
                List.copyOf(new OtaType2Network(2e-4, 37.4e3, 10e3, 15e3, 33e-9, 470e-12).parts().keySet()));
        assertEquals(List.of("r_upper", "r_lower", "r_zero", "c_zero", "r_led", "r_bias", "ctr", "r_pullup",
                "c_opto", "c_pullup"), List.copyOf(SHUNT.parts().keySet()));
    }

    @Test
    void partsAreImmutable() {
        assertThrows(UnsupportedOperationException.class, () -> TYPE3.parts().put("r_upper", 1.0));
    }

    @Test
    void everyNetworkRebuildsFromItsOwnParts() {
        List<CompensatorNetwork> all = List.of(OpAmpType1Network.ideal(10e3, 2.61e3, 47e-9),
                OpAmpType2Network.ideal(10e3, 2.61e3, 22e3, 10e-9, 220e-12).withGainBandwidth(1e6), TYPE3,
                new OtaType2Network(2e-4, 37.4e3, 10e3, 15e3, 33e-9, 470e-12), SHUNT,
                new ShuntOptoNetwork(38.3e3, 10e3, 0, 47e-9, 1e3, 1e3, 1.0, 20e3, 0, 0, 30));
        for (CompensatorNetwork n : all) {
            assertEquals(n, n.kind().fromParts(n.parts()), n.kind().specName());
            assertEquals(n.kind(), NetworkKind.parse(n.kind().specName()));
        }
    }

    @Test
    void roundingPartsToPreferredValuesGivesAValidNetwork() {
        OpAmpType2Network placed = OpAmpType2Network.place(FeedbackDivider.forOutput(10e3, 12, 2.5),
                GainTarget.atFrequency(3.2, 2e3), 500, 8e3);
        Map<String, Double> rounded = new HashMap<>();
        placed.parts().forEach((name, value) -> {
            switch (PartNames.role(name)) {
                case RESISTOR -> rounded.put(name, ESeries.E96.nearest(value));
                case CAPACITOR -> rounded.put(name, ESeries.E12.nearest(value));
                default -> { }
            }
        });
        CompensatorNetwork n = placed.withParts(rounded);
        assertEquals(ESeries.E96.nearest(placed.rZero()), n.parts().get(PartNames.R_ZERO), 0);
        assertTrue(ESeries.E12.contains(n.parts().get(PartNames.C_ZERO)));
        NodalAgreement.assertAgrees(n);
    }

    @Test
    void optoPoleIsAcceptedInPlaceOfItsCapacitance() {
        Map<String, Double> parts = new LinkedHashMap<>(SHUNT.parts());
        parts.remove(PartNames.C_OPTO);
        parts.remove(PartNames.C_PULLUP);
        parts.put(PartNames.OPTO_POLE, 12e3);
        ShuntOptoNetwork n = ShuntOptoNetwork.fromParts(parts);
        assertEquals(1 / (2 * Math.PI * 12e3 * 20e3), n.cOpto(), 1e-24);
        RootAssertions.assertRealRootsAtHz(n.transferFunction().poles(), 12e3);
        parts.put(PartNames.C_OPTO, 1e-9);
        assertThrows(IllegalArgumentException.class, () -> ShuntOptoNetwork.fromParts(parts));
    }

    @Test
    void unknownAndMissingPartsAreReported() {
        Map<String, Double> parts = new LinkedHashMap<>(TYPE3.parts());
        parts.put("r_zer0", 1e3);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> OpAmpType3Network.fromParts(parts));
        assertTrue(e.getMessage().contains("r_zer0"), e.getMessage());
        parts.remove("r_zer0");
        parts.remove(PartNames.C_FF);
        e = assertThrows(IllegalArgumentException.class, () -> OpAmpType3Network.fromParts(parts));
        assertTrue(e.getMessage().contains("c_ff"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> TYPE3.withParts(Map.of("c_fb", 1e-9)));
        assertThrows(IllegalArgumentException.class, () -> PartNames.role("r_nothing"));
        assertThrows(IllegalArgumentException.class, () -> NetworkKind.parse("type-4"));
    }

    @Test
    void partsMustBePositiveAndFinite() {
        assertThrows(IllegalArgumentException.class, () -> OpAmpType1Network.ideal(0, 2.61e3, 47e-9));
        assertThrows(IllegalArgumentException.class, () -> OpAmpType1Network.ideal(10e3, -1, 47e-9));
        assertThrows(IllegalArgumentException.class, () -> OpAmpType1Network.ideal(10e3, 2.61e3, Double.NaN));
        assertThrows(IllegalArgumentException.class,
                () -> OpAmpType2Network.ideal(10e3, 2.61e3, 22e3, Double.POSITIVE_INFINITY, 220e-12));
        assertThrows(IllegalArgumentException.class,
                () -> OpAmpType2Network.ideal(10e3, 2.61e3, 22e3, 10e-9, 220e-12).withGainBandwidth(0));
        assertThrows(IllegalArgumentException.class,
                () -> new OtaType2Network(0, 37.4e3, 10e3, 15e3, 33e-9, 470e-12));
        assertThrows(IllegalArgumentException.class,
                () -> new ShuntOptoNetwork(38.3e3, 10e3, -1, 47e-9, 1e3, 1e3, 1.0, 20e3, 0, 0, 0));
        assertThrows(IllegalArgumentException.class,
                () -> new ShuntOptoNetwork(38.3e3, 10e3, 0, 47e-9, 1e3, 1e3, 1.0, 20e3, 0, -1e-12, 0));
        assertThrows(IllegalArgumentException.class,
                () -> new ShuntOptoNetwork(38.3e3, 10e3, 0, 47e-9, 1e3, 1e3, 0, 20e3, 0, 0, 0));
    }

    @Test
    void rolesTellResistorsCapacitorsAndDeviceProperties() {
        assertEquals(PartRole.RESISTOR, PartNames.role("r_led"));
        assertEquals(PartRole.CAPACITOR, PartNames.role("c_pullup"));
        assertEquals(PartRole.DEVICE, PartNames.role("c_opto"));
        assertEquals(PartRole.DEVICE, PartNames.role("ctr"));
        assertEquals(PartRole.DEVICE, PartNames.role("gbw"));
    }
}
