package org.flyloop.cli.plot;

import java.util.ArrayList;
import java.util.List;

/**
 * Finds a free spot for each annotation box inside a plot area: tries the four diagonals around
 * the point, then the same further out, and takes the first that stays inside the area and clear
 * of everything placed before. Greedy, so the first-placed (most important) labels sit closest.
 */
final class LabelPlacer {

    private static final double GAP = 9;
    private final double left;
    private final double top;
    private final double right;
    private final double bottom;
    private final List<double[]> taken = new ArrayList<>();

    LabelPlacer(double left, double top, double right, double bottom) {
        this.left = left;
        this.top = top;
        this.right = right;
        this.bottom = bottom;
    }

    /** Marks a rectangle as occupied. */
    void reserve(double x, double y, double w, double h) {
        taken.add(new double[] {x, y, w, h});
    }

    /** Top-left corner {x, y} for a w × h box near (px, py); the box is then reserved. */
    double[] place(double px, double py, double w, double h) {
        for (int ring = 0; ring < 8; ring++) {
            double d = ring * (h + 4);
            double[][] candidates = {
                {px + GAP, py - GAP - h - d}, {px - GAP - w, py - GAP - h - d},
                {px + GAP, py + GAP + d}, {px - GAP - w, py + GAP + d},
            };
            for (double[] c : candidates) {
                if (fits(c[0], c[1], w, h)) {
                    reserve(c[0], c[1], w, h);
                    return c;
                }
            }
        }
        double x = Math.max(left + 2, Math.min(right - w - 2, px + GAP));
        double y = Math.max(top + 2, Math.min(bottom - h - 2, py - GAP - h));
        reserve(x, y, w, h);
        return new double[] {x, y};
    }

    private boolean fits(double x, double y, double w, double h) {
        if (x < left + 2 || y < top + 2 || x + w > right - 2 || y + h > bottom - 2) {
            return false;
        }
        for (double[] r : taken) {
            if (x < r[0] + r[2] + 2 && r[0] < x + w + 2 && y < r[1] + r[3] + 2 && r[1] < y + h + 2) {
                return false;
            }
        }
        return true;
    }
}
