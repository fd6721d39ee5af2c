package org.flyloop.cli.plot;

/**
 * How a line is stroked.
 *
 * @param width width in figure pixels
 * @param dash  dash pattern in figure pixels (on, off, …); empty for a solid line
 * @param color colour as {@code #rrggbb}
 */
public record LineStyle(double width, double[] dash, String color) {

    public LineStyle {
        if (!(width > 0)) {
            throw new IllegalArgumentException("line width must be positive");
        }
        dash = dash.clone();
        PlotTheme.checkColor(color);
    }

    /** A solid line. */
    public static LineStyle solid(double width, String color) {
        return new LineStyle(width, new double[0], color);
    }

    /** A dashed line with the given pattern. */
    public static LineStyle dashed(double width, String color, double... pattern) {
        return new LineStyle(width, pattern, color);
    }

    @Override
    public double[] dash() {
        return dash.clone();
    }

    public boolean isSolid() {
        return dash.length == 0;
    }
}
