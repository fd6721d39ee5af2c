package org.flyloop.cli.plot;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Element;

/**
 * A step figure of the unit step response of a standard second-order system, whose peak has a
 * closed form: tp = π/ωd, overshoot Mp = exp(−ζπ/√(1 − ζ²)) (K. Ogata, Modern Control Engineering,
 * 5th ed., 2010, §5-3, transient-response specifications of second-order systems). The peak marker
 * XChart draws in the SVG, found by its ink and mapped back through both axes, must land there.
 */
class StepPlotTest {

    private static final double ZETA = 0.3;
    private static final double WN = 2 * Math.PI * 1000;

    private static double[][] response(double scale, int n, double windowS) {
        double wd = WN * Math.sqrt(1 - ZETA * ZETA);
        double[] t = new double[n + 1];
        double[] y = new double[n + 1];
        for (int i = 0; i <= n; i++) {
            t[i] = windowS * i / n;
            y[i] = scale * (1 - Math.exp(-ZETA * WN * t[i])
                    * (Math.cos(wd * t[i]) + ZETA / Math.sqrt(1 - ZETA * ZETA) * Math.sin(wd * t[i])));
        }
        return new double[][] {t, y};
    }

    private static StepData data() {
        double[][] a = response(0.1, 4000, 5e-3);
        double[][] b = response(0.08, 900, 5e-3);
        int peak = 0;
        for (int i = 0; i < a[1].length; i++) {
            peak = a[1][i] > a[1][peak] ? i : peak;
        }
        return StepData.of("Second-order step", "", "output", "V",
                List.of(new Trace("model one", a[0], a[1], Emphasis.STRONG)))
                .withSeries(new Trace("model two", b[0], b[1], Emphasis.NORMAL))
                .withMarker(new Marker(a[0][peak], a[1][peak], MarkerKind.PEAK, "peak"))
                .withBand(new Band(0.099, 0.101, "band"));
    }

    @Test
    void peakMarkerMapsBackToTheClosedFormPeak() throws Exception {
        double tp = Math.PI / (WN * Math.sqrt(1 - ZETA * ZETA));
        double yp = 0.1 * (1 + Math.exp(-ZETA * Math.PI / Math.sqrt(1 - ZETA * ZETA)));
        SvgProbe svg = new SvgProbe(PlotFiles.svg(StepPlot.figure(data())));
        Element panel = svg.panel("response");
        List<double[]> peaks = SvgProbe.filledShapeCentres(panel, PlotTheme.markerInk(MarkerKind.PEAK));
        assertEquals(1, peaks.size());
        double[] at = peaks.get(0);
        // One drawn pixel (XChart's placement) plus, in y, the triangle's centre being up to 1.5 px
        // off its anchor; the 1.25 µs sampling is far finer than a pixel (about 6 µs here).
        assertEquals(tp, SvgProbe.xValue(panel, at[0]), SvgProbe.xPerPixel(panel));
        assertEquals(yp, SvgProbe.yValue(panel, at[1]), 2.5 * SvgProbe.yPerPixel(panel));
    }

    @Test
    void bothModelsAreDrawnAndTheAxesCarryPrefixedUnits() throws Exception {
        SvgProbe svg = new SvgProbe(PlotFiles.svg(StepPlot.figure(data())));
        Element panel = svg.panel("response");
        assertEquals(List.of("model one", "model two"), SvgProbe.list(panel, "data-traces"));
        assertEquals("time (ms)", panel.getAttribute("data-x-title"));
        assertEquals("output (mV)", panel.getAttribute("data-y-title"));
        assertTrue(SvgProbe.list(panel, "data-labels").containsAll(List.of("peak", "band")));
        assertTrue(PlotFiles.png(StepPlot.figure(data())).getWidth() > 1000);
    }
}
