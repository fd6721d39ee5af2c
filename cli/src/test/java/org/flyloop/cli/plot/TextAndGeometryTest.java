package org.flyloop.cli.plot;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Number text, axis fitting and polyline clipping: the small pieces every figure relies on. */
class TextAndGeometryTest {

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
    void logAxisWidensToDecadesAndMapsThemEvenly() {
        Axis a = Axis.fit(Scale.LOG, 3.2, 65e3, "Hz", 100, 500, 10, false);
        assertEquals(1, a.min(), 1e-12);
        assertEquals(1e5, a.max(), 1e-6);
        assertEquals(100, a.toPixel(1), 1e-9);
        assertEquals(180, a.toPixel(10), 1e-9);
        assertEquals(500, a.toPixel(1e5), 1e-9);
        assertEquals(List.of("1", "10", "100", "1k", "10k", "100k"),
                a.majorTicks().stream().map(a::tickLabel).toList());
    }

    @Test
    void decibelAxisStepsInTwentiesAndVoltsGetAPrefix() {
        Axis db = Axis.fit(Scale.DECIBEL, -38, 75, "dB", 300, 0, 6, true);
        assertEquals(-40, db.min(), 1e-12);
        assertEquals(80, db.max(), 1e-12);
        Axis v = Axis.fit(Scale.LINEAR, -0.031, 0.004, "V", 300, 0, 6, true);
        assertEquals("output (mV)", v.title("output"));
    }

    @Test
    void clippingCutsAtTheFrameAndSplitsRuns() {
        // A zig-zag leaving the 0..10 box through its top and coming back.
        double[] x = {0, 5, 10, 15};
        double[] y = {5, 15, 5, 5};
        List<PolylineClip.Run> runs = PolylineClip.clip(x, y, 0, 0, 10, 10);
        assertEquals(2, runs.size());
        assertEquals(2.5, runs.get(0).xs()[1], 1e-12);
        assertEquals(10, runs.get(0).ys()[1], 1e-12);
        assertEquals(7.5, runs.get(1).xs()[0], 1e-12);
        assertEquals(10, runs.get(1).xs()[runs.get(1).xs().length - 1], 1e-12);
    }
}
