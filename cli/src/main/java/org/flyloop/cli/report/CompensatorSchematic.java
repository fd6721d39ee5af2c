package org.flyloop.cli.report;

import java.util.Map;
import org.flyloop.cli.plot.Canvas;
import org.flyloop.cli.plot.Drawing;
import org.flyloop.cli.plot.SiText;
import org.flyloop.cli.plot.TextStyle;
import org.flyloop.network.CompensatorNetwork;
import org.flyloop.network.NetworkKind;
import org.flyloop.network.PartNames;

/**
 * The compensator as a small schematic: op-amp types 1–3, the OTA, and the shunt regulator with
 * LED, optocoupler and pull-up. Every part carries its contract name ({@link PartNames}) and its
 * value, so the drawing and the parts table read the same.
 */
public final class CompensatorSchematic implements Drawing {

    private static final double WIDTH = 760;
    private static final double HEIGHT = 320;

    private final CompensatorNetwork network;
    private final Map<String, Double> parts;
    private final double referenceV;
    private final double pullupSupplyV;

    /**
     * @param network       the network to draw (normally with standard part values)
     * @param referenceV    amplifier or shunt-regulator reference, V
     * @param pullupSupplyV supply of the feedback-pin pull-up, V (shunt-opto only; NaN otherwise)
     */
    public CompensatorSchematic(CompensatorNetwork network, double referenceV, double pullupSupplyV) {
        this.network = network;
        this.parts = network.parts();
        this.referenceV = referenceV;
        this.pullupSupplyV = pullupSupplyV;
    }

    @Override
    public String title() {
        return "Compensator schematic: " + network.kind().specName();
    }

    @Override
    public double width() {
        return WIDTH;
    }

    @Override
    public double height() {
        return HEIGHT;
    }

    @Override
    public void paint(Canvas canvas) {
        SchematicKit k = new SchematicKit(canvas);
        switch (network.kind()) {
            case OPAMP_TYPE1, OPAMP_TYPE2, OPAMP_TYPE3 -> opAmp(k);
            case OTA -> ota(k);
            case SHUNT_OPTO -> shuntOpto(k);
            default -> throw new IllegalStateException("no schematic for " + network.kind());
        }
    }

    private String v(String name) {
        return PartText.value(name, parts.get(name));
    }

    private boolean has(String name) {
        return parts.containsKey(name);
    }

    /** Inverting integrator; type 2 adds the zero branch and c_pole, type 3 the r_ff–c_ff pair. */
    private void opAmp(SchematicKit k) {
        double rail = 190;
        k.terminal(40, rail, "Vout", TextStyle.Anchor.MIDDLE);
        k.wire(40, rail, 70, rail);
        k.dot(70, rail);
        k.resistor(70, rail, 230, rail, PartNames.R_UPPER, v(PartNames.R_UPPER));
        if (network.kind() == NetworkKind.OPAMP_TYPE3) {
            k.wire(70, rail, 70, 262, 90, 262);
            k.resistor(90, 262, 160, 262, PartNames.R_FF, v(PartNames.R_FF));
            k.capacitor(160, 262, 230, 262, PartNames.C_FF, v(PartNames.C_FF));
            k.wire(230, 262, 250, 262, 250, rail);
        }
        k.wire(230, rail, 330, rail);
        k.dot(250, rail);
        k.dot(290, rail);
        k.resistor(290, rail, 290, 270, PartNames.R_LOWER, v(PartNames.R_LOWER));
        k.ground(290, 270);
        double[] amp = k.amplifier(400, rail - 22, "");
        k.wire(330, rail, 400, amp[0]);
        k.wire(330, rail, 330, 110);
        double out = 520;
        k.wire(amp[2], amp[3], out, amp[3]);
        k.dot(out, amp[3]);
        if (network.kind() == NetworkKind.OPAMP_TYPE1) {
            k.capacitor(330, 110, out, 110, PartNames.C_FB, v(PartNames.C_FB));
        } else {
            k.resistor(330, 110, 425, 110, PartNames.R_ZERO, v(PartNames.R_ZERO));
            k.capacitor(425, 110, out, 110, PartNames.C_ZERO, v(PartNames.C_ZERO));
            k.wire(330, 110, 330, 50);
            k.dot(330, 110);
            k.capacitor(330, 50, out, 50, PartNames.C_POLE, v(PartNames.C_POLE));
            k.wire(out, 50, out, 110);
            k.dot(out, 110);
        }
        k.wire(out, 110, out, amp[3]);
        k.wire(400, amp[1], 370, amp[1], 370, 262);
        reference(k, 370, 262);
        k.wire(out, amp[3], 640, amp[3]);
        k.terminal(640, amp[3], "v_c to PWM", TextStyle.Anchor.START);
        String gbw = has(PartNames.GBW) ? "GBW " + v(PartNames.GBW) : "ideal op-amp";
        k.note(430, amp[3] + 58, gbw, TextStyle.Anchor.START);
    }

