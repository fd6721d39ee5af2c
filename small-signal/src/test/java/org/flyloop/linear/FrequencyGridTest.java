package org.flyloop.linear;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

class FrequencyGridTest {

    private static final double TWO_PI = 2 * Math.PI;

    @Test
    void logarithmicGridHasEndpointsAndDensity() {
        FrequencyGrid g = FrequencyGrid.logarithmic(1, 1e6, 50);
        assertEquals(301, g.size());
        assertEquals(1.0, g.lowHz(), 0);
        assertEquals(1e6, g.highHz(), 0);
        assertEquals(Math.pow(10, 1.0 / 50), g.frequencyHz(1) / g.frequencyHz(0), 1e-12);
    }

    @Test
    void lightlyDampedPeakIsFoundWithinHundredthOfDecibel() {
        // H = 1/(s² + 0.01·s + 100): ω0 = 10 rad/s, ω0/Q = 0.01 ⇒ Q = 1000, H(0) = 1/100.
        // At ω0 the s² and constant terms cancel, |H(jω0)| = 1/(0.01·10) = 10 = Q·H(0), i.e. +20 dB
        // (+60 dB above the DC gain). The true maximum, at ω0·√(1 − 1/(2Q²)), is higher by a factor
        // 1/√(1 − 1/(4Q²)), i.e. 1e−6 dB: irrelevant at the 0.01 dB tolerance.
        TransferFunction h = TransferFunction.of(0.01, 0, List.of(), List.of(Root.pair(10, 1000)));
        FrequencyResponse r = FrequencyResponse.of(h, FrequencyGrid.refinedFor(0.01, 100, 50, h));
        int peak = r.indexOfPeakMagnitude();
        assertEquals(20.0, r.magnitudeDb(peak), 0.01);
        assertEquals(10 / TWO_PI, r.frequencyHz(peak), 10 / TWO_PI / 4000);
        // the plain 50-per-decade grid misses the peak by far: the refinement is what finds it
        FrequencyResponse plain = FrequencyResponse.of(h, FrequencyGrid.logarithmic(0.01, 100, 50));
        assertTrue(plain.magnitudeDb(plain.indexOfPeakMagnitude()) < 10.0);
    }

    @Test
    void refinedGridIsSortedUniqueAndInsideRange() {
        TransferFunction h = TransferFunction.of(1, 0, List.of(Root.pairAtHz(300, 50)),
                List.of(Root.pairAtHz(10, 5), Root.pairAtHz(1e3, 200), new Root(0, TWO_PI * 5e3)));
        double[] f = FrequencyGrid.refinedFor(1, 1e4, 50, h).frequenciesHz();
        for (int i = 1; i < f.length; i++) {
            assertTrue(f[i] > f[i - 1] * (1 + 1e-12), "sorted and unique at " + i);
        }
        assertEquals(1.0, f[0], 0);
        assertEquals(1e4, f[f.length - 1], 0);
        // exact resonance included for finite Q, excluded for the jω-axis pair at 5 kHz
        assertTrue(contains(f, 1e3));
        assertTrue(!contains(f, 5e3));
    }

    private static boolean contains(double[] f, double x) {
        for (double v : f) {
            if (Math.abs(v / x - 1) < 1e-12) {
                return true;
            }
        }
        return false;
    }
}
