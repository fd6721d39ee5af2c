package org.flyloop.loop;

import java.util.List;

/**
 * Every margin of one loop gain: all gain crossovers with their phase margins, all phase crossovers
 * with their gain margins, and the summary figures a reviewer reads first.
 *
 * @param gainCrossovers      every |T| = 1 crossing, ascending in frequency
 * @param phaseCrossovers     every −180° (mod 360°) crossing, ascending in frequency
 * @param peakSensitivity     max over frequency of |1/(1 + T)|
 * @param peakSensitivityHz   where that maximum occurs, Hz
 * @param openLoopRhpPoles    right-half-plane poles of T (the P of the Nyquist criterion)
 * @param closedLoopRhpPoles  right-half-plane poles of T/(1 + T) counted by the Nyquist criterion
 * @param verdict             stability verdict from that count
 */
public record LoopMargins(List<GainCrossover> gainCrossovers, List<PhaseCrossover> phaseCrossovers,
                          double peakSensitivity, double peakSensitivityHz, int openLoopRhpPoles,
                          int closedLoopRhpPoles, StabilityVerdict verdict) {

    public LoopMargins {
        gainCrossovers = List.copyOf(gainCrossovers);
        phaseCrossovers = List.copyOf(phaseCrossovers);
    }

    /** True when the loop gain never crosses unity in the analysed band. */
    public boolean hasNoCrossover() {
        return gainCrossovers.isEmpty();
    }

    /** The smallest phase margin over all gain crossovers, degrees; NaN with no crossover. */
    public double phaseMarginDeg() {
        return worstPhase() == null ? Double.NaN : worstPhase().phaseMarginDeg();
    }

    /** The gain crossover with the smallest phase margin, or null. */
    public GainCrossover worstPhase() {
        GainCrossover worst = null;
        for (GainCrossover g : gainCrossovers) {
            if (worst == null || g.phaseMarginDeg() < worst.phaseMarginDeg()) {
                worst = g;
            }
        }
        return worst;
    }

    /**
     * The crossover frequency reported as "the" crossover: the highest gain crossover (the loop's
     * bandwidth), NaN with none.
     */
    public double crossoverHz() {
        return gainCrossovers.isEmpty() ? Double.NaN : gainCrossovers.get(gainCrossovers.size() - 1).frequencyHz();
    }

    /**
     * The gain margin with the smallest magnitude over all phase crossovers, dB, sign kept
     * (negative: the gain may only fall by that much); +∞ with no phase crossover.
     */
    public double gainMarginDb() {
        PhaseCrossover w = worstGain();
        return w == null ? Double.POSITIVE_INFINITY : w.gainMarginDb();
    }

    /** The phase crossover whose gain margin has the smallest magnitude, or null. */
    public PhaseCrossover worstGain() {
        PhaseCrossover worst = null;
        for (PhaseCrossover p : phaseCrossovers) {
            if (worst == null || Math.abs(p.gainMarginDb()) < Math.abs(worst.gainMarginDb())) {
                worst = p;
            }
        }
        return worst;
    }

    /** min over gain crossovers of PM/ω, seconds; NaN with no crossover. */
    public double delayMarginS() {
        double m = Double.NaN;
        for (GainCrossover g : gainCrossovers) {
            double d = g.delayMarginS();
            m = Double.isNaN(m) ? d : Math.min(m, d);
        }
        return m;
    }

    /** 1/|S|max: the smallest distance from the locus to −1 (modulus margin). */
    public double modulusMargin() {
        return 1 / peakSensitivity;
    }

    /** True for a closed loop with no right-half-plane pole. */
    public boolean isStable() {
        return verdict == StabilityVerdict.STABLE;
    }
}