    /** Divider into the OTA; zero branch and c_pole from its output to ground. */
    private void ota(SchematicKit k) {
        k.terminal(40, 50, "Vout", TextStyle.Anchor.MIDDLE);
        k.wire(40, 50, 110, 50);
        k.resistor(110, 50, 110, 150, PartNames.R_UPPER, v(PartNames.R_UPPER));
        k.dot(110, 150);
        k.resistor(110, 150, 110, 270, PartNames.R_LOWER, v(PartNames.R_LOWER));
        k.ground(110, 270);
        double[] amp = k.amplifier(300, 128, "gm");
        k.wire(110, 150, 300, amp[0]);
        k.wire(300, amp[1], 260, amp[1], 260, 262);
        reference(k, 260, 262);
        double node = 450;
        k.wire(amp[2], amp[3], 640, amp[3]);
        k.dot(node, amp[3]);
        k.dot(560, amp[3]);
        k.resistor(node, amp[3], node, 225, PartNames.R_ZERO, v(PartNames.R_ZERO));
        k.capacitor(node, 225, node, 275, PartNames.C_ZERO, v(PartNames.C_ZERO));
        k.ground(node, 275);
        k.capacitor(560, amp[3], 560, 275, PartNames.C_POLE, v(PartNames.C_POLE));
        k.ground(560, 275);
        k.terminal(640, amp[3], "v_c", TextStyle.Anchor.START);
        k.note(300, 238, "gm " + v(PartNames.GM), TextStyle.Anchor.START);
    }

    /** Shunt regulator with r_led, LED and r_bias; optocoupler across the barrier into the pull-up. */
    private void shuntOpto(SchematicKit k) {
        double top = 36;
        double divider = 110;
        double cathode = 330;
        k.terminal(30, top, "Vout", TextStyle.Anchor.MIDDLE);
        k.wire(30, top, cathode, top);
        k.dot(divider, top);
        k.resistor(divider, top, divider, 150, PartNames.R_UPPER, v(PartNames.R_UPPER), true);
        k.dot(divider, 150);
        k.resistor(divider, 150, divider, 272, PartNames.R_LOWER, v(PartNames.R_LOWER), true);
        k.ground(divider, 272);
        k.resistor(cathode, top, cathode, 100, PartNames.R_LED, v(PartNames.R_LED));
        k.dot(cathode, 100);
        k.led(cathode, 100, 150);
        k.dot(cathode, 150);
        k.wire(cathode, 100, 280, 100);
        k.resistor(280, 100, 280, 150, PartNames.R_BIAS, v(PartNames.R_BIAS), true);
        k.wire(280, 150, cathode, 150);
        if (has(PartNames.R_LED_DYNAMIC)) {
            k.note(cathode + 36, 148, "LED r_d " + v(PartNames.R_LED_DYNAMIC), TextStyle.Anchor.START);
        }
        k.wire(cathode, 150, cathode, 215);
        k.dot(cathode, 205);
        double ref = k.shuntRegulator(cathode, 215, 268);
        k.ground(cathode, 268);
        k.note(cathode + 16, 236, "shunt regulator", TextStyle.Anchor.START);
        k.note(cathode + 16, 250, "Vref " + SiText.format(referenceV, "V", 3), TextStyle.Anchor.START);
        double refWire = 150;
        k.wire(cathode - 24, ref, refWire, ref, refWire, 150, divider, 150);
        // compensation from the cathode back to the reference node
        k.wire(cathode, 205, 300, 205);
        if (has(PartNames.R_ZERO)) {
            k.capacitor(300, 205, 240, 205, PartNames.C_ZERO, v(PartNames.C_ZERO));
            k.resistor(240, 205, 170, 205, PartNames.R_ZERO, v(PartNames.R_ZERO));
        } else {
            k.capacitor(300, 205, 170, 205, PartNames.C_ZERO, v(PartNames.C_ZERO));
        }
        k.wire(170, 205, refWire, 205);
        k.dot(refWire, 205);
        // isolation barrier and the optocoupler's output side
        k.canvas().line(440, 12, 440, 300, SchematicKit.BARRIER);
        k.note(446, 300, "isolation barrier", TextStyle.Anchor.START);
        double photo = 500;
        k.phototransistor(photo, 120, 180);
        k.note(photo + 8, 204, "optocoupler", TextStyle.Anchor.START);
        k.note(photo + 8, 218, "CTR " + v(PartNames.CTR), TextStyle.Anchor.START);
        k.ground(photo, 268);
        k.wire(photo, 180, photo, 268);
        k.terminal(photo, 28, "V_pull " + SiText.format(pullupSupplyV, "V", 3), TextStyle.Anchor.START);
        k.resistor(photo, 28, photo, 100, PartNames.R_PULLUP, v(PartNames.R_PULLUP));
        k.wire(photo, 100, photo, 120);
        k.dot(photo, 100);
        k.wire(photo, 100, 740, 100);
        k.terminal(740, 100, "", TextStyle.Anchor.START);
        k.note(740, 84, "FB pin (v_c)", TextStyle.Anchor.END);
        double x = 590;
        if (has(PartNames.C_PULLUP)) {
            k.dot(x, 100);
            k.capacitor(x, 100, x, 268, PartNames.C_PULLUP, v(PartNames.C_PULLUP));
            k.ground(x, 268);
            x += 95;
        }
        if (has(PartNames.C_OPTO)) {
            k.dot(x, 100);
            k.capacitor(x, 100, x, 268, PartNames.C_OPTO, v(PartNames.C_OPTO));
            k.ground(x, 268);
            k.note(x, 292, "(optocoupler pole)", TextStyle.Anchor.MIDDLE);
        }
    }

    /** The reference source from (x, y) down to ground. */
    private void reference(SchematicKit k, double x, double y) {
        k.canvas().circle(x, y + 12, 12, SchematicKit.WIRE, null);
        k.canvas().text(x - 4, y + 10, "+", SchematicKit.VALUE);
        k.wire(x, y + 24, x, y + 32);
        k.ground(x, y + 32);
        k.note(x + 18, y + 16, "Vref " + SiText.format(referenceV, "V", 3), TextStyle.Anchor.START);
    }
}
