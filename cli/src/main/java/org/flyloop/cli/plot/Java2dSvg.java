package org.flyloop.cli.plot;

import de.erichseifert.vectorgraphics2d.VectorGraphics2D;
import de.erichseifert.vectorgraphics2d.svg.SVGProcessor;
import de.erichseifert.vectorgraphics2d.util.PageSize;
import java.awt.Graphics2D;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Function;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Records Java2D painting with VectorGraphics2D and turns it into an SVG fragment that can sit
 * inside another {@code <svg>} and inside an XHTML page: the XML declaration, DOCTYPE and outer
 * element are dropped and the content is shifted by a {@code translate} group; the clip paths go
 * too, because their generated ids would collide between figures on one page and their
 * {@code url(#…)} references are not wanted in a self-contained report (the painter keeps its
 * drawing inside its box). Round ellipses become circles, and the shapes the painter names
 * ({@link PaintedLayer.ShapeTag}) are wrapped in groups carrying their class and data.
 */
final class Java2dSvg {

    private static final Pattern DEFS = Pattern.compile("<defs>.*?</defs>", Pattern.DOTALL);
    private static final Pattern CLIP_REFERENCE = Pattern.compile("\\s+clip-path=\"url\\(#[^)\"]*\\)\"");
    private static final Pattern ROUND_ELLIPSE = Pattern.compile(
            "<ellipse cx=\"([^\"]+)\" cy=\"([^\"]+)\" rx=\"([^\"]+)\" ry=\"\\3\"");
    private static final Pattern FILLED_SHAPE = Pattern.compile(
            "<(?:circle|ellipse|rect|path|polygon) [^>]*style=\"fill:(rgb\\(\\d+,\\d+,\\d+\\));[^>]*/>");

    /**
     * @param body  the drawing as a {@code <g transform="translate(…)">} element
     * @param layer what the painter reported
     */
    record Result(String body, PaintedLayer layer) {
    }

    private Java2dSvg() {
    }

    /** Runs the painter on a recording context and returns the drawing as an SVG fragment. */
    static Result record(double x, double y, double width, double height, Function<Graphics2D, PaintedLayer> painter) {
        PlotTheme.ensureHeadless();
        VectorGraphics2D g = new VectorGraphics2D();
        PaintedLayer layer = painter.apply(g);
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
        content = ROUND_ELLIPSE.matcher(content).replaceAll("<circle cx=\"$1\" cy=\"$2\" r=\"$3\"");
        content = tagShapes(content, layer.shapes());
        String body = "<g transform=\"translate(" + SvgCanvas.num(x) + " " + SvgCanvas.num(y) + ")\">" + content
                + "</g>\n";
        return new Result(body, layer);
    }

    /** Wraps the n-th shape filled in a tag's colour in a group, for the n-th tag of that colour. */
    private static String tagShapes(String content, List<PaintedLayer.ShapeTag> tags) {
        if (tags.isEmpty()) {
            return content;
        }
        Map<String, List<PaintedLayer.ShapeTag>> byFill = new HashMap<>();
        for (PaintedLayer.ShapeTag t : tags) {
            byFill.computeIfAbsent(rgb(t.fill()), k -> new ArrayList<>()).add(t);
        }
        Map<String, Integer> seen = new HashMap<>();
        StringBuilder b = new StringBuilder(content.length() + 256 * tags.size());
        Matcher m = FILLED_SHAPE.matcher(content);
        int from = 0;
        while (m.find()) {
            List<PaintedLayer.ShapeTag> waiting = byFill.get(m.group(1));
            int n = seen.merge(m.group(1), 1, Integer::sum) - 1;
            if (waiting == null || n >= waiting.size()) {
                continue;
            }
            PaintedLayer.ShapeTag t = waiting.get(n);
            b.append(content, from, m.start()).append("<g class=\"").append(SvgCanvas.escape(t.cssClass())).append('"');
            for (Map.Entry<String, String> e : t.data().entrySet()) {
                b.append(" data-").append(e.getKey()).append("=\"").append(SvgCanvas.escape(e.getValue())).append('"');
            }
            b.append('>').append(m.group()).append("</g>");
            from = m.end();
        }
        return b.append(content, from, content.length()).toString();
    }

    /** "rgb(r,g,b)" as VectorGraphics2D writes a colour. */
    static String rgb(String hex) {
        int v = Integer.parseInt(hex.substring(1), 16);
        return "rgb(" + (v >> 16) + "," + ((v >> 8) & 255) + "," + (v & 255) + ")";
    }
}
