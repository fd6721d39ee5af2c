package org.flyloop.cli.plot;

/**
 * How a piece of text is set.
 *
 * @param size      font size in figure pixels
 * @param bold      bold weight
 * @param italic    italic
 * @param anchor    which end of the text sits at the given point
 * @param rotateDeg rotation about the anchor point, degrees, counter-clockwise on screen
 * @param color     colour as {@code #rrggbb}
 * @param halo      a white outline behind the glyphs, so text stays readable over lines
 */
public record TextStyle(double size, boolean bold, boolean italic, Anchor anchor, double rotateDeg, String color,
                        boolean halo) {

    /** Which point of the text the coordinates name (on the baseline). */
    public enum Anchor { START, MIDDLE, END }

    public TextStyle {
        if (!(size > 0)) {
            throw new IllegalArgumentException("font size must be positive");
        }
        PlotTheme.checkColor(color);
    }

    /** Upright, regular, left-anchored text. */
    public static TextStyle plain(double size, String color) {
        return new TextStyle(size, false, false, Anchor.START, 0, color, false);
    }

    public TextStyle anchored(Anchor newAnchor) {
        return new TextStyle(size, bold, italic, newAnchor, rotateDeg, color, halo);
    }

    public TextStyle asBold() {
        return new TextStyle(size, true, italic, anchor, rotateDeg, color, halo);
    }

    public TextStyle asItalic() {
        return new TextStyle(size, bold, true, anchor, rotateDeg, color, halo);
    }

    public TextStyle rotated(double degrees) {
        return new TextStyle(size, bold, italic, anchor, degrees, color, halo);
    }

    public TextStyle withHalo() {
        return new TextStyle(size, bold, italic, anchor, rotateDeg, color, true);
    }

    public TextStyle colored(String newColor) {
        return new TextStyle(size, bold, italic, anchor, rotateDeg, newColor, halo);
    }
}
