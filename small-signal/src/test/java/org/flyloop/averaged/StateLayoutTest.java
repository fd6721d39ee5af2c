package org.flyloop.averaged;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.junit.jupiter.api.Test;

/** The flyback's layout is the magnetizing current followed by the output network's states. */
class StateLayoutTest {

    @Test
    void flybackLayoutIsMagnetizingCurrentThenCapacitor() {
        AveragedFlybackCircuit c = new AveragedFlybackModel(AveragedTestStages.busConverter(),
                AveragedTestStages.voltageMode()).circuit(6);
        assertEquals(List.of("il", "vc"), c.layout().names());
        assertEquals(AveragedFlybackCircuit.IL, c.layout().indexOf("il"));
        assertEquals(List.of("vout", "il"), c.outputNames());
    }

    @Test
    void extendingKeepsOrderAndRefusesDuplicates() {
        StateLayout base = StateLayout.of(List.of(new StateVariable("il", "A", 1)));
        StateLayout more = base.followedBy(List.of(new StateVariable("vc", "V", 12),
                new StateVariable("ilf", "A", 1)));
        assertEquals(2, more.indexOf("ilf"));
        assertEquals(5.0, more.scaleOf(0, -5), 0);
        assertEquals(12.0, more.scaleOf(1, 0.5), 0);
        assertThrows(IllegalArgumentException.class,
                () -> base.followedBy(List.of(new StateVariable("il", "A", 1))));
        assertThrows(IllegalArgumentException.class, () -> more.indexOf("nope"));
    }
}
