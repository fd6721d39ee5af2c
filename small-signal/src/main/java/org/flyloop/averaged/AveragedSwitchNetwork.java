package org.flyloop.averaged;

import java.util.function.DoubleUnaryOperator;
import org.flyloop.spec.ControlScheme;
import org.flyloop.spec.ControlSpec;
import org.flyloop.spec.StageSpec;
import org.flyloop.stage.ConductionMode;

/**
 * The flyback's switch, transformer and rectifier replaced by averaged dependent sources, referred
 * to the secondary: Ls = Lm/N², Vg′ = Vin/N, Rds′ = Rds/N², the rectifier a constant drop Vf.
 *
 * <p>One set of equations covers CCM and DCM, after the full-order averaged model of J. Sun,
 * D. M. Mitchell, M. F. Greuel, P. T. Krein, R. M. Bass, "Averaged modeling of PWM converters
 * operating in discontinuous conduction mode", IEEE Trans. Power Electronics 16(4), 2001
 * (the d2 constraint, eq. for d2 from the average inductor current, and the correction factor
 * d2/(d + d2) on the rectifier current):
 * <pre>
 *   i_pk,DCM = Vg′·d·Ts / (Ls + Rds′·d·Ts/2)          peak of a cycle starting from zero
 *   d2       = clamp(2·iL/i_pk,DCM − d, 0, 1 − d)      at the upper limit: CCM
 *   i_on     = iL/(d + d2)                            on-interval average current
 *   v_on     = Vg′ − Rds′·i_on
 *   i_rect   = iL·d2/(d + d2)
 *   Ls·diL/dt = d·v_on − d2·(v_o + Vf)
 * </pre>
 * In DCM i_on = i_pk/2 and v_on = Vg′ − Rds′·i_pk/2, so i_pk = v_on·d·Ts/Ls holds exactly with
 * the closed form above (the implicit relation solved once). At the boundary both forms of v_on
 * agree, so every quantity is continuous in iL and d.
 *
 * <p>The duty cycle is the control input clamped to [0, duty_max] in voltage mode; in peak current
 * mode it comes from {@link PeakCurrentDutySolver}. Immutable.
 */
public final class AveragedSwitchNetwork {

    private final double turns;
    private final double ls;
    private final double periodS;
    private final double rdsSecondary;
    private final double rectifierDropV;
    private final ControlSpec control;
    private final PeakCurrentDutySolver peakCurrentSolver;

    public AveragedSwitchNetwork(StageSpec stage, ControlSpec control) {
        this.turns = stage.turns();
        this.ls = stage.secondaryInductance();
        this.periodS = stage.periodS();
        this.rdsSecondary = stage.switchResistance() / (stage.turns() * stage.turns());
        this.rectifierDropV = stage.rectifierDrop();
        this.control = control;
        this.peakCurrentSolver = control.scheme() == ControlScheme.CURRENT
                ? new PeakCurrentDutySolver(this, control, stage.turns(), stage.periodS()) : null;
    }

    public ControlSpec control() {
        return control;
    }

    /** Secondary-referred magnetizing inductance Ls, H. */
    public double secondaryInductance() {
        return ls;
    }

    /** Switching period Ts, s. */
    public double periodS() {
        return periodS;
    }

    /** Turns ratio N = Np/Ns. */
    public double turns() {
        return turns;
    }

    /** Secondary-referred switch resistance Rds′ = Rds/N², Ω. */
    public double secondarySwitchResistance() {
        return rdsSecondary;
    }

    public double rectifierDropV() {
        return rectifierDropV;
    }

    /**
     * The averaged cycle for the given secondary-referred magnetizing current and control input.
     *
     * @param iL          secondary-referred average magnetizing current, A
     * @param controlIn   duty (voltage mode) or comparator voltage, V (current mode)
     * @param vinV        input voltage, V
     * @param voutOfRect  the output network's output voltage as a function of the average
     *                    rectifier current (ESR makes v_o depend on it)
     */
    public SwitchCycle cycle(double iL, double controlIn, double vinV, DoubleUnaryOperator voutOfRect) {
        double d = control.scheme() == ControlScheme.VOLTAGE
                ? clampDuty(controlIn)
                : peakCurrentSolver.duty(iL, controlIn, vinV, voutOfRect);
        return atDuty(d, iL, vinV, voutOfRect);
    }

    /**
     * Secondary-referred commanded peak N·(vc − Se·d·Ts)/Ri of peak current mode, A.
     * Only defined for current-mode control.
     */
    double commandedPeak(double vc, double d) {
        if (peakCurrentSolver == null) {
            throw new IllegalStateException("no commanded peak in voltage mode");
        }
        return peakCurrentSolver.commandedPeak(vc, d);
    }

    double clampDuty(double d) {
        return Math.min(Math.max(d, 0), control.dutyMax());
    }

    /**
     * The averaged cycle at a given duty (see the class comment for the equations). The reported
     * peak current is the averaged peak-current relation of {@link PeakCurrentDutySolver}, so in
     * current mode it equals the commanded peak.
     */
    SwitchCycle atDuty(double d, double iL, double vinV, DoubleUnaryOperator voutOfRect) {
        double vgs = vinV / turns;
        double ipkDcm = d > 0 ? vgs * d * periodS / (ls + rdsSecondary * d * periodS / 2) : 0;
        double d2;
        if (d > 0) {
            d2 = Math.min(Math.max(2 * iL / ipkDcm - d, 0), 1 - d);
        } else {
            // No on-interval: a positive current keeps the rectifier conducting all period.
            d2 = iL > 0 ? 1 : 0;
        }
        double sum = d + d2;
        double ion = sum > 0 ? iL / sum : 0;
        double von = vgs - rdsSecondary * ion;
        double irect = sum > 0 ? iL * d2 / sum : 0;
        double vo = voutOfRect.applyAsDouble(irect);
        double vl = d * von - d2 * (vo + rectifierDropV);
        double margin = 2 * iL - ipkDcm;
        double peak = PeakCurrentDutySolver.averagedPeak(iL, d, von, vo + rectifierDropV, margin, ipkDcm, ls,
                periodS);
        return new SwitchCycle(d, d2, margin >= 0 ? ConductionMode.CCM : ConductionMode.DCM, margin,
                von, ion, peak, irect, vl, vo, d * ion / turns);
    }
}
