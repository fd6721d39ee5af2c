package org.flyloop.eseries;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;

/**
 * The IEC 60063 preferred-number series E3 … E192 used for resistor and capacitor values.
 *
 * <p>The mantissa lists are transcribed from the tables of IEC 60063:2015 ("Preferred number
 * series for resistors and capacitors"). They are written out rather than computed because the
 * standard's values are not all the rounded geometric sequence 10^(i/n): E3 to E24 keep the
 * historical values 2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7 and 8.2 (geometric rounding gives 2.6, 2.9,
 * 3.2, 3.5, 3.8, 4.2, 4.6 and 8.3), and E192 lists 9.20 where rounding gives 9.19.
 *
 * <p>Each mantissa is stored as an integer of two (E3–E24) or three (E48–E192) significant digits;
 * a member of the series is {@code mantissa × 10^exponent}. Members are formed by one exact
 * multiplication or division by a power of ten, which makes every member the double nearest to its
 * decimal value (so {@code nearest(4.99e-12)} returns exactly {@code 4.99e-12}). Values from
 * 1e-18 to 1e18 are accepted, enough for picofarads to gigaohms.
 */
public enum ESeries {
    E3(1, 10, 22, 47),
    E6(1, 10, 15, 22, 33, 47, 68),
    E12(1, 10, 12, 15, 18, 22, 27, 33, 39, 47, 56, 68, 82),
    E24(1, 10, 11, 12, 13, 15, 16, 18, 20, 22, 24, 27, 30, 33, 36, 39, 43, 47, 51, 56, 62, 68, 75,
            82, 91),
    E48(2, 100, 105, 110, 115, 121, 127, 133, 140, 147, 154, 162, 169, 178, 187, 196, 205, 215, 226,
            237, 249, 261, 274, 287, 301, 316, 332, 348, 365, 383, 402, 422, 442, 464, 487, 511, 536,
            562, 590, 619, 649, 681, 715, 750, 787, 825, 866, 909, 953),
    E96(2, 100, 102, 105, 107, 110, 113, 115, 118, 121, 124, 127, 130, 133, 137, 140, 143, 147, 150,
            154, 158, 162, 165, 169, 174, 178, 182, 187, 191, 196, 200, 205, 210, 215, 221, 226, 232,
            237, 243, 249, 255, 261, 267, 274, 280, 287, 294, 301, 309, 316, 324, 332, 340, 348, 357,
            365, 374, 383, 392, 402, 412, 422, 432, 442, 453, 464, 475, 487, 499, 511, 523, 536, 549,
            562, 576, 590, 604, 619, 634, 649, 665, 681, 698, 715, 732, 750, 768, 787, 806, 825, 845,
            866, 887, 909, 931, 953, 976),
    E192(2, 100, 101, 102, 104, 105, 106, 107, 109, 110, 111, 113, 114, 115, 117, 118, 120, 121, 123,
            124, 126, 127, 129, 130, 132, 133, 135, 137, 138, 140, 142, 143, 145, 147, 149, 150, 152,
            154, 156, 158, 160, 162, 164, 165, 167, 169, 172, 174, 176, 178, 180, 182, 184, 187, 189,
            191, 193, 196, 198, 200, 203, 205, 208, 210, 213, 215, 218, 221, 223, 226, 229, 232, 234,
            237, 240, 243, 246, 249, 252, 255, 258, 261, 264, 267, 271, 274, 277, 280, 284, 287, 291,
            294, 298, 301, 305, 309, 312, 316, 320, 324, 328, 332, 336, 340, 344, 348, 352, 357, 361,
            365, 370, 374, 379, 383, 388, 392, 397, 402, 407, 412, 417, 422, 427, 432, 437, 442, 448,
            453, 459, 464, 470, 475, 481, 487, 493, 499, 505, 511, 517, 523, 530, 536, 542, 549, 556,
            562, 569, 576, 583, 590, 597, 604, 612, 619, 626, 634, 642, 649, 657, 665, 673, 681, 690,
            698, 706, 715, 723, 732, 741, 750, 759, 768, 777, 787, 796, 806, 816, 825, 835, 845, 856,
            866, 876, 887, 898, 909, 920, 931, 942, 953, 965, 976, 988);

    /** Smallest value accepted by the rounding methods. */
    public static final double MIN_VALUE = 1e-18;
    /** Largest value accepted by the rounding methods. */
    public static final double MAX_VALUE = 1e18;

