package org.flyloop.cli.plot;

/** Draws the small symbols used along traces, on markers and in legends. */
final class Glyphs {

    private Glyphs() {
    }

    /** A glyph of half-size {@code r} centred on (x, y). */
    static void draw(Canvas c, PlotTheme.Glyph g, double x, double y, double r, LineStyle outline, String fill) {
        switch (g) {
            case NONE -> {
            }
            case CIRCLE -> c.circle(x, y, r, outline, fill);
            case SQUARE -> c.rect(x - r * 0.9, y - r * 0.9, 1.8 * r, 1.8 * r, outline, fill);
            case TRIANGLE -> c.polygon(new double[] {x, x + r, x - r}, new double[] {y - r, y + 0.8 * r, y + 0.8 * r},
                    outline, fill);
            case TRIANGLE_DOWN -> c.polygon(new double[] {x, x + r, x - r},
                    new double[] {y + r, y - 0.8 * r, y - 0.8 * r}, outline, fill);
            case DIAMOND -> c.polygon(new double[] {x, x + r, x, x - r},
                    new double[] {y - r * 1.15, y, y + r * 1.15, y},
                    outline, fill);
            case PLUS -> {
                LineStyle s = outline != null ? outline : LineStyle.solid(1.2, fill);
                c.line(x - r * 1.2, y, x + r * 1.2, y, s);
                c.line(x, y - r * 1.2, x, y + r * 1.2, s);
            }
            case CROSS -> {
                LineStyle s = outline != null ? outline : LineStyle.solid(1.2, fill);
                c.line(x - r, y - r, x + r, y + r, s);
                c.line(x - r, y + r, x + r, y - r, s);
            }
            default -> throw new IllegalStateException("unknown glyph " + g);
        }
    }

    /** The glyph that stands for a marker kind. */
    static PlotTheme.Glyph forMarker(MarkerKind kind) {
        return switch (kind) {
            case GAIN_CROSSOVER -> PlotTheme.Glyph.CIRCLE;
            case PHASE_CROSSOVER -> PlotTheme.Glyph.SQUARE;
            case PEAK -> PlotTheme.Glyph.TRIANGLE_DOWN;
            case SETTLING -> PlotTheme.Glyph.DIAMOND;
            case DISAGREEMENT -> PlotTheme.Glyph.DIAMOND;
        };
    }
}
