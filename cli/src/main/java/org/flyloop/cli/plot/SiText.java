package org.flyloop.cli.plot;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * Numbers as an engineer writes them: significant digits with an SI prefix ("2.13 kHz",
 * "49.9 kΩ", "−120 mV"). A true minus sign is used in display text; CSV and JSON never go
 * through here.
 */
public final class SiText {

    private static final String[] PREFIXES = {"f", "p", "n", "µ", "m", "", "k", "M", "G", "T"};
    private static final int UNIT_INDEX = 5;

    private SiText() {
    }

    /**
     * {@code value} with {@code digits} significant digits and the prefix that puts the mantissa in
     * [1, 1000), then {@code unit}; "–" for NaN, "∞" for an infinity.
     */
    public static String format(double value, String unit, int digits) {
        if (Double.isNaN(value)) {
            return "–";
        }
        if (Double.isInfinite(value)) {
            return (value > 0 ? "∞" : "−∞") + (unit.isEmpty() ? "" : " " + unit);
        }
        int exp = value == 0 ? 0 : (int) Math.floor(Math.log10(Math.abs(value)) / 3);
        exp = Math.max(-UNIT_INDEX, Math.min(PREFIXES.length - 1 - UNIT_INDEX, exp));
        double mantissa = value / Math.pow(1000, exp);
        BigDecimal r = new BigDecimal(mantissa).round(new MathContext(digits, RoundingMode.HALF_EVEN));
        if (r.abs().compareTo(BigDecimal.valueOf(1000)) >= 0 && exp < PREFIXES.length - 1 - UNIT_INDEX) {
            exp++;
            r = new BigDecimal(value / Math.pow(1000, exp)).round(new MathContext(digits, RoundingMode.HALF_EVEN));
        }
        String prefix = PREFIXES[exp + UNIT_INDEX];
        String space = unit.isEmpty() && prefix.isEmpty() ? "" : " ";
        return minus(plain(r)) + space + prefix + unit;
    }

    /** {@code value} with {@code digits} significant digits, no prefix, no exponent. */
    public static String plain(double value, int digits) {
        if (Double.isNaN(value)) {
            return "–";
        }
        if (Double.isInfinite(value)) {
            return value > 0 ? "∞" : "−∞";
        }
        return minus(plain(new BigDecimal(value).round(new MathContext(digits, RoundingMode.HALF_EVEN))));
    }

    /** {@code value} with a fixed number of decimals, true minus sign. */
    public static String fixed(double value, int decimals) {
        if (!Double.isFinite(value)) {
            return plain(value, 3);
        }
        String s = new BigDecimal(value).setScale(decimals, RoundingMode.HALF_EVEN).toPlainString();
        if (s.matches("-0(\\.0*)?")) {
            s = s.substring(1);
        }
        return minus(s);
    }

    private static String plain(BigDecimal r) {
        if (r.signum() == 0) {
            return "0";
        }
        String s = r.stripTrailingZeros().toPlainString();
        return s.equals("-0") ? "0" : s;
    }

    private static String minus(String s) {
        return s.startsWith("-") ? "−" + s.substring(1) : s;
    }
}
