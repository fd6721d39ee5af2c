package org.flyloop.cli.plot;

/**
 * One named curve: x and y samples of equal length. Non-finite y values break the line.
 *
 * @param name     legend text; traces of the same name in several panels share one look
 * @param x        abscissae (frequency in Hz, time in s, …), ascending
 * @param y        ordinates in the panel's unit
 * @param emphasis how much it stands out
 */
public record Trace(String name, double[] x, double[] y, Emphasis emphasis) {

    public Trace {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("a trace needs a name");
        }
        if (x.length != y.length) {
            throw new IllegalArgumentException("trace '" + name + "': " + x.length + " x values but " + y.length
                    + " y values");
        }
        x = x.clone();
        y = y.clone();
    }

    @Override
    public double[] x() {
        return x.clone();
    }

    @Override
    public double[] y() {
        return y.clone();
    }

    public int size() {
        return x.length;
    }

    double xAt(int i) {
        return x[i];
    }

    double yAt(int i) {
        return y[i];
    }
}
