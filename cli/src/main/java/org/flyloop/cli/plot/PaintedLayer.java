package org.flyloop.cli.plot;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * What a Java2D painter reports back to the canvas once it has drawn (see
 * {@link Canvas#java2d}): data attributes for the group around the drawing, filled shapes to
 * mark up as groups of their own, and a plain-text description of the words it drew as outlines.
 *
 * @param data        data attributes of the group around the whole drawing
 * @param shapes      drawn shapes to wrap in groups, in drawing order
 * @param description text for a {@code <desc>} element, or empty
 */
public record PaintedLayer(Map<String, String> data, List<ShapeTag> shapes, String description) {

    public PaintedLayer {
        data = Collections.unmodifiableMap(new LinkedHashMap<>(data));
        shapes = List.copyOf(shapes);
        description = description == null ? "" : description;
    }

    /**
     * One filled shape of the drawing, named by its fill colour: the n-th tag of a colour stands
     * for the n-th shape painted in that colour.
     *
     * @param fill     fill colour as {@code #rrggbb}
     * @param cssClass class of the group wrapped around it
     * @param data     data attributes of that group
     */
    public record ShapeTag(String fill, String cssClass, Map<String, String> data) {

        public ShapeTag {
            PlotTheme.checkColor(fill);
            data = Collections.unmodifiableMap(new LinkedHashMap<>(data));
        }
    }
}
