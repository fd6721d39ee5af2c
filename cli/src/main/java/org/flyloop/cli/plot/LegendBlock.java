package org.flyloop.cli.plot;

import java.awt.Graphics2D;
import java.awt.geom.Line2D;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * The legend of a figure as a grid of columns under the bottom panel: a line sample with the
 * trace's glyph, then its name. The emphasised trace (worst corner, reference model) comes first,
 * then the others in the order they first appear.
 */
final class LegendBlock {

    private static final double SAMPLE_LENGTH = 38;
    private static final double SAMPLE_GAP = 8;
    private static final double COLUMN_GAP = 26;
    private static final double ROW_HEIGHT = 19;
    private static final double SIDE_MARGIN = 20;
    private static final int GLYPH_SIZE = 8;

    private final List<Map.Entry<String, PlotTheme.TraceLook>> entries = new ArrayList<>();
    private final TextStyle style = TextStyle.plain(PlotTheme.LEGEND_SIZE, PlotTheme.INK);
    private final double width;
    private final double columnWidth;
    private final int columns;

    /**
     * @param looks every trace name of the figure with its look
     * @param width room across, px
     */
    LegendBlock(Map<String, PlotTheme.TraceLook> looks, double width) {
        this.width = width;
        for (Map.Entry<String, PlotTheme.TraceLook> e : looks.entrySet()) {
            if (e.getValue().glyph() == PlotTheme.Glyph.NONE) {
                entries.add(e);
            }
        }
        for (Map.Entry<String, PlotTheme.TraceLook> e : looks.entrySet()) {
            if (e.getValue().glyph() != PlotTheme.Glyph.NONE) {
                entries.add(e);
            }
        }
        double widest = 0;
        for (Map.Entry<String, PlotTheme.TraceLook> e : entries) {
            widest = Math.max(widest, TextMeasure.width(e.getKey(), style));
        }
        columnWidth = SAMPLE_LENGTH + SAMPLE_GAP + widest + COLUMN_GAP;
        int fit = (int) Math.floor((width - 2 * SIDE_MARGIN + COLUMN_GAP) / columnWidth);
        columns = Math.max(1, Math.min(Math.max(1, entries.size()), fit));
    }

    /** The trace names in the order the legend lists them. */
    List<String> names() {
        return entries.stream().map(Map.Entry::getKey).toList();
    }

    /** Rows of entries. */
    int rows() {
        return (entries.size() + columns - 1) / columns;
    }

    /** Height of the block including a little room underneath, px. */
    double height() {
        return rows() * ROW_HEIGHT + 6;
    }

    /** Draws the legend with its top edge at {@code top}, centred across the width. */
    void paint(Graphics2D g, double top) {
        double used = columns * columnWidth - COLUMN_GAP;
        double left = Math.max(SIDE_MARGIN, (width - used) / 2);
        g.setFont(TextMeasure.font(style));
        for (int i = 0; i < entries.size(); i++) {
            // Column by column, so names read down the way a list would.
            int column = i / rows();
            int row = i % rows();
            double x = left + column * columnWidth;
            double midY = top + row * ROW_HEIGHT + ROW_HEIGHT / 2;
            PlotTheme.TraceLook look = entries.get(i).getValue();
            g.setColor(PlotTheme.color(look.line().color()));
            g.setStroke(PanelChart.stroke(look.line()));
            g.draw(new Line2D.Double(x, midY, x + SAMPLE_LENGTH, midY));
            if (look.glyph() != PlotTheme.Glyph.NONE) {
                PlotTheme.seriesMarker(look.glyph()).paint(g, x + SAMPLE_LENGTH / 2, midY, GLYPH_SIZE);
            }
            g.setColor(PlotTheme.color(PlotTheme.INK));
            g.drawString(entries.get(i).getKey(), (float) (x + SAMPLE_LENGTH + SAMPLE_GAP),
                    (float) (midY + TextMeasure.capHeight(style) / 2));
        }
    }
}
