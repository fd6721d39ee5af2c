package org.flyloop.loop;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.apache.commons.math3.optim.univariate.UnivariatePointValuePair;
import org.flyloop.linear.Crossing;
import org.flyloop.linear.Crossings;
import org.flyloop.linear.FrequencyGrid;
import org.flyloop.linear.FrequencyResponse;
import org.flyloop.linear.TransferFunction;

/**
 * Finds every margin of a loop gain T(s) over a frequency band: gain crossovers (|T| = 1) with
 * phase margins, phase crossovers (∠T = −180° + k·360°) with gain margins, the peak of the
 * sensitivity |1/(1 + T)|, and the Nyquist stability verdict.
 *
 * <p>Crossings are bracketed on a logarithmic grid refined around lightly damped poles and zeros
 * and refined by Brent's method ({@link Crossings}); the peak sensitivity is refined with Brent's
 * optimizer in ln f around the largest grid sample.
 */
public final class MarginAnalyzer {

    /** Grid density used for bracketing. */
    public static final int POINTS_PER_DECADE = 100;
    private static final double MARGINAL_RESIDUAL = 0.05;

    private MarginAnalyzer() {
    }

    /**
     * All margins of {@code loop} between {@code lowHz} and {@code highHz}. The Nyquist count always
     * covers the whole frequency axis.
     */
    public static LoopMargins analyze(TransferFunction loop, double lowHz, double highHz) {
        FrequencyGrid grid = FrequencyGrid.refinedFor(lowHz, highHz, POINTS_PER_DECADE, loop);
        FrequencyResponse sampled = FrequencyResponse.of(loop, grid);

        List<GainCrossover> gains = new ArrayList<>();
        for (Crossing c : Crossings.magnitudeCrossings(loop, sampled, 1.0)) {
            double pm = wrapDeg(180 + loop.phaseDeg(c.frequencyHz()));
            gains.add(new GainCrossover(c.frequencyHz(), pm, c.direction() == Crossing.Direction.RISING));
        }
        List<PhaseCrossover> phases = new ArrayList<>();
        for (Crossing c : Crossings.phaseCrossings(loop, sampled, -180)) {
            phases.add(new PhaseCrossover(c.frequencyHz(), -20 * Math.log10(loop.magnitude(c.frequencyHz()))));
        }
        phases.sort((a, b) -> Double.compare(a.frequencyHz(), b.frequencyHz()));

        double[] peak = peakSensitivity(loop, sampled);
        NyquistCriterion.Count count = NyquistCriterion.closedLoopRhpPoles(loop);
        StabilityVerdict verdict;
        if (count.residual() > MARGINAL_RESIDUAL || peak[0] > 1e9) {
            verdict = StabilityVerdict.MARGINAL;
        } else {
            verdict = count.closedLoopRhpPoles() == 0 ? StabilityVerdict.STABLE : StabilityVerdict.UNSTABLE;
        }
        return new LoopMargins(gains, phases, peak[0], peak[1], loop.rightHalfPlanePoleCount(),
                Math.max(count.closedLoopRhpPoles(), 0), verdict);
    }

    /** {max |S|, frequency} with S = 1/(1 + T). */
    private static double[] peakSensitivity(TransferFunction loop, FrequencyResponse sampled) {
        int best = 0;
        double bestValue = -1;
        for (int i = 0; i < sampled.size(); i++) {
            double s = sensitivity(sampled.real(i), sampled.imaginary(i));
            if (s > bestValue) {
                bestValue = s;
                best = i;
            }
        }
        if (sampled.size() < 3) {
            return new double[] {bestValue, sampled.frequencyHz(best)};
        }
        int lo = Math.max(best - 1, 0);
        int hi = Math.min(best + 1, sampled.size() - 1);
        double xLo = Math.log(sampled.frequencyHz(lo));
        double xHi = Math.log(sampled.frequencyHz(hi));
        if (xHi <= xLo) {
            return new double[] {bestValue, sampled.frequencyHz(best)};
        }
        double[] v = new double[2];
        UnivariatePointValuePair p = new BrentOptimizer(1e-12, 1e-14).optimize(new MaxEval(200),
                GoalType.MAXIMIZE, new SearchInterval(xLo, xHi, Math.log(sampled.frequencyHz(best))),
                new UnivariateObjectiveFunction(x -> {
                    loop.evaluateInto(Math.exp(x), v);
                    return sensitivity(v[0], v[1]);
                }));
        if (p.getValue() > bestValue) {
            return new double[] {p.getValue(), Math.exp(p.getPoint())};
        }
        return new double[] {bestValue, sampled.frequencyHz(best)};
    }

    private static double sensitivity(double re, double im) {
        return 1 / Math.hypot(1 + re, im);
    }

    /** Wraps an angle into (−180°, 180°]. */
    static double wrapDeg(double deg) {
        double w = deg - 360 * Math.floor((deg + 180) / 360);
        return w == -180 ? 180 : w;
    }
}
