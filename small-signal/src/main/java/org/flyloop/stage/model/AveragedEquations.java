package org.flyloop.stage.model;

import org.flyloop.spec.StageSpec;
import org.flyloop.stage.ConductionMode;

/**
 * The flyback's averaged state equations in one conduction mode, written with {@link Dual}
 * numbers so that their exact Jacobian at an operating point is available.
 *
 * <p>Everything is referred to the secondary: Ls = Lm/N², vg = vin/N, Rds′ = Rds/N²; the states are
 * the average magnetizing current {@code i} (secondary-referred) and the output-capacitor voltage
 * {@code vC}; the inputs are the duty cycle {@code d}, the input voltage {@code vin} and a load
 * current {@code iz} drawn from the output in addition to the load resistor R.
 * <pre>
 *   CCM:  v_on = vg − Rds′·i            d2 = 1 − d        i_rect = (1 − d)·i
 *   DCM:  P = vg·d·Ts / (Ls + Rds′·d·Ts/2)   (peak current, secondary-referred)
 *         v_on = vg − Rds′·P/2          d2 = 2·i/P − d    i_rect = i − d·P/2
 *   vo    = R/(R + Rc) · (vC + Rc·(i_rect − iz))
 *   Ls·di/dt  = d·v_on − d2·(vo + Vf)
 *   C·dvC/dt  = i_rect − vo/R − iz
 * </pre>
 * The CCM equations are the averaged flyback model (Erickson &amp; Maksimović, Fundamentals of
 * Power Electronics, 2nd ed., 2001, ch. 7 and ch. 8, buck-boost with the transformer referred). The
 * DCM equations are the full-order model of Sun, Mitchell, Greuel, Krein and Bass, "Averaged
 * modeling of PWM converters operating in discontinuous conduction mode", IEEE Trans. Power
 * Electronics 16(4), 2001: d2 = 2·L·i/(d·Ts·v_on) − d from the triangular waveform, and the
 * rectifier's average current i·d2/(d + d2), which equals i − d·P/2. The switch resistance is taken
 * at the on-interval average current (i in CCM, P/2 in DCM), as in the operating-point solver.
 *
 * <p>Peak-current-mode modulator (comparator threshold vc = Ri·i_pk,primary + Se·d·Ts):
 * <pre>
 *   CCM:  vc = (Ri/N)·(i + m1·d²·Ts/2 + m2·d′²·Ts/2) + Se·d·Ts,  m1 = v_on/Ls, m2 = (vo + Vf)/Ls
 *   DCM:  vc = Ri·P/N + Se·d·Ts                                   (the current starts from zero)
 * </pre>
 * The CCM relation is the period average of a waveform that rises with m1 for d·Ts up to the peak
 * and falls with m2 for d′·Ts (Erickson &amp; Maksimović 2001, §12.3, the "more accurate" averaged
 * current-mode model). It is exact in periodic steady state, so the DC gain built on it equals the
 * exact cycle's steady state.
 */
final class AveragedEquations {

    static final int I = 0;
    static final int VC = 1;
    static final int D = 2;
    static final int VIN = 3;
    static final int IZ = 4;
    static final int N_VARS = 5;

    /** f1 = di/dt, f2 = dvC/dt, vo, modulator threshold; all with gradients over (i, vC, d, vin, iz). */
    record Evaluation(Dual didt, Dual dvcdt, Dual vo, Dual threshold, Dual d2) {
    }

    private final StageSpec stage;
    private final ConductionMode mode;
    private final double loadResistance;
    private final double senseVPerA;
    private final double slopeVPerS;

    AveragedEquations(StageSpec stage, ConductionMode mode, double loadResistance, double senseVPerA,
                      double slopeVPerS) {
        this.stage = stage;
        this.mode = mode;
        this.loadResistance = loadResistance;
        this.senseVPerA = senseVPerA;
        this.slopeVPerS = slopeVPerS;
    }

    Evaluation evaluate(double i, double vC, double d, double vin, double iz) {
        int n = N_VARS;
        Dual di = Dual.variable(i, I, n);
        Dual dvc = Dual.variable(vC, VC, n);
        Dual dd = Dual.variable(d, D, n);
        Dual dvin = Dual.variable(vin, VIN, n);
        Dual diz = Dual.variable(iz, IZ, n);

        double turns = stage.turns();
        double ls = stage.secondaryInductance();
        double ts = stage.periodS();
        double rds = stage.switchResistance() / (turns * turns);
        double rc = stage.esr();
        double r = loadResistance;
        double vf = stage.rectifierDrop();

        Dual vg = dvin.dividedBy(turns);
        Dual von;
        Dual d2;
        Dual irect;
        Dual threshold;
        Dual slopeTerm = dd.times(slopeVPerS * ts);
        if (mode == ConductionMode.DCM) {
            Dual peak = vg.times(dd).times(ts).dividedBy(dd.times(rds * ts / 2).plus(ls));
            von = vg.minus(peak.times(rds / 2));
            d2 = di.times(2).dividedBy(peak).minus(dd);
            irect = di.minus(dd.times(peak).times(0.5));
            threshold = peak.times(senseVPerA / turns).plus(slopeTerm);
        } else {
            von = vg.minus(di.times(rds));
            d2 = dd.times(-1).plus(1);
            irect = d2.times(di);
            threshold = null;
        }
        double alpha = r / (r + rc);
        Dual vo = dvc.plus(irect.minus(diz).times(rc)).times(alpha);
        if (threshold == null) {
            Dual rise = von.times(dd).times(dd).times(ts / (2 * ls));
            Dual fall = vo.plus(vf).times(d2).times(d2).times(ts / (2 * ls));
            threshold = di.plus(rise).plus(fall).times(senseVPerA / turns).plus(slopeTerm);
        }
        Dual didt = dd.times(von).minus(d2.times(vo.plus(vf))).dividedBy(ls);
        Dual dvcdt = irect.minus(vo.dividedBy(r)).minus(diz).dividedBy(stage.cout());
        return new Evaluation(didt, dvcdt, vo, threshold, d2);
    }
}
