package org.flyloop.linear;

import java.util.List;

/** Example systems shared by the tests; invented scenarios, not taken from any product. */
final class TestSystems {

    private TestSystems() {
    }

    /**
     * A 10th-order response with features from 1 Hz to 1 MHz: seven pole entries (four real, three
     * pairs with Q 0.7, 4 and 1.5) and zeros at 10 Hz, a Q = 2 pair at 2 kHz and a right-half-plane
     * zero at 200 kHz.
     */
    static TransferFunction tenthOrder() {
        return TransferFunction.of(50, 0,
                List.of(Root.realAtHz(10), Root.pairAtHz(2e3, 2), Root.rightHalfPlaneAtHz(2e5)),
                List.of(Root.realAtHz(1), Root.pairAtHz(30, 0.7), Root.realAtHz(800), Root.pairAtHz(5e3, 4),
                        Root.pairAtHz(6e4, 1.5), Root.realAtHz(4e5), Root.realAtHz(1e6)));
    }

    /** Worst relative distance from each expected root to its nearest match in {@code actual}. */
    static double worstRootError(List<Root> expected, List<Root> actual) {
        if (expected.size() != actual.size()) {
            return Double.POSITIVE_INFINITY;
        }
        double worst = 0;
        boolean[] used = new boolean[actual.size()];
        for (Root e : expected) {
            int best = -1;
            double bestD = Double.POSITIVE_INFINITY;
            for (int i = 0; i < actual.size(); i++) {
                if (!used[i] && actual.get(i).isPair() == e.isPair() && e.relativeDistance(actual.get(i)) < bestD) {
                    bestD = e.relativeDistance(actual.get(i));
                    best = i;
                }
            }
            if (best < 0) {
                return Double.POSITIVE_INFINITY;
            }
            used[best] = true;
            worst = Math.max(worst, bestD);
        }
        return worst;
    }

    /** n frequencies log-spaced from lowHz to highHz inclusive. */
    static double[] logSpace(double lowHz, double highHz, int n) {
        double[] f = new double[n];
        for (int i = 0; i < n; i++) {
            f[i] = lowHz * Math.pow(highHz / lowHz, i / (n - 1.0));
        }
        return f;
    }
}
