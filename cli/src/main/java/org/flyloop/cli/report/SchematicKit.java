package org.flyloop.cli.report;

import org.flyloop.cli.plot.Canvas;
import org.flyloop.cli.plot.LineStyle;
import org.flyloop.cli.plot.PlotTheme;
import org.flyloop.cli.plot.TextStyle;

/**
 * Schematic symbols drawn on a {@link Canvas}: wires, junctions, resistors (IEC boxes),
 * capacitors, ground, amplifiers, a shunt regulator, an LED and a phototransistor. Coordinates
 * are figure pixels; every two-terminal part is drawn between its two terminal points, horizontal
 * or vertical.
 */
final class SchematicKit {

    static final LineStyle WIRE = LineStyle.solid(1.5, PlotTheme.INK);
    static final LineStyle THIN = LineStyle.solid(1.1, PlotTheme.INK);
    static final LineStyle BARRIER = LineStyle.dashed(1.2, PlotTheme.MUTED, 6, 4);
    static final TextStyle NAME = TextStyle.plain(12, PlotTheme.INK).asBold();
    static final TextStyle VALUE = TextStyle.plain(12, PlotTheme.INK);
    static final TextStyle NOTE = TextStyle.plain(11, PlotTheme.MUTED);

    private final Canvas c;

    SchematicKit(Canvas c) {
        this.c = c;
    }

    Canvas canvas() {
        return c;
    }

    void wire(double... xy) {
        for (int i = 0; i + 3 < xy.length; i += 2) {
            c.line(xy[i], xy[i + 1], xy[i + 2], xy[i + 3], WIRE);
        }
    }

    void dot(double x, double y) {
        c.circle(x, y, 3, null, PlotTheme.INK);
    }

    /** An open terminal with a label beside it. */
    void terminal(double x, double y, String label, TextStyle.Anchor anchor) {
        c.circle(x, y, 3.5, WIRE, PlotTheme.PAPER);
        double dx = anchor == TextStyle.Anchor.END ? -8 : anchor == TextStyle.Anchor.START ? 8 : 0;
        double dy = anchor == TextStyle.Anchor.MIDDLE ? -9 : 4;
        c.text(x + dx, y + dy, label, VALUE.anchored(anchor));
    }

    /** Resistor between two points on one line; the label goes above (horizontal) or right (vertical). */
    void resistor(double x1, double y1, double x2, double y2, String name, String value) {
        resistor(x1, y1, x2, y2, name, value, false);
    }

    /** As above; a vertical resistor may take its label on the left. */
    void resistor(double x1, double y1, double x2, double y2, String name, String value, boolean labelLeft) {
        boolean h = y1 == y2;
        double mx = (x1 + x2) / 2;
        double my = (y1 + y2) / 2;
        double len = 34;
        double wid = 12;
        if (h) {
            wire(x1, y1, mx - len / 2, y1);
            wire(mx + len / 2, y1, x2, y2);
            c.rect(mx - len / 2, my - wid / 2, len, wid, WIRE, PlotTheme.PAPER);
            label(mx, my - wid / 2 - 18, name, value, TextStyle.Anchor.MIDDLE);
        } else {
            wire(x1, y1, x1, my - len / 2);
            wire(x1, my + len / 2, x2, y2);
            c.rect(mx - wid / 2, my - len / 2, wid, len, WIRE, PlotTheme.PAPER);
            if (labelLeft) {
                label(mx - wid / 2 - 7, my - 3, name, value, TextStyle.Anchor.END);
            } else {
                label(mx + wid / 2 + 7, my - 3, name, value, TextStyle.Anchor.START);
            }
        }
    }

    /** Capacitor between two points on one line. */
    void capacitor(double x1, double y1, double x2, double y2, String name, String value) {
        boolean h = y1 == y2;
        double mx = (x1 + x2) / 2;
        double my = (y1 + y2) / 2;
        double gap = 3.5;
        double plate = 11;
        if (h) {
            wire(x1, y1, mx - gap, y1);
            wire(mx + gap, y1, x2, y2);
            c.line(mx - gap, my - plate, mx - gap, my + plate, LineStyle.solid(2.2, PlotTheme.INK));
            c.line(mx + gap, my - plate, mx + gap, my + plate, LineStyle.solid(2.2, PlotTheme.INK));
            label(mx, my - plate - 18, name, value, TextStyle.Anchor.MIDDLE);
        } else {
            wire(x1, y1, x1, my - gap);
            wire(x1, my + gap, x2, y2);
            c.line(mx - plate, my - gap, mx + plate, my - gap, LineStyle.solid(2.2, PlotTheme.INK));
            c.line(mx - plate, my + gap, mx + plate, my + gap, LineStyle.solid(2.2, PlotTheme.INK));
            label(mx + plate + 6, my - 3, name, value, TextStyle.Anchor.START);
        }
    }

