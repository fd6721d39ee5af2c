package org.flyloop.averaged;

import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;

/**
 * The three inputs as piecewise-linear functions of time: constant pieces, ramps and steps. A step
 * is two points at the same instant; the value at that instant is the one after the step. The
 * simulator integrates between {@link #breakpoints()} so that no integration step straddles a
 * discontinuity. Immutable.
 */
public final class InputProfile {

    private final List<List<double[]>> points; // per input: {timeS, value} in time order

    private InputProfile(List<List<double[]>> points) {
        List<List<double[]>> copy = new ArrayList<>();
        for (List<double[]> p : points) {
            List<double[]> q = new ArrayList<>();
            for (double[] tv : p) {
                q.add(tv.clone());
            }
            copy.add(q);
        }
        this.points = copy;
    }

    /** All inputs held at {@code u} for all time. */
    public static InputProfile constant(AveragedInputs u) {
        List<List<double[]>> p = new ArrayList<>();
        for (int i = 0; i < AveragedInputs.NAMES.size(); i++) {
            List<double[]> one = new ArrayList<>();
            one.add(new double[] {0, u.get(i)});
            p.add(one);
        }
        return new InputProfile(p);
    }

    /** This profile with input {@code input} jumping to {@code value} at {@code timeS}. */
    public InputProfile step(int input, double timeS, double value) {
        return append(input, timeS, value, true);
    }

    /** This profile with input {@code input} ramping linearly to {@code value} over [startS, endS]. */
    public InputProfile ramp(int input, double startS, double endS, double value) {
        if (!(endS > startS)) {
            throw new IllegalArgumentException("ramp must end after it starts");
        }
        InputProfile held = append(input, startS, valueAt(input, startS), false);
        return held.append(input, endS, value, false);
    }

    private InputProfile append(int input, double timeS, double value, boolean step) {
        List<double[]> p = points.get(input);
        double[] last = p.get(p.size() - 1);
        if (timeS < last[0]) {
            throw new IllegalArgumentException("profile points must be added in time order");
        }
        List<List<double[]>> copy = new ArrayList<>(points);
        List<double[]> q = new ArrayList<>(p);
        if (step) {
            q.add(new double[] {timeS, valueAt(input, timeS)});
        }
        q.add(new double[] {timeS, value});
        copy.set(input, q);
        return new InputProfile(copy);
    }

    /** Value of one input at {@code timeS}, right-continuous at steps. */
    public double valueAt(int input, double timeS) {
        return valueAt(input, timeS, false);
    }

    private double valueAt(int input, double t, boolean leftLimit) {
        List<double[]> p = points.get(input);
        // k: last point strictly before t (left limit) or at or before t (right limit).
        int k = -1;
        for (int i = 0; i < p.size(); i++) {
            double ti = p.get(i)[0];
            if (ti < t || (!leftLimit && ti == t)) {
                k = i;
            }
        }
        if (k < 0) {
            return p.get(0)[1];
        }
        if (k == p.size() - 1) {
            return p.get(k)[1];
        }
        double[] a = p.get(k);
        double[] b = p.get(k + 1);
        // b[0] > a[0] here: equal times are a step, and k never stops between the two points.
        return a[1] + (b[1] - a[1]) * (t - a[0]) / (b[0] - a[0]);
    }

    /** All inputs at {@code timeS}, right-continuous at steps. */
    public AveragedInputs at(double timeS) {
        return new AveragedInputs(valueAt(0, timeS, false), valueAt(1, timeS, false), valueAt(2, timeS, false));
    }

    /** All inputs just before {@code timeS} (the left limit: the value before any step there). */
    public AveragedInputs before(double timeS) {
        return new AveragedInputs(valueAt(0, timeS, true), valueAt(1, timeS, true), valueAt(2, timeS, true));
    }

    /**
     * All inputs at {@code timeS} as seen from inside the interval (startS, endS]: at {@code endS}
     * the value before any step there.
     */
    AveragedInputs within(double timeS, double endS) {
        boolean left = timeS >= endS;
        double t = Math.min(timeS, endS);
        return new AveragedInputs(valueAt(0, t, left), valueAt(1, t, left), valueAt(2, t, left));
    }

    /** Sorted distinct times where an input has a step or a slope change. */
    public double[] breakpoints() {
        TreeSet<Double> set = new TreeSet<>();
        for (List<double[]> p : points) {
            for (double[] tv : p) {
                set.add(tv[0]);
            }
        }
        return set.stream().mapToDouble(Double::doubleValue).toArray();
    }
}
