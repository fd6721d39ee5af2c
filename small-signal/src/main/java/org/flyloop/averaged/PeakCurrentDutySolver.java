package org.flyloop.averaged;

import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.flyloop.spec.ControlSpec;

/**
 * Finds the duty cycle of peak-current-mode control from the averaged peak-current relation.
 *
 * <p>The comparator ends the on-interval when the sensed primary current reaches
 * {@code i_pk,pri = (vc − Se·d·Ts)/Ri} (Ri = control.sense V/A, Se = control.slope V/s); referred
 * to the secondary the commanded peak is {@code N·i_pk,pri}. The peak of the averaged waveform is
 * <pre>
 *   DCM:  i_pk = i_pk,DCM = v_on·d·Ts/Ls                      (each cycle starts from zero)
 *   CCM:  i_pk = iL + m1·d·Ts/2 + λ·(m2·d′ − m1·d)·d′·Ts/2,  m1 = v_on/Ls, m2 = (v_o + Vf)/Ls, d′ = 1 − d
 * </pre>
 * With λ = 1 the CCM line is the "more accurate" averaged current-mode relation of
 * R. W. Erickson, D. Maksimović, Fundamentals of Power Electronics, 2nd ed., 2001, §12.3:
 * ⟨iL⟩ = i_c − m_a·d·Ts − m1·d²·Ts/2 − m2·d′²·Ts/2. In DCM the peak relation alone sets d.
 *
 * <p>At the boundary iL = i_pk,DCM/2, so the CCM line without its last term equals the DCM peak.
 * The last term vanishes at equilibrium (volt-second balance m1·d = m2·d′) but not off it, and
 * would make d jump at the boundary. λ therefore rises from 0 to 1 with a C¹ smoothstep over the
 * first 1 % of CCM depth q = 2·iL/i_pk,DCM − 1 (valley current up to 0.5 % of the ripple, the load
 * band that {@code ConductionMode.BOUNDARY} already marks as "both models apply"). This blend is
 * our construction, no source; equilibria are unaffected because the term is zero there.
 *
 * <p>Solving f(d) = i_pk(d) − N·(vc − Se·d·Ts)/Ri = 0 in [0, duty_max]: f is convex in CCM (the
 * E&amp;M quadratic) and increasing in DCM, and for a fixed iL small duties are CCM and large ones
 * DCM. The physical duty is the largest root, the one with df/dd &gt; 0 (at equilibrium
 * df/dd = ma·Ts: the E&amp;M gain Fm = 1/(Ma·Ts)). Each evaluation tries, in order:
 * <ol>
 *   <li>the closed-form DCM duty (see {@link #dcmDuty}), kept when the cycle there is DCM;</li>
 *   <li>Brent's method on [vertex of the CCM quadratic, duty_max] when f &lt; 0 at the vertex;</li>
 *   <li>a 32-point scan of f from duty_max downward, then Brent on the first sign change.</li>
 * </ol>
 * If f(duty_max) ≤ 0 the controller sits at its duty limit. If f never falls below zero (the
 * magnetizing current already exceeds any commanded average, only seen far from equilibrium) the
 * duty is the minimiser of f, where the two roots merge, which keeps d continuous. With Se = 0 the
 * CCM roots merge at equilibrium (Fm unbounded): the model still runs, but its CCM linearization is
 * singular.
 */
final class PeakCurrentDutySolver {

    /** CCM depth over which the off-equilibrium term is blended in (see class comment). */
    static final double BLEND_DEPTH = 0.01;
    private static final int GRID = 32;

    private final AveragedSwitchNetwork network;
    private final double turnsOverSense;
    private final double slopeVPerS;
    private final double periodS;
    private final double dutyMax;

    PeakCurrentDutySolver(AveragedSwitchNetwork network, ControlSpec control, double turns, double periodS) {
        this.network = network;
        this.turnsOverSense = turns / control.senseVPerA();
        this.slopeVPerS = control.slopeVPerS();
        this.periodS = periodS;
        this.dutyMax = control.dutyMax();
    }

    /**
     * Secondary-referred peak of the averaged waveform (class comment): in DCM the exact peak of a
     * cycle that starts from zero, i_pk,DCM (this also covers the rectifier-idle corner d2 = 0);
     * in CCM the blended E&amp;M relation. The two meet at the boundary, where iL = i_pk,DCM/2.
     *
     * @param secondaryVoltageV v_o + Vf, the winding voltage during demagnetization
     * @param ccmMarginA        2·iL − i_pk,DCM
     */
    static double averagedPeak(double iL, double d, double von, double secondaryVoltageV, double ccmMarginA,
                               double ipkDcm, double ls, double ts) {
        if (ccmMarginA < 0) {
            return ipkDcm;
        }
        double base = iL + von * d * ts / (2 * ls);
        double dp = 1 - d;
        double offEquilibrium = (secondaryVoltageV * dp - von * d) * dp * ts / (2 * ls);
        double q = ipkDcm > 0 ? ccmMarginA / ipkDcm : Double.POSITIVE_INFINITY;
        return base + blend(q) * offEquilibrium;
    }