    /** Part name (bold) over its value. */
    void label(double x, double y, String name, String value, TextStyle.Anchor anchor) {
        c.text(x, y, name, NAME.anchored(anchor));
        c.text(x, y + 14, value, VALUE.anchored(anchor));
    }

    void ground(double x, double y) {
        c.line(x - 10, y, x + 10, y, WIRE);
        c.line(x - 6.5, y + 4, x + 6.5, y + 4, WIRE);
        c.line(x - 3, y + 8, x + 3, y + 8, WIRE);
    }

    /**
     * Amplifier triangle with its inputs on the left (inverting on top) and its tip on the right.
     *
     * @return {inverting input y, non-inverting input y, tip x, tip y} with inputs at x
     */
    double[] amplifier(double x, double top, String inside) {
        double h = 80;
        double w = 72;
        c.polygon(new double[] {x, x + w, x}, new double[] {top, top + h / 2, top + h}, WIRE, PlotTheme.PAPER);
        double inv = top + h * 0.28;
        double non = top + h * 0.72;
        c.text(x + 6, inv + 5, "−", VALUE.asBold());
        c.text(x + 6, non + 5, "+", VALUE.asBold());
        if (!inside.isEmpty()) {
            c.text(x + 22, top + h / 2 + 4, inside, NOTE);
        }
        return new double[] {inv, non, x + w, top + h / 2};
    }

    /** A diode pointing down (anode at y1, cathode at y2), filled triangle and bar. */
    void diodeDown(double x, double y1, double y2) {
        double my = (y1 + y2) / 2;
        wire(x, y1, x, my - 8);
        wire(x, my + 8, x, y2);
        c.polygon(new double[] {x - 9, x + 9, x}, new double[] {my - 8, my - 8, my + 8}, WIRE, PlotTheme.INK);
        c.line(x - 10, my + 8, x + 10, my + 8, LineStyle.solid(2, PlotTheme.INK));
    }

    /** An LED pointing down with two arrows of light leaving to the right. */
    void led(double x, double y1, double y2) {
        diodeDown(x, y1, y2);
        double my = (y1 + y2) / 2;
        for (int k = 0; k < 2; k++) {
            double ax = x + 13;
            double ay = my - 6 + 10 * k;
            arrow(ax, ay, ax + 16, ay);
        }
    }

    /** A shunt regulator: a diode pointing up (cathode at top y1) with its reference lead to the left. */
    double shuntRegulator(double x, double y1, double y2) {
        double my = (y1 + y2) / 2;
        wire(x, y1, x, my - 8);
        wire(x, my + 8, x, y2);
        c.polygon(new double[] {x - 9, x + 9, x}, new double[] {my + 8, my + 8, my - 8}, WIRE, PlotTheme.INK);
        c.line(x - 10, my - 8, x + 10, my - 8, LineStyle.solid(2, PlotTheme.INK));
        c.line(x - 10, my - 8, x - 10, my - 3, LineStyle.solid(2, PlotTheme.INK));
        wire(x - 4, my, x - 24, my);
        return my;
    }

    /** An NPN phototransistor: collector at (x, yc), emitter at (x, ye), light arriving from the left. */
    void phototransistor(double x, double yc, double ye) {
        double my = (yc + ye) / 2;
        double bx = x - 14;
        c.line(bx, my - 14, bx, my + 14, LineStyle.solid(2.4, PlotTheme.INK));
        wire(x, yc, x, my - 18, bx, my - 6);
        wire(bx, my + 6, x, my + 18, x, ye);
        double[] tip = {x - 1, my + 17};
        c.polygon(new double[] {tip[0], tip[0] - 9, tip[0] - 3}, new double[] {tip[1], tip[1] - 2, tip[1] - 8}, WIRE,
                PlotTheme.INK);
        for (int k = 0; k < 2; k++) {
            double ay = my - 12 + 10 * k;
            arrow(bx - 28, ay - 6, bx - 6, ay);
        }
    }

    void arrow(double x1, double y1, double x2, double y2) {
        c.line(x1, y1, x2, y2, THIN);
        double a = Math.atan2(y2 - y1, x2 - x1);
        double l = 6;
        c.polygon(new double[] {x2, x2 - l * Math.cos(a - 0.45), x2 - l * Math.cos(a + 0.45)},
                new double[] {y2, y2 - l * Math.sin(a - 0.45), y2 - l * Math.sin(a + 0.45)}, THIN, PlotTheme.INK);
    }

    void note(double x, double y, String text, TextStyle.Anchor anchor) {
        c.text(x, y, text, NOTE.anchored(anchor));
    }
}
