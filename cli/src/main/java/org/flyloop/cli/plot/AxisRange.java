package org.flyloop.cli.plot;

/**
 * The span one axis shows and the step of its labelled ticks, fitted to data before the chart
 * library draws it, so that decibel axes step in 5, 10, 20… dB, degree axes in 15, 30, 45, 90…
 * degrees, and a logarithmic axis begins and ends on whole decades.
 *
 * @param scale how the axis steps
 * @param min   lower end, axis units
 * @param max   upper end, axis units
 * @param step  labelled tick spacing (10 for a decade on a LOG axis)
 */
record AxisRange(Scale scale, double min, double max, double step) {

    private static final double[] DECIBEL_STEPS = {5, 10, 20, 40, 60, 100, 200};
    private static final double[] DEGREE_STEPS = {15, 30, 45, 90, 180, 360, 720};
    private static final double[] MANTISSAS = {1, 2, 2.5, 5};

    /**
     * Fits [dataMin, dataMax]. LOG widens to whole decades. With {@code pad}, DECIBEL and DEGREE
     * widen to whole steps and LINEAR by 3 % and then to whole steps, picking the finest step that
     * gives at most {@code maxIntervals} intervals; without pad the data span is kept.
     */
    static AxisRange fit(Scale scale, double dataMin, double dataMax, int maxIntervals, boolean pad) {
        if (!Double.isFinite(dataMin) || !Double.isFinite(dataMax)) {
            dataMin = scale == Scale.LOG ? 1 : -1;
            dataMax = scale == Scale.LOG ? 10 : 1;
        }
        if (scale == Scale.LOG) {
            double lo = Math.pow(10, Math.floor(Math.log10(dataMin) + 1e-9));
            double hi = Math.pow(10, Math.ceil(Math.log10(dataMax) - 1e-9));
            return new AxisRange(scale, lo, hi <= lo ? lo * 10 : hi, 10);
        }
        if (dataMax - dataMin <= 0) {
            double half = dataMin == 0 ? 1 : 0.1 * Math.abs(dataMin);
            dataMin -= half;
            dataMax += half;
        }
        // Decibel and degree steps are coarse enough to leave room by themselves.
        double margin = pad && scale == Scale.LINEAR ? 0.03 * (dataMax - dataMin) : 0;
        double lo = dataMin - margin;
        double hi = dataMax + margin;
        double s = chooseStep(scale, lo, hi, maxIntervals);
        if (pad) {
            lo = Math.floor(lo / s + 1e-9) * s;
            hi = Math.ceil(hi / s - 1e-9) * s;
        }
        return new AxisRange(scale, lo, hi, s);
    }

    private static double chooseStep(Scale scale, double lo, double hi, int maxIntervals) {
        double[] fixed = scale == Scale.DECIBEL ? DECIBEL_STEPS : scale == Scale.DEGREE ? DEGREE_STEPS : null;
        if (fixed != null) {
            for (double s : fixed) {
                if (intervals(lo, hi, s) <= maxIntervals) {
                    return s;
                }
            }
        }
        double decade = Math.pow(10, Math.floor(Math.log10((hi - lo) / maxIntervals)));
        for (int k = 0; k < 3; k++, decade *= 10) {
            for (double m : MANTISSAS) {
                if (intervals(lo, hi, m * decade) <= maxIntervals) {
                    return m * decade;
                }
            }
        }
        return 10 * decade;
    }

    private static double intervals(double lo, double hi, double s) {
        return Math.ceil(hi / s - 1e-9) - Math.floor(lo / s + 1e-9);
    }

    /** Number of labelled intervals between the ends (decades on a LOG axis). */
    int intervals() {
        return (int) Math.round(scale == Scale.LOG ? Math.log10(max / min) : (max - min) / step);
    }

    /** True when {@code v} lies in the range (inclusive, with a hair of slack). */
    boolean contains(double v) {
        double slack = 1e-9 * (scale == Scale.LOG ? v : Math.max(max - min, 1e-300));
        return v >= min - slack && v <= max + slack && (scale != Scale.LOG || v > 0);
    }
}
