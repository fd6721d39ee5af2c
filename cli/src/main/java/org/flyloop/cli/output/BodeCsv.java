package org.flyloop.cli.output;

import java.util.Arrays;
import java.util.Locale;
import org.flyloop.linear.FrequencyResponse;

/**
 * Frequency responses as CSV: one header row, one row per frequency, magnitude in dB and phase in
 * degrees exactly as {@link FrequencyResponse} gives them (continuous, never wrapped into ±180°).
 */
public final class BodeCsv {

    /** Header of a file holding one model. */
    public static final String SINGLE_HEADER = "freq_hz,mag_db,phase_deg";
    /** Header of a file holding both models and their difference (analytic − averaged). */
    public static final String COMPARED_HEADER = "freq_hz,analytic_mag_db,analytic_phase_deg,averaged_mag_db,"
            + "averaged_phase_deg,diff_mag_db,diff_phase_deg";

    private BodeCsv() {
    }

    /** One response: {@value #SINGLE_HEADER}. */
    public static String single(FrequencyResponse response) {
        StringBuilder sb = new StringBuilder(SINGLE_HEADER).append('\n');
        for (int i = 0; i < response.size(); i++) {
            row(sb, response.frequencyHz(i), response.magnitudeDb(i), response.phaseDeg(i));
        }
        return sb.toString();
    }

    /**
     * Both models on the same frequencies, then analytic minus averaged, so that any disagreement
     * is a column to read rather than a subtraction to do.
     *
     * @throws IllegalArgumentException when the two responses are not on the same frequencies
     */
    public static String compared(FrequencyResponse analytic, FrequencyResponse averaged) {
        if (!Arrays.equals(analytic.frequenciesHz(), averaged.frequenciesHz())) {
            throw new IllegalArgumentException("the two responses must share their frequencies");
        }
        StringBuilder sb = new StringBuilder(COMPARED_HEADER).append('\n');
        for (int i = 0; i < analytic.size(); i++) {
            row(sb, analytic.frequencyHz(i), analytic.magnitudeDb(i), analytic.phaseDeg(i), averaged.magnitudeDb(i),
                    averaged.phaseDeg(i), analytic.magnitudeDb(i) - averaged.magnitudeDb(i),
                    analytic.phaseDeg(i) - averaged.phaseDeg(i));
        }
        return sb.toString();
    }

    private static void row(StringBuilder sb, double... values) {
        for (int k = 0; k < values.length; k++) {
            if (k > 0) {
                sb.append(',');
            }
            sb.append(number(values[k]));
        }
        sb.append('\n');
    }

    /** Ten significant digits, trailing zeros dropped; NaN (a sample on a singularity) stays NaN. */
    static String number(double v) {
        if (!Double.isFinite(v)) {
            return Double.isNaN(v) ? "NaN" : (v > 0 ? "Infinity" : "-Infinity");
        }
        String s = String.format(Locale.ROOT, "%.10g", v);
        int e = s.indexOf('e');
        String mantissa = e < 0 ? s : s.substring(0, e);
        String exponent = e < 0 ? "" : s.substring(e);
        if (mantissa.contains(".")) {
            mantissa = mantissa.replaceFirst("0+$", "").replaceFirst("\\.$", "");
        }
        return mantissa + exponent;
    }
}