    // Powers of ten up to 1e22 are exact doubles; beyond that members would lose exactness.
    private static final double[] POW10 = new double[23];

    static {
        double p = 1;
        for (int i = 0; i < POW10.length; i++) {
            POW10[i] = p;
            p *= 10;
        }
    }

    /** Digits after the first one in each stored mantissa: 1 for "47" = 4.7, 2 for "499" = 4.99. */
    private final int fractionDigits;
    private final int[] mantissas;

    ESeries(int fractionDigits, int... mantissas) {
        this.fractionDigits = fractionDigits;
        this.mantissas = mantissas;
    }

    /**
     * Parses a series name such as {@code "E96"} or {@code "e12"} (surrounding blanks ignored).
     *
     * @throws IllegalArgumentException for any other text, naming the accepted names
     */
    public static ESeries parse(String name) {
        if (name != null) {
            String key = name.trim().toUpperCase(Locale.ROOT);
            for (ESeries s : values()) {
                if (s.name().equals(key)) {
                    return s;
                }
            }
        }
        throw new IllegalArgumentException("unknown E-series '" + name
                + "'; use one of E3, E6, E12, E24, E48, E96, E192");
    }

    /** Number of members per decade (3, 6, …, 192). */
    public int membersPerDecade() {
        return mantissas.length;
    }

    /** The members of the decade [1, 10) in ascending order, e.g. 1.0, 2.2, 4.7 for E3. */
    public List<Double> decade() {
        List<Double> out = new ArrayList<>(mantissas.length);
        for (int m : mantissas) {
            out.add(scale(m, -fractionDigits));
        }
        return Collections.unmodifiableList(out);
    }

    /**
     * The member nearest to {@code value} in the logarithmic sense: the one with the smallest
     * |ln(member/value)|, looking across decade boundaries (9.9 k rounds to 10 k in E96). A value
     * exactly at the geometric mean of two neighbours rounds up.
     *
     * @throws IllegalArgumentException when value is not within [{@link #MIN_VALUE}, {@link #MAX_VALUE}]
     */
    public double nearest(double value) {
        long k = indexAtOrBelow(value);
        double lower = member(k);
        if (lower == value) {
            return lower;
        }
        double upper = member(k + 1);
        // Compare value/lower with upper/value without logarithms: value² against lower·upper.
        return value * value < lower * upper ? lower : upper;
    }

    /** The largest member less than or equal to {@code value} (rounding down). */
    public double atOrBelow(double value) {
        return member(indexAtOrBelow(value));
    }

    /** The smallest member greater than or equal to {@code value} (rounding up). */
    public double atOrAbove(double value) {
        long k = indexAtOrBelow(value);
        double lower = member(k);
        return lower == value ? lower : member(k + 1);
    }

    /** The next member strictly below {@code value}. */
    public double below(double value) {
        long k = indexAtOrBelow(value);
        double lower = member(k);
        return lower == value ? member(k - 1) : lower;
    }

    /** The next member strictly above {@code value}. */
    public double above(double value) {
        return member(indexAtOrBelow(value) + 1);
    }

    /** True when {@code value} is exactly a member of this series (as a double). */
    public boolean contains(double value) {
        return member(indexAtOrBelow(value)) == value;
    }

    /**
     * Index k of the largest member ≤ value, where member(k) walks the series across decades:
     * k = 0 is 1.0, k = n is 10, k = −1 is the top of the decade below 1.
     */
    private long indexAtOrBelow(double value) {
        if (!(value >= MIN_VALUE && value <= MAX_VALUE)) {
            throw new IllegalArgumentException("E-series rounding needs a value between "
                    + MIN_VALUE + " and " + MAX_VALUE + ", got " + value);
        }
        int n = mantissas.length;
        // The series is close to geometric, so this estimate is off by at most a step or two.
        long k = (long) Math.floor(n * Math.log10(value));
        while (member(k) > value) {
            k--;
        }
        while (member(k + 1) <= value) {
            k++;
        }
        return k;
    }

    private double member(long k) {
        int n = mantissas.length;
        long decade = Math.floorDiv(k, n);
        int i = Math.floorMod(k, n);
        return scale(mantissas[i], (int) decade - fractionDigits);
    }

    /** m·10^e with a single correctly rounded operation. */
    private static double scale(int m, int e) {
        return e >= 0 ? m * POW10[e] : m / POW10[-e];
    }
}
