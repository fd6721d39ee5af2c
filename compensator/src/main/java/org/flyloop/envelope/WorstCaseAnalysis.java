package org.flyloop.envelope;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;

/**
 * The worst phase margin, gain margin and crossovers over every envelope corner and every
 * combination of tolerance extremes.
 *
 * <p>With k toleranced quantities (only those that move the loop, see {@link ToleranceBox}):
 * <ul>
 *   <li>k ≤ {@value #MAX_ENUMERATED}: every vertex of the box (each quantity at its lowest or its
 *       highest) and the centre, at every corner. The stage side has at most 2⁴ variants (lm, cout,
 *       esr, fsw) and is built once each; every compensator vertex is then combined with all of
 *       them in one grid pass per corner.</li>
 *   <li>k &gt; {@value #MAX_ENUMERATED}: per corner and figure, the sensitivity vertex (each
 *       quantity moved alone to both ends from the centre, and set to the end that made the figure
 *       worse), then single-quantity flips while any makes it worse (at most
 *       {@value #FLIP_PASSES} passes).</li>
 * </ul>
 * Either way the {@value #REFINED_CORNERS} corners with the worst value of each figure are then
 * searched inside the box from their worst point by compass search ({@link LocalWorstSearch}),
 * since a figure need not be monotonic in a tolerance.
 */
public final class WorstCaseAnalysis {

    /** Largest k whose 2^k vertices are all enumerated. */
    public static final int MAX_ENUMERATED = 12;
    static final int FLIP_PASSES = 3;
    static final int REFINED_CORNERS = 2;
    static final int REFINE_EVALUATIONS = 80;

    private WorstCaseAnalysis() {
    }

    /** The worst case with the local refinement. */
    public static WorstCase run(EnvelopeSetup setup) {
        return run(setup, true);
    }

    /**
     * The worst case.
     *
     * @param refine false to stop at the vertices (or the vertex search), for timing and comparison
     */
    public static WorstCase run(EnvelopeSetup setup, boolean refine) {
        return run(setup, refine, MAX_ENUMERATED);
    }

    /** The worst case, enumerating vertices only up to {@code maxEnumerated} quantities. */
    static WorstCase run(EnvelopeSetup setup, boolean refine, int maxEnumerated) {
        LoopEngine engine = new LoopEngine(setup);
        int k = setup.box().size();
        Tracker tracker = new Tracker(setup.corners().size());
        Set<String> infeasible = new LinkedHashSet<>();
        String method;
        if (k <= maxEnumerated) {
            enumerate(engine, tracker, infeasible);
            method = String.format(Locale.ROOT, "all %d vertices and the centre of the %d-quantity tolerance box "
                    + "at each of %d corners", 1 << k, k, setup.corners().size());
        } else {
            searchVertices(engine, tracker, infeasible);
            method = String.format(Locale.ROOT, "sensitivity vertex and single-flip descent over %d quantities "
                    + "at each of %d corners (2^%d vertices are too many to enumerate)", k, setup.corners().size(), k);
        }
        LocalWorstSearch local = new LocalWorstSearch(engine);
        if (refine && k > 0) {
            for (EnvelopeFigure figure : EnvelopeFigure.values()) {
                for (int c : tracker.worstCorners(figure, REFINED_CORNERS)) {
                    LocalWorstSearch.Found found = local.search(c, figure, tracker.pointOf(figure, c),
                            tracker.badness[figure.ordinal()][c], REFINE_EVALUATIONS);
                    if (found.figures() != null) {
                        tracker.offer(figure, c, found.u(), found.figures());
                    }
                }
            }
            method += ", then a compass search inside the box from the worst point of the "
                    + REFINED_CORNERS + " worst corners per figure";
        }
        List<String> names = setup.box().parameters().stream().map(ToleranceParameter::name).toList();
        return new WorstCase(tracker.result(setup, EnvelopeFigure.PHASE_MARGIN),
                tracker.result(setup, EnvelopeFigure.GAIN_MARGIN), tracker.result(setup, EnvelopeFigure.LOWEST_CROSSOVER),
                tracker.result(setup, EnvelopeFigure.HIGHEST_CROSSOVER), method, names, engine.loopsScanned(),
                new ArrayList<>(infeasible));
    }

    /** Every vertex and the centre: stage variants built once, each compensator variant combined with all. */
    private static void enumerate(LoopEngine engine, Tracker tracker, Set<String> infeasible) {
        EnvelopeSetup setup = engine.setup();
        int k = setup.box().size();
        int ks = setup.box().stageCount();
        int kn = k - ks;
        int stageVariants = (1 << ks) + (ks > 0 ? 1 : 0);
        int networkVariants = (1 << kn) + (kn > 0 ? 1 : 0);
        double[][] stagePoints = new double[stageVariants][];
        LoopEngine.StageSide[] stages = new LoopEngine.StageSide[stageVariants];
        for (int a = 0; a < stageVariants; a++) {
            stagePoints[a] = vertex(a, ks, 1 << ks);
            double[] u = new double[k];
            System.arraycopy(stagePoints[a], 0, u, 0, ks);
            stages[a] = engine.fillStage(engine.newStageSide(), u, -1);
        }
        LoopEngine.NetworkSide network = engine.newNetworkSide();
        double[] u = new double[k];
        for (int b = 0; b < networkVariants; b++) {
            double[] netPoint = vertex(b, kn, 1 << kn);
            System.arraycopy(netPoint, 0, u, ks, kn);
            engine.fillNetwork(network, u);
            for (int a = 0; a < stageVariants; a++) {
                System.arraycopy(stagePoints[a], 0, u, 0, ks);
                for (int c = 0; c < setup.corners().size(); c++) {
                    LoopFigures f = engine.figures(stages[a], network, c);
                    if (f == null) {
                        infeasible.add(setup.corners().get(c).label() + " with " + stageDeviations(setup, u)
                                + ": the stage cannot run: " + stages[a].infeasible[c]);
                    } else {
                        tracker.offerAll(c, u, f);
                    }
                }
            }
        }
    }

