package org.flyloop.cli.plot;

import java.awt.Font;
import java.awt.GraphicsEnvironment;
import java.awt.font.FontRenderContext;
import java.util.Arrays;

/**
 * Text metrics shared by both canvases, so that layout decisions (label boxes, legend wrapping)
 * come out the same in the SVG and in the PNG. Uses the AWT font of the theme; headless mode is
 * switched on before AWT is first touched.
 */
public final class TextMeasure {

    private static final FontRenderContext CONTEXT;
    private static final String FAMILY;

    static {
        PlotTheme.ensureHeadless();
        CONTEXT = new FontRenderContext(null, true, true);
        String[] families = GraphicsEnvironment.getLocalGraphicsEnvironment().getAvailableFontFamilyNames();
        FAMILY = Arrays.asList(families).contains(PlotTheme.AWT_FONT_FAMILY) ? PlotTheme.AWT_FONT_FAMILY
                : Font.SANS_SERIF;
    }

    private TextMeasure() {
    }

    /** The AWT font for a text style. */
    public static Font font(TextStyle style) {
        int s = (style.bold() ? Font.BOLD : 0) | (style.italic() ? Font.ITALIC : 0);
        return new Font(FAMILY, s, 12).deriveFont((float) style.size());
    }

    /** Advance width of {@code text} in figure pixels. */
    public static double width(String text, TextStyle style) {
        if (text.isEmpty()) {
            return 0;
        }
        return font(style).getStringBounds(text, CONTEXT).getWidth();
    }

    /** Height of capital letters above the baseline, figure pixels (for vertical centring). */
    public static double capHeight(TextStyle style) {
        return 0.72 * style.size();
    }
}
