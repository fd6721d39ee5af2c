package org.flyloop.cli.plot;

import java.util.ArrayList;
import java.util.List;

/**
 * One axis fitted to data: its range, the pixel span it maps onto, its ticks and their labels.
 * Immutable.
 */
final class Axis {

    private static final double[] DECIBEL_STEPS = {5, 10, 20, 40, 60, 100, 200};
    private static final double[] DEGREE_STEPS = {15, 30, 45, 90, 180, 360, 720};
    private static final double[] MANTISSAS = {1, 2, 2.5, 5};
    private static final String[] PREFIXES = {"p", "n", "µ", "m", "", "k", "M", "G"};

    private final Scale scale;
    private final double min;
    private final double max;
    private final double pxAtMin;
    private final double pxAtMax;
    private final double step;
    private final String unit;
    private final double displayFactor;
    private final String displayUnit;

    private Axis(Scale scale, double min, double max, double pxAtMin, double pxAtMax, double step, String unit) {
        this.scale = scale;
        this.min = min;
        this.max = max;
        this.pxAtMin = pxAtMin;
        this.pxAtMax = pxAtMax;
        this.step = step;
        this.unit = unit;
        if (scale == Scale.LINEAR && prefixable(unit)) {
            double big = Math.max(Math.abs(min), Math.abs(max));
            int e = big == 0 ? 0 : (int) Math.floor(Math.log10(big) / 3 + 1e-9);
            e = Math.max(-4, Math.min(3, e));
            this.displayFactor = Math.pow(1000, -e);
            this.displayUnit = PREFIXES[e + 4] + unit;
        } else {
            this.displayFactor = 1;
            this.displayUnit = unit;
        }
    }

    /** Units that take an SI prefix: not dB, degrees, percent or no unit at all. */
    private static boolean prefixable(String unit) {
        return !(unit.isEmpty() || unit.equals("dB") || unit.equals("°") || unit.equals("%"));
    }

    /**
     * Fits an axis around [dataMin, dataMax]. LOG widens to whole decades; with {@code pad},
     * DECIBEL and DEGREE widen to whole steps and LINEAR by 3 % and then to whole steps, picking the
     * finest step that gives at most {@code maxIntervals} intervals; without pad the data range is
     * kept.
     */
    static Axis fit(Scale scale, double dataMin, double dataMax, String unit, double pxAtMin, double pxAtMax,
                    int maxIntervals, boolean pad) {
        if (!Double.isFinite(dataMin) || !Double.isFinite(dataMax)) {
            dataMin = scale == Scale.LOG ? 1 : -1;
            dataMax = scale == Scale.LOG ? 10 : 1;
        }
        if (scale == Scale.LOG) {
            double lo = Math.pow(10, Math.floor(Math.log10(dataMin) + 1e-9));
            double hi = Math.pow(10, Math.ceil(Math.log10(dataMax) - 1e-9));
            if (hi <= lo) {
                hi = lo * 10;
            }
            return new Axis(scale, lo, hi, pxAtMin, pxAtMax, 10, unit);
        }
        if (dataMax - dataMin <= 0) {
            double half = dataMin == 0 ? 1 : 0.1 * Math.abs(dataMin);
            dataMin -= half;
            dataMax += half;
        }
        double span = dataMax - dataMin;
        // Decibel and degree steps are coarse enough to leave room by themselves.
        double margin = pad && scale == Scale.LINEAR ? 0.03 * span : 0;
        double lo = dataMin - margin;
        double hi = dataMax + margin;
        double s = chooseStep(scale, lo, hi, maxIntervals);
        if (pad) {
            lo = Math.floor(lo / s + 1e-9) * s;
            hi = Math.ceil(hi / s - 1e-9) * s;
        }
        return new Axis(scale, lo, hi, pxAtMin, pxAtMax, s, unit);
    }

    private static double chooseStep(Scale scale, double lo, double hi, int maxIntervals) {
        double[] fixed = scale == Scale.DECIBEL ? DECIBEL_STEPS : scale == Scale.DEGREE ? DEGREE_STEPS : null;
        if (fixed != null) {
            for (double s : fixed) {
                if (Math.ceil(hi / s - 1e-9) - Math.floor(lo / s + 1e-9) <= maxIntervals) {
                    return s;
                }
            }
        }
        double raw = (hi - lo) / maxIntervals;
        double decade = Math.pow(10, Math.floor(Math.log10(raw)));
        for (int k = 0; k < 3; k++, decade *= 10) {
            for (double m : MANTISSAS) {
                double s = m * decade;
                if (Math.ceil(hi / s - 1e-9) - Math.floor(lo / s + 1e-9) <= maxIntervals) {
                    return s;
                }
            }
        }
        return 10 * decade;
    }

    Scale scale() {
        return scale;
    }

    double min() {
        return min;
    }

    double max() {
        return max;
    }

    /** Pixel coordinate of a value (may lie outside the pixel span). */
    double toPixel(double v) {
        double f = scale == Scale.LOG ? Math.log10(v / min) / Math.log10(max / min) : (v - min) / (max - min);
        return pxAtMin + f * (pxAtMax - pxAtMin);
    }

    /** True when {@code v} lies in the axis range (inclusive, with a hair of slack). */
    boolean contains(double v) {
        double slack = 1e-9 * (scale == Scale.LOG ? v : Math.max(Math.abs(max - min), 1e-300));
        return v >= min - slack && v <= max + slack && (scale != Scale.LOG || v > 0);
    }

    /** Labelled tick values. */
    List<Double> majorTicks() {
        List<Double> out = new ArrayList<>();
        if (scale == Scale.LOG) {
            boolean fewDecades = Math.log10(max / min) < 1.5;
            for (double d = min; d <= max * (1 + 1e-9); d *= 10) {
                out.add(d);
                if (fewDecades && d * 2 < max) {
                    out.add(2 * d);
                    out.add(5 * d);
                }
            }
            return out;
        }
        for (long k = (long) Math.ceil(min / step - 1e-9); k * step <= max + 1e-9 * step; k++) {
            out.add(k * step);
        }
        return out;
    }

    /** Unlabelled light ticks (2…9 within each decade of a log axis). */
    List<Double> minorTicks() {
        List<Double> out = new ArrayList<>();
        if (scale == Scale.LOG) {
            for (double d = min; d < max * (1 - 1e-9); d *= 10) {
                for (int k = 2; k <= 9; k++) {
                    out.add(k * d);
                }
            }
        }
        return out;
    }

    /** Text of a major tick: "1k" style on log axes, plain numbers in the display unit otherwise. */
    String tickLabel(double v) {
        if (scale == Scale.LOG) {
            return v < 1000 ? SiText.plain(v, 3) : SiText.format(v, "", 3).replace(" ", "");
        }
        double rounded = Math.round(v / step) * step;
        return SiText.plain(rounded * displayFactor, 6);
    }

    /** "quantity (unit)" with the display prefix, e.g. "time (ms)". */
    String title(String quantity) {
        return displayUnit.isEmpty() ? quantity : quantity + " (" + displayUnit + ")";
    }
}
