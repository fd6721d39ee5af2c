package org.flyloop.cli.plot;

import java.util.Map;

/**
 * A drawing surface in figure pixels, origin top left, y downwards. Two implementations draw the
 * same calls: {@link SvgCanvas} (text) and {@link RasterCanvas} (PNG).
 */
public interface Canvas {

    /** Opens a group; the SVG back end writes the class and the entries as {@code data-} attributes. */
    void beginGroup(String cssClass, Map<String, String> data);

    /** Closes the innermost open group. */
    void endGroup();

    void line(double x1, double y1, double x2, double y2, LineStyle style);

    /** An open path through the first {@code count} points. */
    void polyline(double[] xs, double[] ys, int count, LineStyle style);

    /** A closed shape; {@code outline} or {@code fill} may be null for none. */
    void polygon(double[] xs, double[] ys, LineStyle outline, String fill);

    /** A rectangle; {@code outline} or {@code fill} may be null for none. */
    void rect(double x, double y, double width, double height, LineStyle outline, String fill);

    /** A circle; {@code outline} or {@code fill} may be null for none. */
    void circle(double cx, double cy, double radius, LineStyle outline, String fill);

    /** Text with its anchor point on the baseline at (x, y). */
    void text(double x, double y, String text, TextStyle style);

    /** Advance width of {@code text} in figure pixels, the same for both back ends. */
    default double textWidth(String text, TextStyle style) {
        return TextMeasure.width(text, style);
    }
}
