package org.flyloop.cli.plot;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import org.junit.jupiter.api.Test;

class DecimationTest {

    @Test
    void keepsPeaksGapsAndEndsWhileCuttingThePointCount() {
        int n = 10_000;
        double[] x = new double[n];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = i;
            y[i] = Math.sin(i / 300.0) + (i == 4321 ? 5 : 0) - (i == 7777 ? 4 : 0);
        }
        y[5000] = Double.NaN;
        double[][] d = PanelChart.decimate(x, y, 900);
        assertTrue(d[0].length <= 901, "points kept: " + d[0].length);
        assertEquals(0, d[0][0]);
        assertEquals(n - 1, d[0][d[0].length - 1]);
        double max = Arrays.stream(d[1]).filter(Double::isFinite).max().orElseThrow();
        double min = Arrays.stream(d[1]).filter(Double::isFinite).min().orElseThrow();
        assertEquals(y[4321], max, 0, "the spike survives");
        assertEquals(y[7777], min, 0, "the dip survives");
        assertTrue(Arrays.stream(d[1]).anyMatch(Double::isNaN), "the gap survives");
        for (int i = 1; i < d[0].length; i++) {
            assertTrue(d[0][i] > d[0][i - 1], "x stays increasing");
        }
    }
}
