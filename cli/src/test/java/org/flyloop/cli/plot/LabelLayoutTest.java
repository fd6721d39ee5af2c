package org.flyloop.cli.plot;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

/**
 * Label boxes as drawn in the SVG (rectangles stroked in the label-border grey), checked by plain
 * geometry against the plot area each panel reports and against the marker glyphs found by their
 * ink: every label gets a box, no box leaves the plot area, no two boxes overlap, and no box covers
 * a marker. The scenario is deliberately crowded: two long labels on vertical lines a few pixels
 * apart, two labelled markers almost on top of each other, a band label at the right edge.
 */
class LabelLayoutTest {

    private static Figure crowded() {
        int n = 400;
        double[] t = new double[n + 1];
        double[] a = new double[n + 1];
        double[] b = new double[n + 1];
        for (int i = 0; i <= n; i++) {
            t[i] = 20e-3 * i / n;
            a[i] = -0.12 * (t[i] / 4e-4) * Math.exp(1 - t[i] / 4e-4);
            b[i] = -0.17 * (t[i] / 5e-4) * Math.exp(1 - t[i] / 5e-4);
        }
        Panel p = new Panel("response", "output deviation", "V", Scale.LINEAR,
                List.of(new Trace("linear model", t, a, Emphasis.STRONG), new Trace("averaged model", t, b,
                        Emphasis.NORMAL)),
                List.of(new Marker(4e-4, -0.12, MarkerKind.PEAK, "peak −120 mV at 400 µs"),
                        new Marker(5.2e-4, -0.118, MarkerKind.SETTLING, "settled after 520 µs"),
                        new Marker(5e-4, -0.17, MarkerKind.PEAK, "averaged model: peak −170 mV")),
                List.of(ReferenceLine.guide(0)),
                List.of(new Band(-0.12, 0.12, "settling band ±120 mV (±1 % of Vout)")), 1, 0);
        Panel q = Panel.of("copy", "output deviation", "V", Scale.LINEAR,
                List.of(new Trace("linear model", t, a, Emphasis.STRONG)));
        return new Figure("Crowded labels", "", "time", "s", Scale.LINEAR, List.of(q, p),
                List.of(ReferenceLine.limit(9.0e-3, "first design limit at 9.0 ms"),
                        ReferenceLine.limit(9.6e-3, "second design limit at 9.6 ms")));
    }

    /** {x, y, w, h} of every label box under the panel. */
    private static List<double[]> boxes(Element panel) {
        String border = "stroke:" + SvgProbe.rgb(PlotTheme.LABEL_BORDER) + ";";
        List<double[]> out = new ArrayList<>();
        NodeList all = panel.getElementsByTagNameNS("*", "rect");
        for (int i = 0; i < all.getLength(); i++) {
            Element e = (Element) all.item(i);
            if (e.getAttribute("style").contains(border)) {
                out.add(new double[] {SvgProbe.attr(e, "x"), SvgProbe.attr(e, "y"), SvgProbe.attr(e, "width"),
                    SvgProbe.attr(e, "height")});
            }
        }
        return out;
    }

    @Test
    void everyLabelHasABoxInsideThePlotAreaClearOfTheOthersAndOfTheMarkers() throws Exception {
        SvgProbe svg = new SvgProbe(PlotFiles.svg(crowded()));
        Map<String, Integer> expected = new LinkedHashMap<>();
        expected.put("copy", 2);     // the two vertical-line labels go on the top panel
        expected.put("response", 4); // three markers and the band
        for (Map.Entry<String, Integer> e : expected.entrySet()) {
            Element panel = svg.panel(e.getKey());
            List<double[]> boxes = boxes(panel);
            assertEquals(e.getValue(), boxes.size(), e.getKey());
            double left = SvgProbe.attr(panel, "data-left");
            double right = SvgProbe.attr(panel, "data-right");
            double top = SvgProbe.attr(panel, "data-top");
            double bottom = SvgProbe.attr(panel, "data-bottom");
            for (double[] r : boxes) {
                assertTrue(r[0] >= left && r[0] + r[2] <= right && r[1] >= top && r[1] + r[3] <= bottom,
                        () -> e.getKey() + ": box " + java.util.Arrays.toString(r) + " leaves the plot area");
            }
            for (int i = 0; i < boxes.size(); i++) {
                for (int j = i + 1; j < boxes.size(); j++) {
                    double[] u = boxes.get(i);
                    double[] v = boxes.get(j);
                    boolean overlap = u[0] < v[0] + v[2] && v[0] < u[0] + u[2] && u[1] < v[1] + v[3]
                            && v[1] < u[1] + u[3];
                    assertFalse(overlap, e.getKey() + ": boxes " + i + " and " + j + " overlap");
                }
            }
            for (MarkerKind kind : MarkerKind.values()) {
                for (double[] m : SvgProbe.filledShapeCentres(panel, PlotTheme.markerInk(kind))) {
                    for (double[] r : boxes) {
                        boolean covered = m[0] > r[0] && m[0] < r[0] + r[2] && m[1] > r[1] && m[1] < r[1] + r[3];
                        assertFalse(covered, kind + " marker under a label box");
                    }
                }
            }
        }
    }

    @Test
    void legendOfTwelveCornersUsesSeveralColumnsAndListsTheEmphasisedTraceFirst() {
        Map<String, PlotTheme.TraceLook> looks = new LinkedHashMap<>();
        for (int i = 0; i < 11; i++) {
            looks.put("corner " + i + " / 375 V / 100 mA / CTR 160 %", PlotTheme.ordinary(i));
        }
        looks.put("worst corner", PlotTheme.strong());
        LegendBlock legend = new LegendBlock(looks, FigureRenderer.WIDTH);
        assertEquals("worst corner", legend.names().get(0));
        assertEquals(12, legend.names().size());
        assertTrue(legend.rows() <= 6, () -> "rows: " + legend.rows());
    }
}
