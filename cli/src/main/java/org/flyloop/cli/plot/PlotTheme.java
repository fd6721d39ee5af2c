package org.flyloop.cli.plot;

import java.util.regex.Pattern;

/**
 * flyloop's figure look, in one place: fonts, inks, line weights and the per-trace styles. Built
 * for paper: near-black ink for the trace that matters, muted colours for the rest, and every
 * trace also distinguished by dash pattern and glyph, so a greyscale copy loses nothing.
 */
public final class PlotTheme {

    // First, because the style constants below validate their colours against it.
    private static final Pattern COLOR = Pattern.compile("#[0-9a-fA-F]{6}");

    /** Font family asked of AWT (the PNG) and listed first for the SVG. */
    public static final String AWT_FONT_FAMILY = "DejaVu Sans";
    /** CSS font list of the SVG. */
    public static final String SVG_FONT_FAMILY = "DejaVu Sans, Verdana, Helvetica, Arial, sans-serif";

    public static final String PAPER = "#ffffff";
    public static final String INK = "#1a1a1a";
    public static final String MUTED = "#555555";
    public static final String FRAME = "#3d3d3d";
    public static final String GRID_MAJOR = "#c4c4c4";
    public static final String GRID_MINOR = "#e8e8e8";
    public static final String BAND_FILL = "#ececec";
    public static final String LABEL_BORDER = "#8c8c8c";
    /** Design limits (RHP-zero bound, fsw/2). */
    public static final String LIMIT = "#6e2222";

    public static final double TITLE_SIZE = 16;
    public static final double SUBTITLE_SIZE = 12;
    public static final double AXIS_LABEL_SIZE = 12.5;
    public static final double TICK_SIZE = 11.5;
    public static final double ANNOTATION_SIZE = 11.5;
    public static final double LEGEND_SIZE = 12;

    /** The emphasised trace (worst corner, or the reference model). */
    public static final LineStyle STRONG = LineStyle.solid(2.6, INK);
    public static final LineStyle LIMIT_LINE = LineStyle.dashed(1.3, LIMIT, 9, 3, 2, 3);
    public static final LineStyle CURSOR_LINE = LineStyle.dashed(1.0, MUTED, 1.5, 2.5);
    public static final LineStyle GUIDE_LINE = LineStyle.solid(1.0, "#8a8a8a");
    public static final LineStyle BAND_EDGE = LineStyle.dashed(1.0, "#6a6a6a", 4, 3);

    private static final String[] COLORS = {"#2e5a87", "#9c4f26", "#3b7a4a", "#6f4a8a", "#7f7530", "#3f6b6b"};
    private static final double[][] DASHES = {{7, 3}, {2, 2.5}, {9, 3, 2, 3}, {1.5, 3.5}, {12, 4}};
    private static final Glyph[] GLYPHS = {Glyph.CIRCLE, Glyph.SQUARE, Glyph.TRIANGLE, Glyph.DIAMOND, Glyph.CROSS,
        Glyph.TRIANGLE_DOWN, Glyph.PLUS};

    /** The small symbol repeated along a trace. */
    public enum Glyph { NONE, CIRCLE, SQUARE, TRIANGLE, DIAMOND, CROSS, TRIANGLE_DOWN, PLUS }

    /**
     * The look of one trace.
     *
     * @param line  stroke
     * @param glyph repeated symbol, NONE for the emphasised trace
     */
    public record TraceLook(LineStyle line, Glyph glyph) {
    }

    private PlotTheme() {
    }

    /**
     * The look of the {@code index}-th ordinary trace of a figure (0-based): colour, dash and glyph
     * cycle with periods 6, 5 and 7, so neighbouring traces differ in all three and no two of the
     * first 210 traces look alike.
     */
    public static TraceLook ordinary(int index) {
        int i = Math.max(0, index);
        return new TraceLook(new LineStyle(1.35, DASHES[i % DASHES.length], COLORS[i % COLORS.length]),
                GLYPHS[i % GLYPHS.length]);
    }

    /** The look of the emphasised trace. */
    public static TraceLook strong() {
        return new TraceLook(STRONG, Glyph.NONE);
    }

    /** Switches AWT to headless before anything else touches it (PNG rendering on servers and CI). */
    public static void ensureHeadless() {
        if (System.getProperty("java.awt.headless") == null) {
            System.setProperty("java.awt.headless", "true");
        }
    }

    static void checkColor(String color) {
        if (color == null || !COLOR.matcher(color).matches()) {
            throw new IllegalArgumentException("colour must be #rrggbb: " + color);
        }
    }
}