    /** The deviations of the stage quantities only (the stage side is what cannot run). */
    private static Map<String, Double> stageDeviations(EnvelopeSetup setup, double[] u) {
        Map<String, Double> all = new LinkedHashMap<>(setup.box().deviations(u));
        for (ToleranceParameter p : setup.box().parameters()) {
            if (!p.isStage()) {
                all.remove(p.name());
            }
        }
        return all;
    }

    /** Vertex {@code index} of a box of {@code dims} quantities; index == count gives the centre. */
    private static double[] vertex(int index, int dims, int count) {
        double[] p = new double[dims];
        for (int j = 0; j < dims; j++) {
            p[j] = index == count ? 0.5 : (index >> j) & 1;
        }
        return p;
    }

    /** Per corner and figure: the sensitivity vertex, then single flips while they make it worse. */
    private static void searchVertices(LoopEngine engine, Tracker tracker, Set<String> infeasible) {
        EnvelopeSetup setup = engine.setup();
        LocalWorstSearch probe = new LocalWorstSearch(engine);
        int k = setup.box().size();
        for (int c = 0; c < setup.corners().size(); c++) {
            double[] centre = new double[k];
            Arrays.fill(centre, 0.5);
            LoopFigures atCentre = probe.evaluate(c, centre);
            if (atCentre == null) {
                infeasible.add(setup.corners().get(c).label() + " with nominal parts: the stage cannot run");
                continue;
            }
            tracker.offerAll(c, centre, atCentre);
            for (EnvelopeFigure figure : EnvelopeFigure.values()) {
                double[] v = new double[k];
                for (int j = 0; j < k; j++) {
                    double[] p = centre.clone();
                    p[j] = 0;
                    double low = badness(probe.evaluate(c, p), figure);
                    p[j] = 1;
                    double high = badness(probe.evaluate(c, p), figure);
                    v[j] = high >= low ? 1 : 0;
                }
                LoopFigures fv = probe.evaluate(c, v);
                double worst = badness(fv, figure);
                if (fv != null) {
                    tracker.offerAll(c, v, fv);
                }
                for (int pass = 0; pass < FLIP_PASSES; pass++) {
                    boolean changed = false;
                    for (int j = 0; j < k; j++) {
                        v[j] = 1 - v[j];
                        LoopFigures f = probe.evaluate(c, v);
                        double b = badness(f, figure);
                        if (b > worst) {
                            worst = b;
                            tracker.offerAll(c, v, f);
                            changed = true;
                        } else {
                            v[j] = 1 - v[j];
                        }
                    }
                    if (!changed) {
                        break;
                    }
                }
            }
        }
    }

    private static double badness(LoopFigures f, EnvelopeFigure figure) {
        return f == null ? Double.NEGATIVE_INFINITY : figure.badness(f);
    }

    /** The worst point of each figure at each corner. */
    private static final class Tracker {
        final double[][] badness;
        final double[][][] points;
        final LoopFigures[][] figures;

        Tracker(int corners) {
            int n = EnvelopeFigure.values().length;
            badness = new double[n][corners];
            points = new double[n][corners][];
            figures = new LoopFigures[n][corners];
            for (double[] row : badness) {
                Arrays.fill(row, Double.NEGATIVE_INFINITY);
            }
        }

        void offerAll(int c, double[] u, LoopFigures f) {
            for (EnvelopeFigure figure : EnvelopeFigure.values()) {
                offer(figure, c, u, f);
            }
        }

        void offer(EnvelopeFigure figure, int c, double[] u, LoopFigures f) {
            int i = figure.ordinal();
            double b = figure.badness(f);
            if (b > badness[i][c] || points[i][c] == null && b == badness[i][c]) {
                badness[i][c] = b;
                points[i][c] = u.clone();
                figures[i][c] = f;
            }
        }

        double[] pointOf(EnvelopeFigure figure, int c) {
            return points[figure.ordinal()][c].clone();
        }

        /** Up to {@code n} corners with the worst value of {@code figure}, worst first. */
        List<Integer> worstCorners(EnvelopeFigure figure, int n) {
            int i = figure.ordinal();
            List<Integer> order = new ArrayList<>();
            for (int c = 0; c < badness[i].length; c++) {
                if (points[i][c] != null && badness[i][c] > Double.NEGATIVE_INFINITY) {
                    order.add(c);
                }
            }
            order.sort((x, y) -> Double.compare(badness[i][y], badness[i][x]));
            return order.subList(0, Math.min(n, order.size()));
        }

        WorstFigure result(EnvelopeSetup setup, EnvelopeFigure figure) {
            int i = figure.ordinal();
            int worst = -1;
            for (int c = 0; c < badness[i].length; c++) {
                if (points[i][c] != null && (worst < 0 || badness[i][c] > badness[i][worst])) {
                    worst = c;
                }
            }
            if (worst < 0 || (badness[i][worst] == Double.NEGATIVE_INFINITY && figure != EnvelopeFigure.GAIN_MARGIN)) {
                return new WorstFigure(figure, Double.NaN, null, null);
            }
            return new WorstFigure(figure, figure.valueOf(figures[i][worst]), setup.corners().get(worst),
                    setup.box().deviations(points[i][worst]));
        }
    }
}
