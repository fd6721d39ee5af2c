package org.flyloop.cli.plot;

import java.util.ArrayList;
import java.util.List;

/**
 * Cuts a polyline to a rectangle (Liang–Barsky per segment), so that the SVG and the PNG carry
 * only what is visible and neither needs a clip path. Non-finite points break the line.
 */
final class PolylineClip {

    /** A visible piece: x and y pixel coordinates. */
    record Run(double[] xs, double[] ys) {
    }

    private PolylineClip() {
    }

    static List<Run> clip(double[] px, double[] py, double left, double top, double right, double bottom) {
        List<Run> runs = new ArrayList<>();
        List<double[]> current = null;
        for (int i = 0; i + 1 < px.length; i++) {
            double[] seg = segment(px[i], py[i], px[i + 1], py[i + 1], left, top, right, bottom);
            if (seg == null) {
                current = flush(runs, current);
                continue;
            }
            boolean startClipped = seg[4] > 0;
            if (current == null || startClipped) {
                current = flush(runs, current);
                current = new ArrayList<>();
                current.add(new double[] {seg[0], seg[1]});
            }
            current.add(new double[] {seg[2], seg[3]});
            if (seg[5] < 1) {
                current = flush(runs, current);
            }
        }
        flush(runs, current);
        return runs;
    }

    private static List<double[]> flush(List<Run> runs, List<double[]> points) {
        if (points != null && points.size() >= 2) {
            double[] xs = new double[points.size()];
            double[] ys = new double[points.size()];
            for (int i = 0; i < xs.length; i++) {
                xs[i] = points.get(i)[0];
                ys[i] = points.get(i)[1];
            }
            runs.add(new Run(xs, ys));
        }
        return null;
    }

    /** {x0, y0, x1, y1, t0, t1} of the visible part, or null. */
    private static double[] segment(double x0, double y0, double x1, double y1, double left, double top,
                                    double right, double bottom) {
        if (!Double.isFinite(x0) || !Double.isFinite(y0) || !Double.isFinite(x1) || !Double.isFinite(y1)) {
            return null;
        }
        double dx = x1 - x0;
        double dy = y1 - y0;
        double[] p = {-dx, dx, -dy, dy};
        double[] q = {x0 - left, right - x0, y0 - top, bottom - y0};
        double t0 = 0;
        double t1 = 1;
        for (int k = 0; k < 4; k++) {
            if (p[k] == 0) {
                if (q[k] < 0) {
                    return null;
                }
            } else {
                double t = q[k] / p[k];
                if (p[k] < 0) {
                    t0 = Math.max(t0, t);
                } else {
                    t1 = Math.min(t1, t);
                }
            }
        }
        if (t0 > t1) {
            return null;
        }
        return new double[] {x0 + t0 * dx, y0 + t0 * dy, x0 + t1 * dx, y0 + t1 * dy, t0, t1};
    }
}
