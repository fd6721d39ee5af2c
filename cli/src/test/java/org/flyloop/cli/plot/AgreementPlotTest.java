package org.flyloop.cli.plot;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Element;

/**
 * Two responses that differ by a known factor (1 + jf/f0): the difference is 10·log10(1 + (f/f0)²)
 * dB and atan(f/f0) in phase, in closed form; the figure's difference data and its worst-case
 * marker (limited to the comparison range) must follow.
 */
class AgreementPlotTest {

    private static final double F0 = 1e3;

    private static AgreementData data(double limitHz) {
        int n = 121;
        double[] f = new double[n];
        double[] magA = new double[n];
        double[] phA = new double[n];
        double[] magB = new double[n];
        double[] phB = new double[n];
        for (int i = 0; i < n; i++) {
            f[i] = 10 * Math.pow(10, 4.0 * i / (n - 1));
            magA[i] = -20 * Math.log10(f[i] / 10);
            phA[i] = -90 - 300 * i / (double) n;
            magB[i] = magA[i] + 10 * Math.log10(1 + Math.pow(f[i] / F0, 2));
            // 360° apart on purpose: the wrapped difference must not see it.
            phB[i] = phA[i] + Math.toDegrees(Math.atan(f[i] / F0)) - 360;
        }
        return new AgreementData("Agreement", "", new BodeTrace("reference", f, magA, phA, Emphasis.STRONG),
                new BodeTrace("model", f, magB, phB, Emphasis.NORMAL), List.of(), limitHz, List.of());
    }

    @Test
    void differencesFollowTheClosedFormAndWrapPhase() {
        AgreementData d = data(Double.POSITIVE_INFINITY);
        double[] f = d.reference().frequencyHz();
        double[] db = d.differenceDb();
        double[] deg = d.differenceDeg();
        for (int i = 0; i < f.length; i++) {
            assertEquals(10 * Math.log10(1 + Math.pow(f[i] / F0, 2)), db[i], 1e-9);
            assertEquals(Math.toDegrees(Math.atan(f[i] / F0)), deg[i], 1e-9);
        }
    }

    @Test
    void worstMarkerStaysInsideTheComparisonRange() throws Exception {
        double limit = 5e3;
        SvgProbe svg = new SvgProbe(PlotFiles.svg(AgreementPlot.figure(data(limit))));
        Element panel = svg.panel("difference-magnitude");
        Element worst = svg.groups(panel, "disagreement").get(0);
        double f = SvgProbe.attr(worst, "data-x");
        // The difference grows with f, so the worst point is the last grid point at or below the limit.
        double step = Math.pow(10, 4.0 / 120);
        assertTrue(f <= limit && f * step > limit, "worst at " + f);
        assertEquals(10 * Math.log10(1 + Math.pow(f / F0, 2)), SvgProbe.attr(worst, "data-y"), 1e-9);
        assertEquals(4, svg.groups(svg.root(), "panel").size());
        assertTrue(svg.texts(svg.root()).contains("Δ magnitude (dB)"));
    }

    @Test
    void refusesResponsesOnDifferentFrequencies() {
        AgreementData d = data(1e3);
        BodeTrace shifted = new BodeTrace("model", scaled(d.model().frequencyHz(), 1.01), d.model().magnitudeDb(),
                d.model().phaseDeg(), Emphasis.NORMAL);
        assertThrows(IllegalArgumentException.class, () -> new AgreementData("x", "", d.reference(), shifted,
                List.of(), 1e3, List.of()));
    }

    private static double[] scaled(double[] v, double k) {
        double[] out = v.clone();
        for (int i = 0; i < out.length; i++) {
            out[i] *= k;
        }
        return out;
    }
}
