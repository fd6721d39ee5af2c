package org.flyloop.averaged;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.apache.commons.math3.complex.Complex;
import org.flyloop.spec.ControlSpec;
import org.flyloop.spec.StageSpec;
import org.flyloop.stage.ConductionMode;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The exported netlist, solved and linearized by ngspice (its own Newton DC solution and analytic
 * derivatives of the B-source expressions), against our equilibrium and central-difference
 * linearization: within 0.1 dB and 0.5° from 10 Hz to fsw/2, on the lossy stage (Rds, Vf, ESR).
 */
class NgspiceCrossCheckTest {

    @TempDir
    Path dir;

    @ParameterizedTest(name = "{0} mode, {1} A, AC on {2}")
    @CsvSource({
        "voltage, 2.0, control, CCM",
        "voltage, 0.2, control, DCM",
        "voltage, 2.0, vin, CCM",
        "voltage, 0.2, vin, DCM",
        "current, 2.0, control, CCM",
        "current, 0.2, control, DCM",
    })
    void ngspiceAgreesWithTheNumericalLinearization(String scheme, double ioutA, String input, ConductionMode mode)
            throws Exception {
        StageSpec stage = AveragedTestStages.busConverter();
        ControlSpec control = scheme.equals("voltage") ? AveragedTestStages.voltageMode()
                : AveragedTestStages.currentMode();
        AveragedFlybackModel model = new AveragedFlybackModel(stage, control);
        Equilibrium e = model.regulatedEquilibrium(48, ioutA);
        assertEquals(mode, e.mode());
        int acInput = AveragedInputs.NAMES.indexOf(input);
        String base = "flyback_" + scheme + "_" + input + "_" + mode;
        String netlist = new SpiceNetlistWriter(stage, control)
                .write(e, new AcSweep(20, 10, stage.fswHz() / 2), acInput, base);
        Ngspice.Result r = Ngspice.run(dir, netlist, base);

        double[] op = r.op().get(0);
        assertEquals(e.voutV(), op[1], 1e-6 * e.voutV(), "DC output voltage");
        assertEquals(e.ilSecondaryA(), op[2], 1e-6 * e.ilSecondaryA(), "DC magnetizing current");
        assertEquals(e.duty(), op[3], 1e-6 * e.duty(), "DC duty");

        LinearizedModel lin = model.linearize(e);
        double worstDb = 0;
        double worstDeg = 0;
        for (double[] row : r.ac()) {
            double f = row[0];
            Complex spice = new Complex(row[1], row[2]);
            Complex ours = lin.response(0, acInput, f);
            worstDb = Math.max(worstDb, Math.abs(20 * Math.log10(spice.abs() / ours.abs())));
            worstDeg = Math.max(worstDeg, Math.abs(Math.toDegrees(spice.divide(ours).getArgument())));
        }
        assertTrue(r.ac().size() >= 60, "sweep points: " + r.ac().size());
        assertTrue(worstDb <= 0.1 && worstDeg <= 0.5, "worst " + worstDb + " dB, " + worstDeg + " deg");
    }
}
