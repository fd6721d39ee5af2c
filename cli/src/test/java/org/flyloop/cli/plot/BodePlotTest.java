package org.flyloop.cli.plot;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Element;

/**
 * A Bode figure of an invented loop T(s) = ωI/(s·(1 + s/ωp1)·(1 + s/ωp2)) whose crossings have
 * closed forms (derivation beside each, data in {@link BodePlotTestData}), rendered by XChart to
 * SVG and PNG; the markers drawn in the SVG are found by their ink, mapped back through the axis
 * geometry and must sit where the closed forms say.
 *
 * <p>Tolerances are one drawn pixel: XChart places shapes to about a third of a pixel, and on
 * this five-decade axis of about 886 px one pixel is 1.3 % in frequency.
 */
class BodePlotTest {

    private static final double ONE_PIXEL = 1.0;

    @Test
    void gainCrossoverMarkerSitsWhereTheMagnitudeIsUnity() throws Exception {
        // Reference: |T| = 1 solved by Brent's method on the hand-written magnitude.
        double fc = new BrentSolver(1e-12, 1e-9).solve(200, f -> Math.log(BodePlotTestData.magnitude(f)), 10,
                BodePlotTestData.FP2);
        SvgProbe svg = new SvgProbe(PlotFiles.svg(BodePlot.figure(BodePlotTestData.data())));
        Element panel = svg.panel("magnitude");
        List<double[]> marks = SvgProbe.filledShapeCentres(panel, PlotTheme.markerInk(MarkerKind.GAIN_CROSSOVER));
        assertEquals(1, marks.size());
        double drawnHz = SvgProbe.xValue(panel, marks.get(0)[0]);
        assertEquals(0, Math.log(drawnHz / fc), ONE_PIXEL * Math.log(SvgProbe.xPerPixel(panel)),
                "marker at " + drawnHz + " Hz, crossover " + fc + " Hz");
        assertEquals(0, SvgProbe.yValue(panel, marks.get(0)[1]), ONE_PIXEL * SvgProbe.yPerPixel(panel),
                "marker y is 0 dB");
        // Phase margin: 180° − 90° − atan(fc/fp1) − atan(fc/fp2), from the same factors.
        double pm = 90 - Math.toDegrees(Math.atan(fc / BodePlotTestData.FP1) + Math.atan(fc / BodePlotTestData.FP2));
        String label = "fc = " + SiText.format(fc, "Hz", 3) + ", PM = " + SiText.fixed(pm, 1) + "°";
        assertTrue(SvgProbe.list(panel, "data-labels").contains(label), () -> panel.getAttribute("data-labels"));
        // The drawn shape is marked up with what it stands for.
        Element group = svg.groups(panel, "gain-crossover").get(0);
        assertEquals(label, group.getAttribute("data-label"));
        assertEquals(fc, SvgProbe.attr(group, "data-x"), 1e-4 * fc);
    }

    @Test
    void phaseCrossoverMarkerSitsAtTheGeometricMeanOfThePoles() throws Exception {
        SvgProbe svg = new SvgProbe(PlotFiles.svg(BodePlot.figure(BodePlotTestData.data())));
        Element mag = svg.panel("magnitude");
        String ink = PlotTheme.markerInk(MarkerKind.PHASE_CROSSOVER);
        List<double[]> marks = SvgProbe.filledShapeCentres(mag, ink);
        assertEquals(1, marks.size());
        double f180 = BodePlotTestData.F180;
        assertEquals(0, Math.log(SvgProbe.xValue(mag, marks.get(0)[0]) / f180),
                ONE_PIXEL * Math.log(SvgProbe.xPerPixel(mag)));
        double gm = -20 * Math.log10(BodePlotTestData.magnitude(f180));
        assertEquals(-gm, SvgProbe.yValue(mag, marks.get(0)[1]), ONE_PIXEL * SvgProbe.yPerPixel(mag),
                "drawn at |T| in dB");
        assertTrue(SvgProbe.list(mag, "data-labels").contains("GM = " + SiText.fixed(gm, 1) + " dB"));
        Element phase = svg.panel("phase");
        double[] onPhase = SvgProbe.filledShapeCentres(phase, ink).get(0);
        assertEquals(-180, SvgProbe.yValue(phase, onPhase[1]), ONE_PIXEL * SvgProbe.yPerPixel(phase),
                "on the phase panel at −180°");
    }

