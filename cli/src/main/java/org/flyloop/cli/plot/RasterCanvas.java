package org.flyloop.cli.plot;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.Shape;
import java.awt.font.TextLayout;
import java.awt.geom.AffineTransform;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.util.Map;

/**
 * A canvas that paints into an RGB image with Java2D, at {@code scale} image pixels per figure
 * pixel (1.5 gives print-sharp PNGs at a sensible file size). Not thread-safe; one per picture.
 */
public final class RasterCanvas implements Canvas {

    private final BufferedImage image;
    private final Graphics2D g;

    /**
     * @param width  figure width, px
     * @param height figure height, px
     * @param scale  image pixels per figure pixel
     */
    public RasterCanvas(double width, double height, double scale) {
        PlotTheme.ensureHeadless();
        image = new BufferedImage((int) Math.ceil(width * scale), (int) Math.ceil(height * scale),
                BufferedImage.TYPE_INT_RGB);
        g = image.createGraphics();
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_FRACTIONALMETRICS, RenderingHints.VALUE_FRACTIONALMETRICS_ON);
        g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
        g.setRenderingHint(RenderingHints.KEY_RENDERING, RenderingHints.VALUE_RENDER_QUALITY);
        g.setColor(color(PlotTheme.PAPER));
        g.fillRect(0, 0, image.getWidth(), image.getHeight());
        g.scale(scale, scale);
    }

    /** The picture so far. */
    public BufferedImage image() {
        return image;
    }

    /** Releases the graphics context; the image stays usable. */
    public void dispose() {
        g.dispose();
    }

    @Override
    public void beginGroup(String cssClass, Map<String, String> data) {
        // Groups only structure the SVG; pixels have none.
    }

    @Override
    public void endGroup() {
        // See beginGroup.
    }

    @Override
    public void line(double x1, double y1, double x2, double y2, LineStyle style) {
        draw(new Line2D.Double(x1, y1, x2, y2), style);
    }

    @Override
    public void polyline(double[] xs, double[] ys, int count, LineStyle style) {
        if (count < 2) {
            return;
        }
        Path2D.Double p = new Path2D.Double();
        p.moveTo(xs[0], ys[0]);
        for (int i = 1; i < count; i++) {
            p.lineTo(xs[i], ys[i]);
        }
        draw(p, style);
    }

    @Override
    public void polygon(double[] xs, double[] ys, LineStyle outline, String fill) {
        Path2D.Double p = new Path2D.Double();
        p.moveTo(xs[0], ys[0]);
        for (int i = 1; i < xs.length; i++) {
            p.lineTo(xs[i], ys[i]);
        }
        p.closePath();
        paint(p, outline, fill);
    }

    @Override
    public void rect(double x, double y, double w, double h, LineStyle outline, String fill) {
        paint(new Rectangle2D.Double(x, y, w, h), outline, fill);
    }

    @Override
    public void circle(double cx, double cy, double r, LineStyle outline, String fill) {
        paint(new Ellipse2D.Double(cx - r, cy - r, 2 * r, 2 * r), outline, fill);
    }

    @Override
    public void text(double x, double y, String text, TextStyle style) {
        if (text.isEmpty()) {
            return;
        }
        double w = textWidth(text, style);
        double dx = switch (style.anchor()) {
            case START -> 0;
            case MIDDLE -> -w / 2;
            case END -> -w;
        };
        AffineTransform saved = g.getTransform();
        g.translate(x, y);
        if (style.rotateDeg() != 0) {
            g.rotate(-Math.toRadians(style.rotateDeg()));
        }
        TextLayout layout = new TextLayout(text, TextMeasure.font(style), g.getFontRenderContext());
        Shape outline = layout.getOutline(AffineTransform.getTranslateInstance(dx, 0));
        if (style.halo()) {
            g.setColor(color(PlotTheme.PAPER));
            g.setStroke(new BasicStroke(3f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
            g.draw(outline);
        }
        g.setColor(color(style.color()));
        g.fill(outline);
        g.setTransform(saved);
    }

    private void paint(Shape s, LineStyle outline, String fill) {
        if (fill != null) {
            g.setColor(color(fill));
            g.fill(s);
        }
        if (outline != null) {
            draw(s, outline);
        }
    }

    private void draw(Shape s, LineStyle style) {
        double[] d = style.dash();
        float[] dash = null;
        if (d.length > 0) {
            dash = new float[d.length];
            for (int i = 0; i < d.length; i++) {
                dash[i] = (float) d[i];
            }
        }
        g.setStroke(new BasicStroke((float) style.width(), BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f, dash,
                0f));
        g.setColor(color(style.color()));
        g.draw(s);
    }

    private static Color color(String hex) {
        return new Color(Integer.parseInt(hex.substring(1), 16));
    }
}
