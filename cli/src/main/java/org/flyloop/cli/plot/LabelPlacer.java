package org.flyloop.cli.plot;

import java.util.ArrayList;
import java.util.List;

/**
 * Finds a spot for each annotation box inside a plot area, in pixels: among the candidate spots a
 * caller offers, it keeps those inside the area and clear of every box placed before, and takes
 * the one crossing the fewest drawn trace pixels, nearer candidates winning ties. Greedy, so the
 * first-placed (most important) labels sit closest to what they name.
 */
final class LabelPlacer {

    /** Clearance kept between two boxes and between a box and the plot frame, px. */
    private static final double CLEARANCE = 2;
    /** What one step further from the preferred spot costs, in crossed trace pixels. */
    private static final double COST_PER_RANK = 1.5;

    private final double left;
    private final double top;
    private final double right;
    private final double bottom;
    private final int columns;
    private final int rows;
    private final boolean[] inked;
    private final List<double[]> taken = new ArrayList<>();

    /** A plot area from ({@code left}, {@code top}) to ({@code right}, {@code bottom}), px. */
    LabelPlacer(double left, double top, double right, double bottom) {
        this.left = left;
        this.top = top;
        this.right = right;
        this.bottom = bottom;
        columns = Math.max(1, (int) Math.ceil(right - left) + 1);
        rows = Math.max(1, (int) Math.ceil(bottom - top) + 1);
        inked = new boolean[columns * rows];
    }

    /** Marks the pixels along a drawn polyline (non-finite points break it) as inked. */
    void ink(double[] xs, double[] ys) {
        for (int i = 1; i < xs.length; i++) {
            if (!Double.isFinite(xs[i - 1] + ys[i - 1] + xs[i] + ys[i])) {
                continue;
            }
            double steps = Math.max(1, Math.ceil(Math.max(Math.abs(xs[i] - xs[i - 1]), Math.abs(ys[i] - ys[i - 1]))));
            for (int k = 0; k <= steps && steps < 1e5; k++) {
                double f = k / steps;
                inkPixel(xs[i - 1] + f * (xs[i] - xs[i - 1]), ys[i - 1] + f * (ys[i] - ys[i - 1]));
            }
        }
    }

    private void inkPixel(double px, double py) {
        int c = (int) Math.round(px - left);
        int r = (int) Math.round(py - top);
        if (c >= 0 && c < columns && r >= 0 && r < rows) {
            inked[r * columns + c] = true;
        }
    }

    /** Marks a rectangle as occupied: no box will be placed over it. */
    void reserve(double x, double y, double w, double h) {
        taken.add(new double[] {x, y, w, h});
    }

    /**
     * Chooses among {@code candidates} (top-left corners, in order of preference) for a
     * {@code w} × {@code h} box and reserves it. When none is free, the first candidate is pushed
     * inside the area, so the label is at least never clipped.
     *
     * @return top-left corner {x, y}
     */
    double[] place(List<double[]> candidates, double w, double h) {
        double[] best = null;
        double bestCost = Double.POSITIVE_INFINITY;
        for (int rank = 0; rank < candidates.size(); rank++) {
            double[] c = candidates.get(rank);
            if (!free(c[0], c[1], w, h)) {
                continue;
            }
            double cost = inkedWithin(c[0], c[1], w, h) + COST_PER_RANK * rank;
            if (cost < bestCost) {
                bestCost = cost;
                best = c;
            }
        }
        if (best == null) {
            double[] first = candidates.isEmpty() ? new double[] {left, top} : candidates.get(0);
            best = new double[] {clamp(first[0], left + CLEARANCE, right - CLEARANCE - w),
                clamp(first[1], top + CLEARANCE, bottom - CLEARANCE - h)};
        }
        reserve(best[0], best[1], w, h);
        return best.clone();
    }

    private boolean free(double x, double y, double w, double h) {
        if (x < left + CLEARANCE || y < top + CLEARANCE || x + w > right - CLEARANCE || y + h > bottom - CLEARANCE) {
            return false;
        }
        for (double[] r : taken) {
            if (x < r[0] + r[2] + CLEARANCE && r[0] < x + w + CLEARANCE && y < r[1] + r[3] + CLEARANCE
                    && r[1] < y + h + CLEARANCE) {
                return false;
            }
        }
        return true;
    }

    private int inkedWithin(double x, double y, double w, double h) {
        int c0 = Math.max(0, (int) Math.floor(x - left));
        int c1 = Math.min(columns - 1, (int) Math.ceil(x + w - left));
        int r0 = Math.max(0, (int) Math.floor(y - top));
        int r1 = Math.min(rows - 1, (int) Math.ceil(y + h - top));
        int n = 0;
        for (int r = r0; r <= r1; r++) {
            for (int c = c0; c <= c1; c++) {
                if (inked[r * columns + c]) {
                    n++;
                }
            }
        }
        return n;
    }

    private static double clamp(double v, double lo, double hi) {
        return Math.max(lo, Math.min(hi, v));
    }
}
