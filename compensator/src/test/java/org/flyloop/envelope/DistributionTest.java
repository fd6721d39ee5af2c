package org.flyloop.envelope;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Arrays;
import java.util.SplittableRandom;
import org.apache.commons.math3.stat.descriptive.rank.Percentile;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class DistributionTest {

    /** Hyndman and Fan's definition 7 as implemented by Commons Math (Percentile, EstimationType.R_7). */
    @ParameterizedTest
    @ValueSource(ints = {1, 2, 3, 10, 101, 1000})
    void percentilesMatchCommonsMathDefinitionSeven(int n) {
        SplittableRandom random = new SplittableRandom(n);
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = random.nextGaussian() * 10 + 45;
        }
        Percentile reference = new Percentile().withEstimationType(Percentile.EstimationType.R_7);
        Distribution d = Distribution.of(x);
        assertEquals(reference.evaluate(x, 1), d.p01(), 1e-12);
        assertEquals(reference.evaluate(x, 50), d.p50(), 1e-12);
        assertEquals(reference.evaluate(x, 99), d.p99(), 1e-12);
        assertEquals(Arrays.stream(x).min().orElseThrow(), d.min());
        assertEquals(Arrays.stream(x).max().orElseThrow(), d.max());
        assertEquals(n, d.count());
    }

    @Test
    void infiniteValuesStayAtTheirEndAndNanIsLeftOut() {
        double inf = Double.POSITIVE_INFINITY;
        Distribution gm = Distribution.of(new double[] {12, 14, inf, inf, inf, Double.NaN});
        assertEquals(5, gm.count());
        assertEquals(inf, gm.p50());
        assertEquals(12 + 0.04 * 2, gm.p01(), 1e-12);
        Distribution pm = Distribution.of(new double[] {Double.NEGATIVE_INFINITY, 40, 50});
        assertEquals(Double.NEGATIVE_INFINITY, pm.p01());
        assertEquals(40, pm.p50());
    }
}
