package org.flyloop.cli.plot;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import javax.xml.parsers.DocumentBuilderFactory;
import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.awt.Color;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Rectangle2D;
import java.util.List;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.junit.jupiter.api.Test;

/** Number text, axis fitting and the Java2D-to-SVG bridge: the small pieces every figure relies on. */
class AxisAndTextTest {

    @Test
    void siTextPicksThePrefixAndRoundsAcrossIt() {
        assertEquals("2.13 kHz", SiText.format(2134.5, "Hz", 3));
        assertEquals("49.9 kΩ", SiText.format(49.9e3, "Ω", 3));
        assertEquals("−120 mV", SiText.format(-0.12, "V", 3));
        assertEquals("1 MHz", SiText.format(999_999.7, "Hz", 3));
        assertEquals("4.7 nF", SiText.format(4.7e-9, "F", 3));
        assertEquals("0 A", SiText.format(0, "A", 3));
        assertEquals("−0.5", SiText.fixed(-0.5, 1));
        assertEquals("0.0", SiText.fixed(-0.01, 1));
    }

    @Test
    void logAxisWidensToWholeDecades() {
        AxisRange a = AxisRange.fit(Scale.LOG, 3.2, 65e3, 10, false);
        assertEquals(1, a.min(), 1e-12);
        assertEquals(1e5, a.max(), 1e-6);
        assertEquals(5, a.intervals());
        assertTrue(a.contains(65e3) && !a.contains(2e5) && !a.contains(-1));
    }

    @Test
    void decibelAxisStepsInTwentiesAndVoltsGetAPrefix() {
        AxisRange db = AxisRange.fit(Scale.DECIBEL, -38, 75, 6, true);
        assertEquals(-40, db.min(), 1e-12);
        assertEquals(80, db.max(), 1e-12);
        assertEquals(20, db.step(), 1e-12);
        AxisRange deg = AxisRange.fit(Scale.DEGREE, -250, -95, 6, true);
        // 15° steps would need −255…−90, 11 intervals; 30° fits −270…−90 in 6.
        assertEquals(30, deg.step(), 1e-12);
        assertEquals(-270, deg.min(), 1e-12);
        assertEquals(-90, deg.max(), 1e-12);
        assertEquals("output (mV)", AxisUnit.of("V", 0.031, true).title("output"));
        assertEquals(1000, AxisUnit.of("V", 0.031, true).factor(), 1e-9);
        assertEquals("time (µs)", AxisUnit.of("s", 400e-6, true).title("time"));
        assertEquals("magnitude (dB)", AxisUnit.of("dB", 80, true).title("magnitude"));
        assertEquals("frequency (Hz)", AxisUnit.of("Hz", 1e6, false).title("frequency"));
    }

    @Test
    void java2dPaintingBecomesATranslatedGroupWithoutClipReferencesAndWithTaggedShapes() throws Exception {
        Java2dSvg.Result r = Java2dSvg.record(10, 20, 200, 100, g -> {
            g.clip(new Rectangle2D.Double(5, 5, 150, 90));
            g.setColor(new Color(0x336699));
            g.fill(new Rectangle2D.Double(0, 0, 100, 100));
            g.setColor(new Color(0x102030));
            g.fill(new Ellipse2D.Double(40, 30, 8, 8));
            return new PaintedLayer(Map.of("k", "v"), List.of(new PaintedLayer.ShapeTag("#102030", "marker dot",
                    Map.of("label", "a < b"))), "");
        });
        assertEquals(Map.of("k", "v"), r.layer().data());
        assertTrue(r.body().startsWith("<g transform=\"translate(10 20)\">"), r.body());
        for (String banned : List.of("<?xml", "<!DOCTYPE", "clip-path", "<defs", "url(", " id=")) {
            assertFalse(r.body().contains(banned), banned);
        }
        String doc = "<svg xmlns=\"http://www.w3.org/2000/svg\">" + r.body() + "</svg>";
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        Document d = f.newDocumentBuilder().parse(new ByteArrayInputStream(doc.getBytes(StandardCharsets.UTF_8)));
        Element dot = (Element) d.getElementsByTagNameNS("*", "circle").item(0);
        assertEquals(44, Double.parseDouble(dot.getAttribute("cx")), 1e-9);
        assertEquals(34, Double.parseDouble(dot.getAttribute("cy")), 1e-9);
        Element group = (Element) dot.getParentNode();
        assertEquals("marker dot", group.getAttribute("class"));
        assertEquals("a < b", group.getAttribute("data-label"));
    }
}
