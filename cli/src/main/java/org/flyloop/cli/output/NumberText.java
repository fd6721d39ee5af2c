package org.flyloop.cli.output;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/** Number formatting for human-readable tables: plain decimals, no exponent. */
public final class NumberText {

    private NumberText() {
    }

    /**
     * {@code value} rounded to {@code digits} significant digits and written without an exponent
     * or trailing zeros after the point; {@code -} for a missing (NaN) value, {@code inf} for an
     * infinite one.
     */
    public static String significant(double value, int digits) {
        if (Double.isNaN(value)) {
            return "-";
        }
        if (Double.isInfinite(value)) {
            return value > 0 ? "inf" : "-inf";
        }
        if (value == 0) {
            return "0";
        }
        BigDecimal rounded = new BigDecimal(value).round(new MathContext(digits, RoundingMode.HALF_EVEN));
        String text = rounded.stripTrailingZeros().toPlainString();
        return text.equals("-0") ? "0" : text;
    }
}
