package org.flyloop.envelope;

/**
 * Searches the inside of the tolerance box, at one corner, for a point where a figure is worse
 * than at the worst vertex found: a figure need not be monotonic in every tolerance (a crossover
 * that moves across a phase dip has its worst phase margin between the extremes), so the vertices
 * alone are not a bound.
 *
 * <p>The search is compass search (T. G. Kolda, R. M. Lewis and V. Torczon, "Optimization by
 * direct search: new perspectives on some classical and modern methods", SIAM Review 45(3), 2003,
 * §3): from the start, try each quantity ± the step, clamped to the box, and move to the first
 * point that is worse; when none is, halve the step, down to {@value #FINEST_STEP} of the band. It
 * needs no model of the objective, so a loop that loses a crossover on the way (an objective that
 * jumps) does no harm, and each step costs only loop evaluations. The result is never better than
 * the start.
 */
final class LocalWorstSearch {

    static final double FIRST_STEP = 0.25;
    static final double FINEST_STEP = 1.0 / 64;

    private final LoopEngine engine;
    private final LoopEngine.StageSide stage;
    private final LoopEngine.NetworkSide network;

    LocalWorstSearch(LoopEngine engine) {
        this.engine = engine;
        this.stage = engine.newStageSide();
        this.network = engine.newNetworkSide();
    }

    /** The worst point found: its position, the figures there and its badness. */
    record Found(double[] u, LoopFigures figures, double badness) {
    }

    /** Figures at corner {@code c} for point {@code u}; null where the stage cannot run. */
    LoopFigures evaluate(int c, double[] u) {
        engine.fillStage(stage, u, c);
        engine.fillNetwork(network, u);
        return engine.figures(stage, network, c);
    }

    /**
     * Searches from {@code start}, whose badness for {@code figure} is {@code startBadness}, with at
     * most {@code maxEvaluations} loop evaluations.
     */
    Found search(int c, EnvelopeFigure figure, double[] start, double startBadness, int maxEvaluations) {
        double[] x = start.clone();
        double worst = startBadness;
        LoopFigures worstFigures = null;
        int evaluations = 0;
        for (double h = FIRST_STEP; h >= FINEST_STEP && evaluations < maxEvaluations; ) {
            boolean moved = false;
            for (int j = 0; j < x.length && evaluations < maxEvaluations; j++) {
                for (int dir = 1; dir >= -1 && evaluations < maxEvaluations; dir -= 2) {
                    double was = x[j];
                    double to = Math.max(0, Math.min(1, was + dir * h));
                    if (to == was) {
                        continue;
                    }
                    x[j] = to;
                    LoopFigures f = evaluate(c, x);
                    evaluations++;
                    double b = f == null ? Double.NEGATIVE_INFINITY : figure.badness(f);
                    if (b > worst) {
                        worst = b;
                        worstFigures = f;
                        moved = true;
                        break;
                    }
                    x[j] = was;
                }
            }
            if (!moved) {
                h /= 2;
            }
        }
        return new Found(x, worstFigures, worst);
    }
}
