package org.flyloop.cli.command;

import org.flyloop.cli.spec.InputException;
import org.flyloop.units.QuantityFormatException;
import org.flyloop.units.QuantityParser;
import org.flyloop.units.Unit;
import picocli.CommandLine.Option;

/**
 * The frequency range of the small-signal outputs ({@code --freq LO..HI}), shared by
 * {@code --bode} and the AC sweep of {@code --netlist}.
 */
public final class StageSweepOptions {

    /** Lowest frequency of the default range, Hz. */
    public static final double DEFAULT_LOW_HZ = 10;
    /**
     * Points per decade of every sweep: at least the 50 the issue contract asks for, so a resonance
     * of Q up to about 5 is sampled every 5 % of its bandwidth even before the grid is refined.
     */
    public static final int POINTS_PER_DECADE = 50;

    private static final String ACCEPTED = "write LO..HI in hertz with LO < HI, e.g. 10..32.5k or 10Hz..100kHz";

    @Option(names = "--freq", paramLabel = "LO..HI",
            description = "Frequency range of --bode and --netlist, e.g. 10..30k (default 10 Hz to fsw/2).")
    private String freqText;

    /** True when {@code --freq} was given. */
    public boolean given() {
        return freqText != null;
    }

    /**
     * The range to sweep: {@code --freq} when given, otherwise 10 Hz to fsw/2 (the Nyquist limit of
     * a sampled modulator, above which no averaged model applies).
     *
     * @throws InputException for a malformed or empty range, naming {@code --freq}
     */
    public FrequencyRange range(double fswHz) {
        return freqText == null ? new FrequencyRange(DEFAULT_LOW_HZ, fswHz / 2) : given(freqText);
    }

    /** Parses and checks {@code --freq} without needing the spec, so bad input fails early. */
    public void check() {
        if (freqText != null) {
            given(freqText);
        }
    }

    private static FrequencyRange given(String freqText) {
        String[] ends = freqText.split("\\.\\.", -1);
        if (ends.length != 2) {
            throw new InputException("--freq", "'" + freqText.strip() + "' is not a range", ACCEPTED);
        }
        double low = hertz(ends[0]);
        double high = hertz(ends[1]);
        if (!(low > 0) || !(high > low)) {
            throw new InputException("--freq", "need 0 < LO < HI, got " + freqText.strip(), ACCEPTED);
        }
        return new FrequencyRange(low, high);
    }

    private static double hertz(String text) {
        try {
            return QuantityParser.parse(text, Unit.HERTZ);
        } catch (QuantityFormatException e) {
            throw new InputException("--freq", e.problem(), e.accepted());
        }
    }

    /**
     * A frequency range.
     *
     * @param lowHz  lowest frequency, Hz
     * @param highHz highest frequency, Hz
     */
    public record FrequencyRange(double lowHz, double highHz) {
    }
}