    @Test
    void svgHasTwoPanelsWithBothTracesLabelledAxesAndTheLimit() throws Exception {
        String text = PlotFiles.svg(BodePlot.figure(BodePlotTestData.data()));
        SvgProbe svg = new SvgProbe(text);
        assertEquals("http://www.w3.org/2000/svg", svg.root().getNamespaceURI());
        assertEquals(2, svg.groups(svg.root(), "panel").size());
        for (String name : List.of("magnitude", "phase")) {
            Element p = svg.panel(name);
            assertEquals(List.of("corner A (worst)", "corner B"), SvgProbe.list(p, "data-traces"), name);
            assertEquals("log", p.getAttribute("data-x-scale"));
            // Shared x axis: both plot areas span the same pixels.
            assertEquals(SvgProbe.attr(svg.panel("magnitude"), "data-left"), SvgProbe.attr(p, "data-left"), 1e-9);
            assertEquals(SvgProbe.attr(svg.panel("magnitude"), "data-right"), SvgProbe.attr(p, "data-right"), 1e-9);
        }
        assertEquals("magnitude (dB)", svg.panel("magnitude").getAttribute("data-y-title"));
        assertEquals("phase (°)", svg.panel("phase").getAttribute("data-y-title"));
        assertEquals("frequency (Hz)", svg.panel("phase").getAttribute("data-x-title"));
        assertTrue(svg.texts(svg.root()).containsAll(List.of("Invented loop", "two poles and an integrator")));
        Element mag = svg.panel("magnitude");
        assertTrue(SvgProbe.list(mag, "data-labels").contains("fsw/2 = 50 kHz"));
        List<Double> limit = SvgProbe.verticalLineXs(mag, PlotTheme.LIMIT);
        assertEquals(1, limit.size());
        assertEquals(0, Math.log(SvgProbe.xValue(mag, limit.get(0)) / 50e3), ONE_PIXEL * Math.log(SvgProbe.xPerPixel(mag)));
        // Inline in XHTML: no prolog, no DOCTYPE, no ids to collide, no url(#…) references.
        assertTrue(text.startsWith("<svg"));
        for (String banned : List.of("<?xml", "<!DOCTYPE", " id=\"", "url(", "xlink")) {
            assertFalse(text.contains(banned), banned);
        }
    }

    @Test
    void pngIsAPictureWithInkAndSeveralGreysOrColours() {
        BufferedImage img = PlotFiles.png(BodePlot.figure(BodePlotTestData.data()));
        assertTrue(img.getWidth() >= 1000 && img.getHeight() >= 600, img.getWidth() + "×" + img.getHeight());
        int dark = 0;
        Set<Integer> colours = new HashSet<>();
        for (int y = 0; y < img.getHeight(); y += 2) {
            for (int x = 0; x < img.getWidth(); x += 2) {
                int rgb = img.getRGB(x, y) & 0xffffff;
                colours.add(rgb);
                int lum = ((rgb >> 16) & 255) + ((rgb >> 8) & 255) + (rgb & 255);
                dark += lum < 3 * 128 ? 1 : 0;
            }
        }
        double inked = dark / ((img.getWidth() / 2.0) * (img.getHeight() / 2.0));
        assertTrue(inked > 0.01 && inked < 0.4, "dark fraction " + inked);
        assertTrue(colours.size() > 50, "distinct colours " + colours.size());
        // White paper, not the library's grey theme: the corners of the picture are white.
        assertEquals(0xffffff, img.getRGB(2, img.getHeight() - 3) & 0xffffff);
        assertEquals(0xffffff, img.getRGB(img.getWidth() - 3, 2) & 0xffffff);
    }
}
