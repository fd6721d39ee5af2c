package org.flyloop.cli.plot;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.xml.parsers.DocumentBuilderFactory;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

/**
 * Reads a figure's SVG back as XML, finds shapes drawn by XChart by their colour, and maps drawn
 * coordinates to values through the axis geometry written on every panel group.
 */
final class SvgProbe {

    private static final Pattern NUMBER = Pattern.compile("-?\\d+(?:\\.\\d+)?(?:[eE]-?\\d+)?");

    private final Document doc;

    SvgProbe(String svg) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        doc = f.newDocumentBuilder().parse(new ByteArrayInputStream(svg.getBytes(StandardCharsets.UTF_8)));
    }

    Element root() {
        return doc.getDocumentElement();
    }

    /** Groups whose class list contains {@code cls}. */
    List<Element> groups(Element scope, String cls) {
        List<Element> out = new ArrayList<>();
        NodeList all = scope.getElementsByTagNameNS("*", "g");
        for (int i = 0; i < all.getLength(); i++) {
            Element e = (Element) all.item(i);
            if (List.of(e.getAttribute("class").split(" ")).contains(cls)) {
                out.add(e);
            }
        }
        return out;
    }

    Element panel(String name) {
        return groups(root(), "panel").stream().filter(p -> p.getAttribute("data-name").equals(name)).findFirst()
                .orElseThrow(() -> new AssertionError("no panel " + name));
    }

    /** Every text content of {@code <text>} elements under scope (text the canvas wrote as text). */
    List<String> texts(Element scope) {
        List<String> out = new ArrayList<>();
        NodeList all = scope.getElementsByTagNameNS("*", "text");
        for (int i = 0; i < all.getLength(); i++) {
            out.add(all.item(i).getTextContent());
        }
        return out;
    }

    /** A "|"-separated data attribute as a list. */
    static List<String> list(Element e, String name) {
        return Arrays.asList(e.getAttribute(name).split("\\|"));
    }

    static double attr(Element e, String name) {
        return Double.parseDouble(e.getAttribute(name));
    }

    /** "rgb(r,g,b)" as VectorGraphics2D writes a {@code #rrggbb} colour. */
    static String rgb(String hex) {
        int v = Integer.parseInt(hex.substring(1), 16);
        return "rgb(" + (v >> 16) + "," + ((v >> 8) & 255) + "," + (v & 255) + ")";
    }

    /**
     * Centres of the filled shapes of colour {@code hex} under scope: circle or ellipse centre, rectangle
     * centre, or the middle of a path's bounding box.
     */
    static List<double[]> filledShapeCentres(Element scope, String hex) {
        String fill = "fill:" + rgb(hex) + ";";
        List<double[]> out = new ArrayList<>();
        for (String tag : List.of("circle", "ellipse", "rect", "path")) {
            NodeList all = scope.getElementsByTagNameNS("*", tag);
            for (int i = 0; i < all.getLength(); i++) {
                Element e = (Element) all.item(i);
                if (!e.getAttribute("style").contains(fill)) {
                    continue;
                }
                switch (tag) {
                    case "circle", "ellipse" -> out.add(new double[] {attr(e, "cx"), attr(e, "cy")});
                    case "rect" -> out.add(new double[] {attr(e, "x") + attr(e, "width") / 2,
                        attr(e, "y") + attr(e, "height") / 2});
                    default -> {
                        double[][] b = bounds(e.getAttribute("d"));
                        out.add(new double[] {(b[0][0] + b[0][1]) / 2, (b[1][0] + b[1][1]) / 2});
                    }
                }
            }
        }
        return out;
    }

    /** x of every vertical {@code <line>} stroked in colour {@code hex} under scope. */
    static List<Double> verticalLineXs(Element scope, String hex) {
        String stroke = "stroke:" + rgb(hex) + ";";
        List<Double> out = new ArrayList<>();
        NodeList all = scope.getElementsByTagNameNS("*", "line");
        for (int i = 0; i < all.getLength(); i++) {
            Element e = (Element) all.item(i);
            if (e.getAttribute("style").contains(stroke) && Math.abs(attr(e, "x1") - attr(e, "x2")) < 1e-6
                    && Math.abs(attr(e, "y1") - attr(e, "y2")) > 1) {
                out.add(attr(e, "x1"));
            }
        }
        return out;
    }

    /** {{xmin, xmax}, {ymin, ymax}} of the coordinates of an absolute path (M, L, Z only). */
    private static double[][] bounds(String d) {
        Matcher m = NUMBER.matcher(d);
        List<Double> v = new ArrayList<>();
        while (m.find()) {
            v.add(Double.parseDouble(m.group()));
        }
        double[][] b = {{Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY},
            {Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY}};
        for (int i = 0; i + 1 < v.size(); i += 2) {
            b[0][0] = Math.min(b[0][0], v.get(i));
            b[0][1] = Math.max(b[0][1], v.get(i));
            b[1][0] = Math.min(b[1][0], v.get(i + 1));
            b[1][1] = Math.max(b[1][1], v.get(i + 1));
        }
        return b;
    }

    /** Maps a pixel x back to the x value through the panel's axis (log or linear). */
    static double xValue(Element panel, double px) {
        double left = attr(panel, "data-left");
        double right = attr(panel, "data-right");
        double lo = attr(panel, "data-x-min");
        double hi = attr(panel, "data-x-max");
        double f = (px - left) / (right - left);
        return panel.getAttribute("data-x-scale").equals("log") ? lo * Math.pow(hi / lo, f) : lo + f * (hi - lo);
    }

    /** Maps a pixel y back to the y value through the panel's linear axis. */
    static double yValue(Element panel, double py) {
        double top = attr(panel, "data-top");
        double bottom = attr(panel, "data-bottom");
        double lo = attr(panel, "data-y-min");
        double hi = attr(panel, "data-y-max");
        return lo + (bottom - py) / (bottom - top) * (hi - lo);
    }

    /** How far one pixel moves along the panel's x axis: a ratio on a log axis, a difference otherwise. */
    static double xPerPixel(Element panel) {
        double span = attr(panel, "data-right") - attr(panel, "data-left");
        double lo = attr(panel, "data-x-min");
        double hi = attr(panel, "data-x-max");
        return panel.getAttribute("data-x-scale").equals("log") ? Math.pow(hi / lo, 1 / span) : (hi - lo) / span;
    }

    /** Value of one pixel along the panel's y axis. */
    static double yPerPixel(Element panel) {
        return (attr(panel, "data-y-max") - attr(panel, "data-y-min"))
                / (attr(panel, "data-bottom") - attr(panel, "data-top"));
    }
}
