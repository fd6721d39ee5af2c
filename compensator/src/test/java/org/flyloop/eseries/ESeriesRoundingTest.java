package org.flyloop.eseries;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.junit.jupiter.api.Test;

/**
 * Rounding to the nearest member in the logarithmic sense, next lower/higher, across decades.
 * The properties are the definition of "nearest in log" checked against the neighbours the
 * series itself reports, over values from 1 pF-scale to 1 G-scale.
 */
class ESeriesRoundingTest {

    @Test
    void roundsAcrossTheDecadeBoundary() {
        // 9.9k lies between 9.76k and 10k: 9.9/9.76 = 1.0143 > 10/9.9 = 1.0101, so 10k.
        assertEquals(10e3, ESeries.E96.nearest(9.9e3), 0.0);
        assertEquals(4.99e3, ESeries.E96.nearest(4.99e3), 0.0);
        // 0.99 between 0.82 and 1.0 (E12): 1.0 is nearer.
        assertEquals(1.0, ESeries.E12.nearest(0.99), 0.0);
        assertEquals(10.0, ESeries.E12.nearest(10.4), 0.0);
        assertEquals(1.0, ESeries.E12.nearest(1.0), 0.0);
        assertEquals(10.0, ESeries.E12.nearest(10.0), 0.0);
        // Geometric mean of 8.2 and 10 is 9.0554: just below rounds down, just above rounds up.
        assertEquals(8.2, ESeries.E12.nearest(9.05), 0.0);
        assertEquals(10.0, ESeries.E12.nearest(9.06), 0.0);
        // Members at pico and nano scale: 4.0p lies between 3.3p and 4.7p, nearer 4.7p (E6).
        assertEquals(2.2e-9, ESeries.E6.nearest(2.2e-9), 0.0);
        assertEquals(4.7e-12, ESeries.E6.nearest(4.0e-12), 0.0);
    }

    @Test
    void nextLowerAndHigherStepOverDecades() {
        assertEquals(0.82, ESeries.E12.below(1.0), 0.0);
        assertEquals(10.0, ESeries.E12.above(8.2), 0.0);
        assertEquals(8.2, ESeries.E12.below(10.0), 0.0);
        assertEquals(9.76e3, ESeries.E96.below(10e3), 0.0);
        assertEquals(10.2e3, ESeries.E96.above(10e3), 0.0);
        assertEquals(4.87e3, ESeries.E96.atOrBelow(4.98e3), 0.0);
        assertEquals(4.99e3, ESeries.E96.atOrAbove(4.98e3), 0.0);
        assertEquals(4.99e3, ESeries.E96.atOrBelow(4.99e3), 0.0);
        assertEquals(4.99e3, ESeries.E96.atOrAbove(4.99e3), 0.0);
    }

    @Test
    void rejectsValuesOutsideTheSupportedRange() {
        assertThrows(IllegalArgumentException.class, () -> ESeries.E12.nearest(0));
        assertThrows(IllegalArgumentException.class, () -> ESeries.E12.nearest(-1e3));
        assertThrows(IllegalArgumentException.class, () -> ESeries.E12.nearest(Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> ESeries.E12.nearest(Double.POSITIVE_INFINITY));
        assertThrows(IllegalArgumentException.class, () -> ESeries.E12.nearest(1e19));
    }

    /**
     * Every member written as a decimal literal ("4.99e-12") maps to itself, decades 1e-12..1e9.
     * The literal is parsed by the JDK, independently of how the series forms its members.
     */
    @Test
    void exactMembersMapToThemselvesInEveryDecade() {
        for (ESeries s : ESeries.values()) {
            for (double m : s.decade()) {
                for (int e = -12; e <= 9; e++) {
                    double v = Double.parseDouble(m + "e" + e);
                    assertEquals(v, s.nearest(v), 0.0, s + " " + v);
                    assertEquals(v, s.atOrBelow(v), 0.0, s + " " + v);
                    assertEquals(v, s.atOrAbove(v), 0.0, s + " " + v);
                    assertTrue(s.contains(v), s + " " + v);
                    assertTrue(s.below(v) < v && s.above(v) > v, s + " " + v);
                }
            }
        }
    }

    @Property(tries = 400)
    void nearestIsNoFartherInLogThanEitherNeighbour(@ForAll ESeries series,
            @ForAll @DoubleRange(min = -12, max = 9) double exponent) {
        double v = Math.pow(10, exponent);
        double r = series.nearest(v);
        double d = Math.abs(Math.log(r / v));
        assertTrue(d <= Math.abs(Math.log(series.below(r) / v)), () -> series + " " + v + " -> " + r);
        assertTrue(d <= Math.abs(Math.log(series.above(r) / v)), () -> series + " " + v + " -> " + r);
    }

    @Property(tries = 400)
    void roundingErrorStaysWithinHalfAStep(@ForAll ESeries series,
            @ForAll @DoubleRange(min = -12, max = 9) double exponent) {
        double v = Math.pow(10, exponent);
        double r = series.nearest(v);
        double lo = series.atOrBelow(v);
        double hi = series.atOrAbove(v);
        assertTrue(lo <= v && v <= hi && (r == lo || r == hi));
        double err = Math.abs(Math.log(r / v));
        // Half the local step, with a few ulps of slack for the logarithms.
        assertTrue(err <= 0.5 * Math.log(hi / lo) + 1e-15, () -> series + " " + v);
        assertTrue(err <= 0.5 * widestStep(series) + 1e-15, () -> series + " " + v);
    }

    /** Largest ln ratio between successive members, wrap-around to the next decade included. */
    private static double widestStep(ESeries s) {
        List<Double> d = s.decade();
        double widest = Math.log(10 / d.get(d.size() - 1));
        for (int i = 1; i < d.size(); i++) {
            widest = Math.max(widest, Math.log(d.get(i) / d.get(i - 1)));
        }
        return widest;
    }
}
