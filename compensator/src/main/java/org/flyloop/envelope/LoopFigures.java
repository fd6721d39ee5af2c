package org.flyloop.envelope;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.flyloop.spec.TargetsSpec;

/**
 * The three figures an envelope analysis tracks for one loop, defined as in
 * {@link org.flyloop.loop.LoopMargins}.
 *
 * @param crossoverHz    the highest gain crossover, Hz; NaN when |T| never crosses 1
 * @param phaseMarginDeg the smallest phase margin over all gain crossovers, degrees; NaN with none
 * @param gainMarginDb   the gain margin of smallest magnitude, sign kept, dB; +∞ with no phase
 *                       crossover
 */
public record LoopFigures(double crossoverHz, double phaseMarginDeg, double gainMarginDb) {

    /** True when the loop crosses unity gain at least once. */
    public boolean hasCrossover() {
        return !Double.isNaN(crossoverHz);
    }

    /**
     * The phase margin for ranking: −∞ without a crossover, so that a loop that never crosses
     * counts as worse than any that does.
     */
    public double rankedPhaseMarginDeg() {
        return hasCrossover() ? phaseMarginDeg : Double.NEGATIVE_INFINITY;
    }

    /** |gain margin|, dB: the quantity the gain-margin target applies to. */
    public double gainMarginMagnitudeDb() {
        return Math.abs(gainMarginDb);
    }

    /** True when a crossover exists, PM ≥ the target and |GM| ≥ the target. */
    public boolean meets(TargetsSpec targets) {
        return hasCrossover() && phaseMarginDeg >= targets.phaseMarginDeg()
                && gainMarginMagnitudeDb() >= targets.gainMarginDb();
    }

    /** The targets missed, one line each, worded like the designer's corner checks. */
    public List<String> misses(TargetsSpec targets) {
        List<String> out = new ArrayList<>();
        if (!hasCrossover()) {
            out.add("no gain crossover: |T| stays on one side of 0 dB up to fsw/2");
        } else if (phaseMarginDeg < targets.phaseMarginDeg()) {
            out.add(String.format(Locale.ROOT, "phase margin %.1f° below the %.1f° target", phaseMarginDeg,
                    targets.phaseMarginDeg()));
        }
        if (gainMarginMagnitudeDb() < targets.gainMarginDb()) {
            out.add(String.format(Locale.ROOT, "gain margin %.1f dB inside the ±%.1f dB target", gainMarginDb,
                    targets.gainMarginDb()));
        }
        return out;
    }
}
