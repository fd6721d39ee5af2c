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
 * drawn in the SVG, mapped back through both axes, must land there.
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
        Element peak = svg.groups(panel, "peak").get(0);
        double[] at = SvgProbe.glyphCentre(peak);
        // Sampling 1.25 µs apart and 0.01 px coordinates: 0.5 % in time, 0.5 % of the peak in value.
        assertEquals(tp, SvgProbe.xValue(panel, at[0]), 0.005 * tp);
        assertEquals(yp, SvgProbe.yValue(panel, at[1]), 0.005 * yp + 0.5 * (SvgProbe.attr(panel, "data-y-max")
                - SvgProbe.attr(panel, "data-y-min")) / (SvgProbe.attr(panel, "data-bottom")
                - SvgProbe.attr(panel, "data-top")));
    }

    @Test
    void bothModelsAreDrawnAndTheAxesCarryPrefixedUnits() throws Exception {
        SvgProbe svg = new SvgProbe(PlotFiles.svg(StepPlot.figure(data())));
        assertEquals(2, svg.groups(svg.panel("response"), "trace").size());
        List<String> texts = svg.texts(svg.root());
        assertTrue(texts.containsAll(List.of("time (ms)", "output (mV)", "model one", "model two", "band")),
                texts::toString);
        assertTrue(PlotFiles.png(StepPlot.figure(data())).getWidth() > 1000);
    }
}
