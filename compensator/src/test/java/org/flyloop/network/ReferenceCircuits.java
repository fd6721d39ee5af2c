package org.flyloop.network;

import org.apache.commons.math3.complex.Complex;

/**
 * The actual circuits of the networks, drawn as nodal netlists from their part values, and the
 * reference response −v_c/v_out they give with a 1 V AC source on the regulated output. Nothing
 * here uses the closed-form transfer functions.
 */
final class ReferenceCircuits {
    private static final String OUT = "vout";
    private static final String CONTROL = "vc";

    private ReferenceCircuits() {
    }

    /** −v_c/v_out from the nodal solve of the network's circuit. */
    static Complex response(CompensatorNetwork network, double frequencyHz) {
        NodalCircuit c = netlist(network);
        return c.voltage(CONTROL, frequencyHz).negate();
    }

    static NodalCircuit netlist(CompensatorNetwork network) {
        if (network instanceof OpAmpType1Network n) {
            NodalCircuit c = opAmpFrame(n.rUpper(), n.rLower(), n.gbwHz());
            c.capacitor(CONTROL, "inv", n.cFb());
            return c;
        }
        if (network instanceof OpAmpType2Network n) {
            NodalCircuit c = opAmpFrame(n.rUpper(), n.rLower(), n.gbwHz());
            zeroBranch(c, CONTROL, "inv", n.rZero(), n.cZero());
            c.capacitor(CONTROL, "inv", n.cPole());
            return c;
        }
        if (network instanceof OpAmpType3Network n) {
            NodalCircuit c = opAmpFrame(n.rUpper(), n.rLower(), n.gbwHz());
            zeroBranch(c, CONTROL, "inv", n.rZero(), n.cZero());
            c.capacitor(CONTROL, "inv", n.cPole());
            c.resistor(OUT, "ff", n.rFf());
            c.capacitor("ff", "inv", n.cFf());
            return c;
        }
        if (network instanceof OtaType2Network n) {
            return ota(n);
        }
        if (network instanceof ShuntOptoNetwork n) {
            return shuntOpto(n);
        }
        throw new IllegalArgumentException("no reference circuit for " + network);
    }

    /** Source on the output, divider into the inverting input, op-amp (+ input at AC ground). */
    private static NodalCircuit opAmpFrame(double rUpper, double rLower, double gbwHz) {
        NodalCircuit c = new NodalCircuit();
        c.voltageSource(OUT, NodalCircuit.GROUND, 1);
        c.resistor(OUT, "inv", rUpper);
        c.resistor("inv", NodalCircuit.GROUND, rLower);
        if (Double.isInfinite(gbwHz)) {
            c.nullor(CONTROL, NodalCircuit.GROUND, "inv");
        } else {
            // Single-pole open-loop gain A(jω) = 2π·gbw/(jω).
            double wt = 2 * Math.PI * gbwHz;
            c.vcvs(CONTROL, NodalCircuit.GROUND, "inv", w -> new Complex(0, -wt / w));
        }
        return c;
    }

    private static void zeroBranch(NodalCircuit c, String a, String b, double r, double cap) {
        String mid = a + "_" + b + "_rc";
        c.resistor(a, mid, r);
        c.capacitor(mid, b, cap);
    }

    private static NodalCircuit ota(OtaType2Network n) {
        NodalCircuit c = new NodalCircuit();
        c.voltageSource(OUT, NodalCircuit.GROUND, 1);
        c.resistor(OUT, "fb", n.rUpper());
        c.resistor("fb", NodalCircuit.GROUND, n.rLower());
        // Output current gm·(v+ − v−) with v+ at the (AC-grounded) reference, into the output node.
        c.vccs(NodalCircuit.GROUND, CONTROL, NodalCircuit.GROUND, "fb", n.gm());
        zeroBranch(c, CONTROL, NodalCircuit.GROUND, n.rZero(), n.cZero());
        c.capacitor(CONTROL, NodalCircuit.GROUND, n.cPole());
        return c;
    }

    /**
     * Output source; divider into the shunt regulator's reference; r_zero + c_zero (or c_zero
     * alone) from cathode to reference; r_led from the output to the LED anode; r_bias across the
     * LED; the LED as a 0 V source (its fixed drop) behind its dynamic resistance, whose current
     * drives a CCCS of gain CTR sinking current from the feedback pin; the pin's r_pullup (to a
     * supply that is AC ground), c_opto and c_pullup. The shunt regulator is a nullor: its
     * reference is held exactly at the (AC-grounded) internal reference, its cathode sinks whatever
     * current that takes.
     */
    private static NodalCircuit shuntOpto(ShuntOptoNetwork n) {
        NodalCircuit c = new NodalCircuit();
        c.voltageSource(OUT, NodalCircuit.GROUND, 1);
        c.resistor(OUT, "ref", n.rUpper());
        c.resistor("ref", NodalCircuit.GROUND, n.rLower());
        if (n.rZero() > 0) {
            zeroBranch(c, "cathode", "ref", n.rZero(), n.cZero());
        } else {
            c.capacitor("cathode", "ref", n.cZero());
        }
        c.nullor("cathode", "ref", NodalCircuit.GROUND);
        c.resistor(OUT, "anode", n.rLed());
        c.resistor("anode", "cathode", n.rBias());
        String junction = "anode";
        if (n.rLedDynamic() > 0) {
            c.resistor("anode", "led", n.rLedDynamic());
            junction = "led";
        }
        int led = c.voltageSource(junction, "cathode", 0);
        c.resistor(CONTROL, NodalCircuit.GROUND, n.rPullup());
        if (n.cOpto() > 0) {
            c.capacitor(CONTROL, NodalCircuit.GROUND, n.cOpto());
        }
        if (n.cPullup() > 0) {
            c.capacitor(CONTROL, NodalCircuit.GROUND, n.cPullup());
        }
        c.cccs(CONTROL, NodalCircuit.GROUND, led, n.ctr());
        return c;
    }
}
