package org.flyloop.cli.plot;

import java.util.List;

/**
 * A complete picture: a title, panels stacked on one shared x axis, and vertical reference lines
 * across all of them.
 *
 * @param title      headline
 * @param subtitle   second line (scenario, corner), or empty
 * @param xQuantity  what the x axis shows, e.g. "frequency"
 * @param xUnit      its unit, e.g. "Hz", "s"
 * @param xScale     LOG or LINEAR
 * @param panels     top to bottom
 * @param verticals  vertical reference lines
 */
public record Figure(String title, String subtitle, String xQuantity, String xUnit, Scale xScale,
                     List<Panel> panels, List<ReferenceLine> verticals) {

    public Figure {
        if (panels.isEmpty()) {
            throw new IllegalArgumentException("a figure needs at least one panel");
        }
        if (xScale != Scale.LOG && xScale != Scale.LINEAR) {
            throw new IllegalArgumentException("the x axis is LOG or LINEAR");
        }
        subtitle = subtitle == null ? "" : subtitle;
        panels = List.copyOf(panels);
        verticals = List.copyOf(verticals);
    }
}
