package org.flyloop.cli.plot;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import javax.xml.parsers.DocumentBuilderFactory;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.Node;
import org.w3c.dom.NodeList;

/**
 * Reads a figure's SVG back as XML and maps drawn coordinates to values through the axis geometry
 * the renderer writes on every panel group.
 */
final class SvgProbe {

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

    /** Every text content of {@code <text>} elements under scope. */
    List<String> texts(Element scope) {
        List<String> out = new ArrayList<>();
        NodeList all = scope.getElementsByTagNameNS("*", "text");
        for (int i = 0; i < all.getLength(); i++) {
            out.add(all.item(i).getTextContent());
        }
        return out;
    }

    /** The first element child named {@code tag} (any shape the marker glyph is drawn with). */
    static Element first(Element scope, String tag) {
        NodeList l = scope.getElementsByTagNameNS("*", tag);
        return l.getLength() == 0 ? null : (Element) l.item(0);
    }

    static double attr(Element e, String name) {
        return Double.parseDouble(e.getAttribute(name));
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

    /**
     * Centre of a marker's glyph, the last shape drawn in its group (a label box comes before it):
     * circle centre, rectangle centre, or the middle of a polygon's bounding box.
     */
    static double[] glyphCentre(Element marker) {
        Element last = null;
        NodeList kids = marker.getChildNodes();
        for (int i = 0; i < kids.getLength(); i++) {
            Node n = kids.item(i);
            if (n instanceof Element e && List.of("circle", "rect", "polygon").contains(e.getLocalName())) {
                last = e;
            }
        }
        if (last == null) {
            throw new AssertionError("marker without a glyph");
        }
        switch (last.getLocalName()) {
            case "circle":
                return new double[] {attr(last, "cx"), attr(last, "cy")};
            case "rect":
                return new double[] {attr(last, "x") + attr(last, "width") / 2, attr(last, "y") + attr(last, "height") / 2};
            default:
                String[] pts = last.getAttribute("points").trim().split(" ");
                double[] xs = new double[pts.length];
                double[] ys = new double[pts.length];
                for (int i = 0; i < pts.length; i++) {
                    String[] xy = pts[i].split(",");
                    xs[i] = Double.parseDouble(xy[0]);
                    ys[i] = Double.parseDouble(xy[1]);
                }
                return new double[] {(min(xs) + max(xs)) / 2, (min(ys) + max(ys)) / 2};
        }
    }

    private static double min(double[] v) {
        double m = v[0];
        for (double x : v) {
            m = Math.min(m, x);
        }
        return m;
    }

    private static double max(double[] v) {
        double m = v[0];
        for (double x : v) {
            m = Math.max(m, x);
        }
        return m;
    }
}
