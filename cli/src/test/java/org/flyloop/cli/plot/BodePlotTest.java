package org.flyloop.cli.plot;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.flyloop.linear.FrequencyGrid;
import org.flyloop.linear.FrequencyResponse;
import org.flyloop.linear.Root;
import org.flyloop.linear.TransferFunction;
import org.flyloop.loop.GainCrossover;
import org.flyloop.loop.LoopMargins;
import org.flyloop.loop.MarginAnalyzer;
import org.flyloop.loop.PhaseCrossover;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Element;

/**
 * A Bode figure of an invented loop T(s) = ωI/(s·(1 + s/ωp1)·(1 + s/ωp2)) whose crossings have
 * closed forms (derivation beside each), rendered to SVG and PNG; the markers drawn in the SVG
 * are mapped back through the axis geometry and must sit where the closed forms say.
 */
class BodePlotTest {

    // Invented loop: integrator gain ωI, real poles at 2 kHz and 20 kHz.
    private static final double WI = 2 * Math.PI * 1500;
    private static final double FP1 = 2e3;
    private static final double FP2 = 20e3;

    private static final TransferFunction LOOP = TransferFunction.of(WI, 1, List.of(),
            List.of(Root.realAtHz(FP1), Root.realAtHz(FP2)));
    private static final TransferFunction OTHER_CORNER = LOOP.times(0.5);

    /** |T(j2πf)| written out from the factors, independent of the library's evaluation. */
    private static double magnitude(double f) {
        double w = 2 * Math.PI * f;
        return WI / (w * Math.hypot(1, f / FP1) * Math.hypot(1, f / FP2));
    }

    /**
     * Phase crossover: ∠T = −90° − atan(f/fp1) − atan(f/fp2) = −180° when
     * atan(f/fp1) + atan(f/fp2) = 90°, i.e. (f/fp1)·(f/fp2) = 1, so f180 = √(fp1·fp2).
     */
    private static final double F180 = Math.sqrt(FP1 * FP2);

    private static BodeData data() {
        FrequencyGrid grid = FrequencyGrid.logarithmic(10, 1e6, 60);
        LoopMargins m = MarginAnalyzer.analyze(LOOP, 1, 5e5);
        List<BodeMarker> marks = new ArrayList<>();
        for (GainCrossover g : m.gainCrossovers()) {
            marks.add(new BodeMarker(g.frequencyHz(), LOOP.magnitudeDb(g.frequencyHz()), LOOP.phaseDeg(g.frequencyHz()),
                    MarkerKind.GAIN_CROSSOVER, "fc = " + SiText.format(g.frequencyHz(), "Hz", 3) + ", PM = "
                    + SiText.fixed(g.phaseMarginDeg(), 1) + "°"));
        }
        for (PhaseCrossover p : m.phaseCrossovers()) {
            marks.add(new BodeMarker(p.frequencyHz(), LOOP.magnitudeDb(p.frequencyHz()), LOOP.phaseDeg(p.frequencyHz()),
                    MarkerKind.PHASE_CROSSOVER, "GM = " + SiText.fixed(p.gainMarginDb(), 1) + " dB"));
        }
        return BodeData.of("Invented loop", "two poles and an integrator", List.of(
                BodeTrace.of("corner A (worst)", FrequencyResponse.of(LOOP, grid), Emphasis.STRONG),
                BodeTrace.of("corner B", FrequencyResponse.of(OTHER_CORNER, grid), Emphasis.NORMAL)))
                .withMarkers(marks)
                .withVerticals(List.of(ReferenceLine.limit(50e3, "fsw/2 = 50 kHz")))
                .withGuides(List.of(ReferenceLine.guide(0)), List.of(ReferenceLine.guide(-180)));
    }

