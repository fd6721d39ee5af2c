package org.flyloop.cli.plot;

import de.erichseifert.vectorgraphics2d.VectorGraphics2D;
import de.erichseifert.vectorgraphics2d.svg.SVGProcessor;
import de.erichseifert.vectorgraphics2d.util.PageSize;
import java.awt.Graphics2D;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.Map;
import java.util.function.Function;
import java.util.regex.Pattern;

/**
 * Records Java2D painting with VectorGraphics2D and turns it into an SVG fragment that can sit
 * inside another {@code <svg>} and inside an XHTML page: the XML declaration, DOCTYPE and outer
 * element are dropped, and the clip paths go too, because their generated ids would collide
 * between figures on one page and their {@code url(#…)} references are not wanted in a
 * self-contained report. A nested {@code <svg>} viewport clips the drawing to its box instead.
 */
final class Java2dSvg {

    private static final Pattern DEFS = Pattern.compile("<defs>.*?</defs>", Pattern.DOTALL);
    private static final Pattern CLIP_REFERENCE = Pattern.compile("\\s+clip-path=\"url\\(#[^)\"]*\\)\"");

    /**
     * @param body  the nested {@code <svg>} element holding the drawing
     * @param data  what the painter returned
     */
    record Result(String body, Map<String, String> data) {
    }

    private Java2dSvg() {
    }

    /** Runs the painter on a recording context and returns the drawing as a nested {@code <svg>} element. */
    static Result record(double x, double y, double width, double height,
                         Function<Graphics2D, Map<String, String>> painter) {
        PlotTheme.ensureHeadless();
        VectorGraphics2D g = new VectorGraphics2D();
        Map<String, String> data = painter.apply(g);
        ByteArrayOutputStream out = new ByteArrayOutputStream(1 << 16);
        try {
            new SVGProcessor().getDocument(g.getCommands(), new PageSize(width, height)).writeTo(out);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        String doc = out.toString(StandardCharsets.UTF_8);
        int open = doc.indexOf("<svg");
        int contentStart = doc.indexOf('>', open) + 1;
        int contentEnd = doc.lastIndexOf("</svg>");
        if (open < 0 || contentEnd < contentStart) {
            throw new IllegalStateException("VectorGraphics2D wrote no <svg> element");
        }
        String content = doc.substring(contentStart, contentEnd);
        content = DEFS.matcher(content).replaceAll("");
        content = CLIP_REFERENCE.matcher(content).replaceAll("");
        String w = SvgCanvas.num(width);
        String h = SvgCanvas.num(height);
        String body = "<svg x=\"" + SvgCanvas.num(x) + "\" y=\"" + SvgCanvas.num(y) + "\" width=\"" + w
                + "\" height=\"" + h + "\" viewBox=\"0 0 " + w + " " + h + "\" overflow=\"hidden\">"
                + content + "</svg>\n";
        return new Result(body, data);
    }
}
