package org.flyloop.spec;

import java.util.ArrayList;
import java.util.List;

/**
 * A quantity given as one value or as a range with an optional nominal, in SI units.
 *
 * @param min     lowest value
 * @param nominal nominal value, or NaN when none was given (a single value is its own nominal)
 * @param max     highest value
 */
public record ValueRange(double min, double nominal, double max) {

    public ValueRange {
        if (!(min <= max)) {
            throw new IllegalArgumentException("range minimum " + min + " exceeds maximum " + max);
        }
        if (!Double.isNaN(nominal) && (nominal < min || nominal > max)) {
            throw new IllegalArgumentException("nominal " + nominal + " outside [" + min + ", " + max + "]");
        }
    }

    /** A single value: min = nominal = max. */
    public static ValueRange of(double value) {
        return new ValueRange(value, value, value);
    }

    /** A range without a nominal. */
    public static ValueRange between(double min, double max) {
        return new ValueRange(min, Double.NaN, max);
    }

    public boolean isSingle() {
        return min == max;
    }

    public boolean hasNominal() {
        return !Double.isNaN(nominal);
    }

    /** The nominal if given, otherwise the geometric mean of the ends. */
    public double typical() {
        return hasNominal() ? nominal : Math.sqrt(min * max);
    }

    /** The distinct corner values in ascending order: min, nominal (if given), max. */
    public List<Double> corners() {
        List<Double> out = new ArrayList<>();
        out.add(min);
        if (hasNominal() && nominal != min && nominal != max) {
            out.add(nominal);
        }
        if (max != min) {
            out.add(max);
        }
        return out;
    }

    /** Returns this range with every value multiplied by {@code k} (k &gt; 0). */
    public ValueRange scaled(double k) {
        return new ValueRange(min * k, nominal * k, max * k);
    }
}
