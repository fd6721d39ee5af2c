package org.flyloop.design;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.flyloop.linear.TransferFunction;
import org.flyloop.loop.LoopGain;
import org.flyloop.loop.LoopMargins;
import org.flyloop.loop.MarginAnalyzer;
import org.flyloop.network.CompensatorNetwork;
import org.flyloop.network.PartNames;
import org.flyloop.spec.TargetsSpec;

/**
 * A network analysed at every corner against the targets, with the worst figures picked out.
 *
 * @param results one per corner, in corner order
 */
public record LoopEvaluation(List<CornerResult> results) {

    /** Margins are searched from this frequency, Hz. */
    public static final double LOWEST_HZ = 0.1;

    public LoopEvaluation {
        results = List.copyOf(results);
    }

    /**
     * Analyses {@code network} at each corner (with the corner's CTR where it has one) between
     * {@value #LOWEST_HZ} Hz and fsw/2, and checks phase margin, gain margin and stability.
     */
    public static LoopEvaluation of(CompensatorNetwork network, List<Corner> corners, double feedbackGain,
                                    double fswHz, TargetsSpec targets) {
        List<CornerResult> out = new ArrayList<>();
        for (Corner c : corners) {
            CompensatorNetwork n = Double.isNaN(c.ctr()) ? network : network.withParts(Map.of(PartNames.CTR, c.ctr()));
            TransferFunction t = new LoopGain(n.transferFunction(), feedbackGain, c.stage().control()).transferFunction();
            LoopMargins m = MarginAnalyzer.analyze(t, LOWEST_HZ, fswHz / 2);
            out.add(new CornerResult(c, t, m, misses(m, targets)));
        }
        return new LoopEvaluation(out);
    }

    private static List<String> misses(LoopMargins m, TargetsSpec targets) {
        List<String> out = new ArrayList<>();
        if (!m.isStable()) {
            out.add("closed loop " + m.verdict().label() + " (" + m.closedLoopRhpPoles()
                    + " right-half-plane pole(s) by the Nyquist criterion)");
        }
        if (m.hasNoCrossover()) {
            out.add("no gain crossover: |T| stays on one side of 0 dB up to fsw/2");
        } else if (m.phaseMarginDeg() < targets.phaseMarginDeg()) {
            out.add(String.format(Locale.ROOT, "phase margin %.1f° below the %.1f° target", m.phaseMarginDeg(),
                    targets.phaseMarginDeg()));
        }
        if (Math.abs(m.gainMarginDb()) < targets.gainMarginDb()) {
            out.add(String.format(Locale.ROOT, "gain margin %.1f dB inside the ±%.1f dB target", m.gainMarginDb(),
                    targets.gainMarginDb()));
        }
        return out;
    }

    /** True when every corner meets every target. */
    public boolean meetsTargets() {
        return results.stream().allMatch(CornerResult::meetsTargets);
    }

    /** The corner with the smallest phase margin (corners without crossover count as worst). */
    public CornerResult worstPhaseMargin() {
        CornerResult worst = null;
        for (CornerResult r : results) {
            double pm = r.margins().hasNoCrossover() ? Double.NEGATIVE_INFINITY : r.margins().phaseMarginDeg();
            double w = worst == null ? Double.POSITIVE_INFINITY
                    : worst.margins().hasNoCrossover() ? Double.NEGATIVE_INFINITY : worst.margins().phaseMarginDeg();
            if (worst == null || pm < w) {
                worst = r;
            }
        }
        return worst;
    }

    /**
     * The corner a load-step test is run at: among the corners at the largest load, the one with the
     * smallest phase margin (a step up to full load at the line where the loop rings most).
     */
    public CornerResult loadStepCorner() {
        double full = results.stream().mapToDouble(r -> r.corner().point().iout()).max().orElseThrow();
        return new LoopEvaluation(results.stream().filter(r -> r.corner().point().iout() == full).toList())
                .worstPhaseMargin();
    }

    /** The corner whose gain margin has the smallest magnitude. */
    public CornerResult worstGainMargin() {
        CornerResult worst = null;
        for (CornerResult r : results) {
            if (worst == null || Math.abs(r.margins().gainMarginDb()) < Math.abs(worst.margins().gainMarginDb())) {
                worst = r;
            }
        }
        return worst;
    }

    /** Highest crossover over the corners, Hz (NaN when none crosses). */
    public double highestCrossoverHz() {
        double f = Double.NaN;
        for (CornerResult r : results) {
            double c = r.margins().crossoverHz();
            if (!Double.isNaN(c)) {
                f = Double.isNaN(f) ? c : Math.max(f, c);
            }
        }
        return f;
    }

    /** A ranking key: worst phase margin, −∞ when some corner misses stability or crossover. */
    double worstPhaseMarginDeg() {
        CornerResult w = worstPhaseMargin();
        return w.margins().hasNoCrossover() || !w.margins().isStable() ? Double.NEGATIVE_INFINITY
                : w.margins().phaseMarginDeg();
    }
}