    /** C¹ smoothstep from 0 at q = 0 to 1 at q = {@link #BLEND_DEPTH}. */
    static double blend(double q) {
        if (q <= 0) {
            return 0;
        }
        if (q >= BLEND_DEPTH) {
            return 1;
        }
        double t = q / BLEND_DEPTH;
        return t * t * (3 - 2 * t);
    }

    /** Commanded secondary-referred peak N·(vc − Se·d·Ts)/Ri. */
    double commandedPeak(double vc, double d) {
        return turnsOverSense * (vc - slopeVPerS * d * periodS);
    }

    /**
     * DCM duty from Vg′·d·Ts/(Ls + Rds′·d·Ts/2) = k·(vc − Se·d·Ts), k = N/Ri: the positive root of
     * a·d² + b·d + c = 0 with a = k·Se·Ts²·Rds′/2, b = Vg′·Ts − k·vc·Rds′·Ts/2 + k·Se·Ts·Ls,
     * c = −k·vc·Ls, in the cancellation-free form 2·(−c)/(b + √(b² − 4ac)). NaN when vc ≤ 0.
     */
    double dcmDuty(double vc, double vinV) {
        if (!(vc > 0)) {
            return Double.NaN;
        }
        double ls = network.secondaryInductance();
        double rds = network.secondarySwitchResistance();
        double k = turnsOverSense;
        double a = k * slopeVPerS * periodS * periodS * rds / 2;
        double b = vinV / network.turns() * periodS - k * vc * rds * periodS / 2 + k * slopeVPerS * periodS * ls;
        double c = -k * vc * ls;
        double disc = b * b - 4 * a * c;
        double den = b + Math.sqrt(disc);
        return den > 0 ? -2 * c / den : Double.NaN;
    }

    /** The duty cycle for comparator voltage {@code vc} (class comment). */
    double duty(double iL, double vc, double vinV, DoubleUnaryOperator voutOfRect) {
        UnivariateFunction f = d -> network.atDuty(d, iL, vinV, voutOfRect).peakCurrentA() - commandedPeak(vc, d);
        double fHigh = f.value(dutyMax);
        if (Double.isNaN(fHigh)) {
            return Double.NaN;
        }
        if (fHigh <= 0) {
            return dutyMax;
        }
        // Fast path in DCM: there the relation is i_pk,DCM(d) = commanded(d),
        // a quadratic in d; f increases through DCM, so a DCM root is the largest one.
        double dDcm = dcmDuty(vc, vinV);
        if (dDcm > 0 && dDcm <= dutyMax) {
            SwitchCycle c = network.atDuty(dDcm, iL, vinV, voutOfRect);
            if (c.ccmMarginA() < 0) {
                return dDcm;
            }
        }
        // Fast path: in CCM f is the E&M quadratic, smallest at d = (m2 − ma)/(m1 + m2); a negative
        // value there brackets the largest root with duty_max.
        double ls = network.secondaryInductance();
        double m1 = (vinV / network.turns() - network.secondarySwitchResistance() * iL) / ls;
        double m2 = (voutOfRect.applyAsDouble(0) + network.rectifierDropV()) / ls;
        double ma = turnsOverSense * slopeVPerS;
        double dVertex = (m2 - ma) / (m1 + m2);
        if (dVertex > 0 && dVertex < dutyMax && f.value(dVertex) < 0) {
            return new BrentSolver(1e-15, 1e-15, 1e-18).solve(200, f, dVertex, dutyMax);
        }
        double hi = dutyMax;
        for (int k = GRID - 1; k >= 0; k--) {
            double lo = dutyMax * k / GRID;
            double fLo = f.value(lo);
            if (fLo == 0) {
                return lo;
            }
            if (fLo < 0) {
                BrentSolver solver = new BrentSolver(1e-15, 1e-15, 1e-18);
                return solver.solve(200, f, lo, hi);
            }
            hi = lo;
        }
        BrentOptimizer opt = new BrentOptimizer(1e-12, 1e-15);
        return opt.optimize(new MaxEval(200), new UnivariateObjectiveFunction(f), GoalType.MINIMIZE,
                new SearchInterval(0, dutyMax)).getPoint();
    }
}
