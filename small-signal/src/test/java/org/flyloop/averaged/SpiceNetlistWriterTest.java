package org.flyloop.averaged;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import org.flyloop.spec.StageSpec;
import org.junit.jupiter.api.Test;

/** Netlist structure without running a simulator (the numbers are checked by NgspiceCrossCheckTest). */
class SpiceNetlistWriterTest {

    private final StageSpec stage = AveragedTestStages.busConverter();
    private final AveragedFlybackModel model = new AveragedFlybackModel(stage, AveragedTestStages.voltageMode());
    private final Equilibrium op = model.regulatedEquilibrium(48, 2);
    private final SpiceNetlistWriter writer = new SpiceNetlistWriter(stage, AveragedTestStages.voltageMode());

    @Test
    void onlyTheChosenInputCarriesTheAcSource() {
        String net = writer.write(op, new AcSweep(10, 10, 50e3), AveragedInputs.VIN, "case1");
        long acSources = Arrays.stream(net.split("\n")).filter(l -> l.contains(" AC ")).count();
        assertEquals(1, acSources);
        assertTrue(line(net, "Vvg").endsWith("AC 0.5"), "1 V at the primary is 1/N at the secondary");
        assertFalse(line(net, "Vd").contains("AC"));
    }

    @Test
    void containsTheSweepAndTheOutputCommands() {
        String net = writer.write(op, new AcSweep(10, 10, 50e3), "case2");
        assertTrue(net.contains(".ac dec 10 10 50000\n"));
        assertTrue(net.contains("wrdata case2_ac.txt v(out) i(vil)\n"));
        assertTrue(net.contains("wrdata case2_op.txt v(out) i(vil) v(nd) v(nd2)\n"));
        assertTrue(net.contains(".control\n") && net.contains(".endc\n") && net.trim().endsWith(".end"));
        assertTrue(line(net, "Vd").startsWith("Vd nd 0 DC 0.343"));
        assertTrue(line(net, "Resr").equals("Resr out nc 0.02"));
    }

    @Test
    void omitsTheEsrResistorWhenThereIsNone() {
        StageSpec noEsr = stage.withEsr(0);
        AveragedFlybackModel m = new AveragedFlybackModel(noEsr, AveragedTestStages.voltageMode());
        String net = new SpiceNetlistWriter(noEsr, AveragedTestStages.voltageMode())
                .write(m.regulatedEquilibrium(48, 2), new AcSweep(10, 10, 50e3), "case3");
        assertFalse(net.contains("Resr"));
        assertTrue(line(net, "Cout").startsWith("Cout out 0 "));
    }

    @Test
    void refusesOutputNamesThatAreNotPlainFileNames() {
        assertThrows(IllegalArgumentException.class,
                () -> writer.write(op, new AcSweep(10, 10, 50e3), "../x"));
        assertThrows(IllegalArgumentException.class,
                () -> writer.write(op, new AcSweep(10, 10, 50e3), "a b"));
    }

    private static String line(String net, String element) {
        return Arrays.stream(net.split("\n")).filter(l -> l.startsWith(element + " ")).findFirst()
                .orElseThrow(() -> new AssertionError("no element " + element));
    }
}
