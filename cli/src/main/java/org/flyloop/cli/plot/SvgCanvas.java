package org.flyloop.cli.plot;

import java.util.Map;

/**
 * A canvas that writes SVG 1.1 text meant to stand alone as a file and to sit inline in an XHTML
 * page: namespaced root, no XML prolog, no ids (so several figures never collide), no external
 * references, coordinates to 0.01 px.
 */
public final class SvgCanvas implements Canvas {

    private final StringBuilder body = new StringBuilder(1 << 16);
    private final double width;
    private final double height;
    private final String title;
    private int depth;

    /**
     * @param width  figure width, px
     * @param height figure height, px
     * @param title  accessible title of the picture
     */
    public SvgCanvas(double width, double height, String title) {
        this.width = width;
        this.height = height;
        this.title = title;
    }

    /** The complete {@code <svg>} element. */
    public String toSvg() {
        if (depth != 0) {
            throw new IllegalStateException(depth + " group(s) left open");
        }
        StringBuilder out = new StringBuilder(body.length() + 512);
        out.append("<svg xmlns=\"http://www.w3.org/2000/svg\" version=\"1.1\" class=\"flyloop-figure\" width=\"")
                .append(num(width)).append("\" height=\"").append(num(height)).append("\" viewBox=\"0 0 ")
                .append(num(width)).append(' ').append(num(height)).append("\" role=\"img\" aria-label=\"")
                .append(escape(title)).append("\" font-family=\"").append(PlotTheme.SVG_FONT_FAMILY)
                .append("\">\n<title>").append(escape(title)).append("</title>\n");
        out.append("<rect x=\"0\" y=\"0\" width=\"").append(num(width)).append("\" height=\"").append(num(height))
                .append("\" fill=\"").append(PlotTheme.PAPER).append("\"/>\n");
        out.append(body).append("</svg>\n");
        return out.toString();
    }

    @Override
    public void beginGroup(String cssClass, Map<String, String> data) {
        body.append("<g class=\"").append(escape(cssClass)).append('"');
        for (Map.Entry<String, String> e : data.entrySet()) {
            body.append(" data-").append(e.getKey()).append("=\"").append(escape(e.getValue())).append('"');
        }
        body.append(">\n");
        depth++;
    }

    @Override
    public void endGroup() {
        if (depth == 0) {
            throw new IllegalStateException("no open group");
        }
        depth--;
        body.append("</g>\n");
    }

    @Override
    public void line(double x1, double y1, double x2, double y2, LineStyle style) {
        body.append("<line x1=\"").append(num(x1)).append("\" y1=\"").append(num(y1)).append("\" x2=\"")
                .append(num(x2)).append("\" y2=\"").append(num(y2)).append('"');
        stroke(style);
        body.append("/>\n");
    }

    @Override
    public void polyline(double[] xs, double[] ys, int count, LineStyle style) {
        if (count < 2) {
            return;
        }
        body.append("<polyline points=\"");
        for (int i = 0; i < count; i++) {
            if (i > 0) {
                body.append(' ');
            }
            body.append(num(xs[i])).append(',').append(num(ys[i]));
        }
        body.append("\" fill=\"none\"");
        stroke(style);
        body.append("/>\n");
    }

    @Override
    public void polygon(double[] xs, double[] ys, LineStyle outline, String fill) {
        body.append("<polygon points=\"");
        for (int i = 0; i < xs.length; i++) {
            if (i > 0) {
                body.append(' ');
            }
            body.append(num(xs[i])).append(',').append(num(ys[i]));
        }
        body.append('"');
        paint(outline, fill);
        body.append("/>\n");
    }

    @Override
    public void rect(double x, double y, double w, double h, LineStyle outline, String fill) {
        body.append("<rect x=\"").append(num(x)).append("\" y=\"").append(num(y)).append("\" width=\"")
                .append(num(w)).append("\" height=\"").append(num(h)).append('"');
        paint(outline, fill);
        body.append("/>\n");
    }

    @Override
    public void circle(double cx, double cy, double r, LineStyle outline, String fill) {
        body.append("<circle cx=\"").append(num(cx)).append("\" cy=\"").append(num(cy)).append("\" r=\"")
                .append(num(r)).append('"');
        paint(outline, fill);
        body.append("/>\n");
    }

    @Override
    public void text(double x, double y, String text, TextStyle style) {
        body.append("<text x=\"").append(num(x)).append("\" y=\"").append(num(y)).append("\" font-size=\"")
                .append(num(style.size())).append("\" fill=\"").append(style.color()).append('"');
        if (style.bold()) {
            body.append(" font-weight=\"bold\"");
        }
        if (style.italic()) {
            body.append(" font-style=\"italic\"");
        }
        if (style.anchor() != TextStyle.Anchor.START) {
            body.append(" text-anchor=\"").append(style.anchor() == TextStyle.Anchor.MIDDLE ? "middle" : "end")
                    .append('"');
        }
        if (style.rotateDeg() != 0) {
            // SVG rotates clockwise for positive angles; the style counts counter-clockwise.
            body.append(" transform=\"rotate(").append(num(-style.rotateDeg())).append(' ').append(num(x))
                    .append(' ').append(num(y)).append(")\"");
        }
        if (style.halo()) {
            body.append(" stroke=\"").append(PlotTheme.PAPER)
                    .append("\" stroke-width=\"3\" stroke-linejoin=\"round\" paint-order=\"stroke\"");
        }
        body.append('>').append(escape(text)).append("</text>\n");
    }

    private void paint(LineStyle outline, String fill) {
        body.append(" fill=\"").append(fill == null ? "none" : fill).append('"');
        if (outline != null) {
            stroke(outline);
        }
    }

    private void stroke(LineStyle s) {
        body.append(" stroke=\"").append(s.color()).append("\" stroke-width=\"").append(num(s.width())).append('"');
        if (!s.isSolid()) {
            body.append(" stroke-dasharray=\"");
            double[] d = s.dash();
            for (int i = 0; i < d.length; i++) {
                body.append(i > 0 ? "," : "").append(num(d[i]));
            }
            body.append('"');
        }
        body.append(" stroke-linejoin=\"round\"");
    }

    /** Fixed two decimals, trailing zeros dropped; never an exponent. Hand-rolled: it runs per point. */
    static String num(double v) {
        if (!Double.isFinite(v)) {
            throw new IllegalArgumentException("non-finite coordinate " + v);
        }
        long hundredths = Math.round(v * 100);
        if (hundredths == 0) {
            return "0";
        }
        StringBuilder b = new StringBuilder(12);
        if (hundredths < 0) {
            b.append('-');
            hundredths = -hundredths;
        }
        b.append(hundredths / 100);
        long frac = hundredths % 100;
        if (frac != 0) {
            b.append('.').append(frac / 10);
            if (frac % 10 != 0) {
                b.append(frac % 10);
            }
        }
        return b.toString();
    }

    /** XML escaping for text and attribute values. */
    public static String escape(String s) {
        StringBuilder b = new StringBuilder(s.length() + 8);
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '&' -> b.append("&amp;");
                case '<' -> b.append("&lt;");
                case '>' -> b.append("&gt;");
                case '"' -> b.append("&quot;");
                case '\'' -> b.append("&#39;");
                default -> {
                    if (c < 0x20 && c != '\n' && c != '\t') {
                        b.append(' ');
                    } else {
                        b.append(c);
                    }
                }
            }
        }
        return b.toString();
    }
}
