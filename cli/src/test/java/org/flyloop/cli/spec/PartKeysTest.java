package org.flyloop.cli.spec;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.flyloop.cli.spec.SpecSection.Sign;
import org.flyloop.network.CompensatorNetwork;
import org.flyloop.network.OpAmpType1Network;
import org.flyloop.network.OpAmpType2Network;
import org.flyloop.network.OpAmpType3Network;
import org.flyloop.network.OtaType2Network;
import org.flyloop.network.PartNames;
import org.flyloop.network.PartRole;
import org.flyloop.network.ShuntOptoNetwork;
import org.flyloop.spec.AmplifierKind;
import org.flyloop.units.Unit;
import org.junit.jupiter.api.Test;

/**
 * The spec's part keys agree with the compensator module: every contract name is known, each
 * amplifier accepts exactly the parts its networks report, and a spec's parts map is accepted by
 * the network's own reader.
 */
class PartKeysTest {

    /** Networks with every optional part present, so that {@code parts()} lists all of them. */
    private static final Map<AmplifierKind, List<CompensatorNetwork>> NETWORKS = Map.of(
            AmplifierKind.OPAMP, List.of(
                    new OpAmpType1Network(30e3, 10e3, 10e-9, 1e6),
                    new OpAmpType2Network(30e3, 10e3, 22e3, 10e-9, 220e-12, 1e6),
                    new OpAmpType3Network(30e3, 10e3, 22e3, 10e-9, 220e-12, 1e3, 4.7e-9, 1e6)),
            AmplifierKind.OTA, List.of(new OtaType2Network(200e-6, 30e3, 10e3, 22e3, 10e-9, 220e-12)),
            AmplifierKind.SHUNT_OPTO, List.of(
                    new ShuntOptoNetwork(38.3e3, 10e3, 22e3, 10e-9, 1e3, 1.2e3, 1.0, 4.7e3, 2e-9, 470e-12, 20)));

    @Test
    void everyContractNameIsKnownWithAUnit() {
        assertEquals(18, PartKeys.ALL.size(), "PartNames declares 18 names: " + PartKeys.ALL);
        for (String name : PartKeys.ALL) {
            PartRole role = assertDoesNotThrow(() -> PartNames.role(name), name);
            Unit unit = PartKeys.unit(name);
            if (role == PartRole.RESISTOR) {
                assertEquals(Unit.OHM, unit, name);
            } else if (role == PartRole.CAPACITOR) {
                assertEquals(Unit.FARAD, unit, name);
            }
        }
        assertEquals(Unit.HERTZ, PartKeys.unit(PartNames.GBW));
        assertEquals(Unit.HERTZ, PartKeys.unit(PartNames.OPTO_POLE));
        assertEquals(Unit.SIEMENS, PartKeys.unit(PartNames.GM));
        assertEquals(Unit.DIMENSIONLESS, PartKeys.unit(PartNames.CTR));
        assertEquals(Unit.FARAD, PartKeys.unit(PartNames.C_OPTO));
        assertEquals(Unit.OHM, PartKeys.unit(PartNames.R_LED_DYNAMIC));
    }

    @Test
    void eachAmplifierTakesWhatItsNetworksReport() {
        for (AmplifierKind amplifier : AmplifierKind.values()) {
            Set<String> reported = new HashSet<>();
            NETWORKS.get(amplifier).forEach(n -> reported.addAll(n.parts().keySet()));
            if (amplifier == AmplifierKind.SHUNT_OPTO) {
                // Accepted as input in place of c_opto, never reported (PartNames.OPTO_POLE).
                reported.add(PartNames.OPTO_POLE);
            }
            assertEquals(reported, Set.copyOf(PartKeys.of(amplifier)), amplifier.specName());
        }
    }

    @Test
    void zeroIsAllowedWhereTheNetworksTakeZeroAsAbsent() {
        // ShuntOptoNetwork checks r_zero, c_opto, c_pullup and r_led_dynamic with "zero or positive".
        assertDoesNotThrow(() -> new ShuntOptoNetwork(38.3e3, 10e3, 0, 10e-9, 1e3, 1.2e3, 1.0, 4.7e3, 0, 0, 0));
        for (String name : List.of(PartNames.R_ZERO, PartNames.C_OPTO, PartNames.C_PULLUP, PartNames.R_LED_DYNAMIC)) {
            assertEquals(Sign.ZERO_OR_POSITIVE, PartKeys.sign(name), name);
        }
        assertEquals(Sign.POSITIVE, PartKeys.sign(PartNames.C_ZERO));
        assertEquals(Sign.POSITIVE, PartKeys.sign(PartNames.CTR));
    }

    @Test
    void aSpecsPartsBuildTheNetwork() {
        Spec spec = SpecLoader.load(SpecFixtures.OPAMP_TYPE3);
        OpAmpType3Network n = assertDoesNotThrow(() -> OpAmpType3Network.fromParts(spec.feedback().parts()));
        assertEquals(22e3, n.rZero(), 22e3 * 1e-12);
        assertEquals(1e6, n.gbwHz(), 1e6 * 1e-12);
    }
}