    @Test
    void gainCrossoverMarkerSitsWhereTheMagnitudeIsUnity() throws Exception {
        // Reference: |T| = 1 solved by Brent's method on the hand-written magnitude above.
        double fc = new BrentSolver(1e-12, 1e-9).solve(200, f -> Math.log(magnitude(f)), 10, FP2);
        SvgProbe svg = new SvgProbe(PlotFiles.svg(BodePlot.figure(data())));
        Element panel = svg.panel("magnitude");
        List<Element> marks = svg.groups(panel, "gain-crossover");
        assertEquals(1, marks.size());
        double[] at = SvgProbe.glyphCentre(marks.get(0));
        double drawnHz = SvgProbe.xValue(panel, at[0]);
        assertEquals(fc, drawnHz, 0.002 * fc, "marker x mapped back through the log axis");
        assertEquals(0, SvgProbe.yValue(panel, at[1]), 0.05, "marker y is 0 dB");
        assertEquals(fc, SvgProbe.attr(marks.get(0), "data-x"), 1e-4 * fc);
        // Phase margin: 180° − 90° − atan(fc/fp1) − atan(fc/fp2), from the same factors.
        double pm = 90 - Math.toDegrees(Math.atan(fc / FP1) + Math.atan(fc / FP2));
        assertTrue(svg.texts(marks.get(0)).contains("fc = " + SiText.format(fc, "Hz", 3) + ", PM = "
                + SiText.fixed(pm, 1) + "°"), () -> "label " + svg.texts(marks.get(0)));
    }

    @Test
    void phaseCrossoverMarkerSitsAtTheGeometricMeanOfThePoles() throws Exception {
        SvgProbe svg = new SvgProbe(PlotFiles.svg(BodePlot.figure(data())));
        Element mag = svg.panel("magnitude");
        List<Element> marks = svg.groups(mag, "phase-crossover");
        assertEquals(1, marks.size());
        double[] at = SvgProbe.glyphCentre(marks.get(0));
        assertEquals(F180, SvgProbe.xValue(mag, at[0]), 0.002 * F180);
        double gm = -20 * Math.log10(magnitude(F180));
        assertEquals(-gm, SvgProbe.yValue(mag, at[1]), 0.1, "drawn at |T| in dB");
        assertTrue(svg.texts(marks.get(0)).contains("GM = " + SiText.fixed(gm, 1) + " dB"));
        Element phase = svg.panel("phase");
        double[] onPhase = SvgProbe.glyphCentre(svg.groups(phase, "phase-crossover").get(0));
        assertEquals(-180, SvgProbe.yValue(phase, onPhase[1]), 0.5, "on the phase panel at −180°");
    }

    @Test
    void svgHasTwoPanelsWithBothTracesLabelledAxesAndTheLimit() throws Exception {
        SvgProbe svg = new SvgProbe(PlotFiles.svg(BodePlot.figure(data())));
        assertEquals("http://www.w3.org/2000/svg", svg.root().getNamespaceURI());
        for (String name : List.of("magnitude", "phase")) {
            Element p = svg.panel(name);
            assertEquals(2, svg.groups(p, "trace").size(), name);
            assertEquals("log", p.getAttribute("data-x-scale"));
        }
        List<String> texts = svg.texts(svg.root());
        assertTrue(texts.containsAll(List.of("magnitude (dB)", "phase (°)", "frequency (Hz)", "fsw/2 = 50 kHz",
                "corner A (worst)", "corner B", "1k", "10k")), texts::toString);
        Element limit = svg.groups(svg.panel("magnitude"), "limit").get(0);
        assertEquals(50e3, SvgProbe.attr(limit, "data-x"), 1e-6);
        Element line = SvgProbe.first(limit, "line");
        assertEquals(50e3, SvgProbe.xValue(svg.panel("magnitude"), SvgProbe.attr(line, "x1")), 100);
    }

    @Test
    void pngIsAPictureWithInkAndSeveralGreysOrColours() {
        BufferedImage img = PlotFiles.png(BodePlot.figure(data()));
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
    }
}
