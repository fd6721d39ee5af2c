package org.flyloop.stage.model;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.flyloop.linear.Root;
import org.flyloop.linear.TransferFunction;
import org.flyloop.spec.ControlScheme;
import org.flyloop.spec.ControlSpec;
import org.flyloop.spec.StageSpec;
import org.flyloop.stage.ConductionMode;
import org.flyloop.stage.OperatingPoint;

/**
 * Analytic small-signal models of the flyback stage, per conduction mode and control scheme.
 *
 * <p>All four come from one closed-form linearization of the averaged equations
 * ({@link AveragedEquations}): the exact Jacobian at the operating point gives a two-state model
 * whose transfer functions are factored in closed form ({@link TwoStateModel}).
 * <ul>
 *   <li><b>Voltage mode, CCM</b>: with ideal parts this is exactly the canonical model of the
 *       buck-boost with the transformer referred (Erickson &amp; Maksimović, Fundamentals of Power
 *       Electronics, 2nd ed., 2001, table 8.2): Gvd(0) = Vg′/D′², ω0 = D′/√(Ls·C),
 *       Q = D′·R·√(C/Ls), RHP zero D′²·R/(D·Ls), ESR zero 1/(Rc·C). ESR, switch resistance and
 *       rectifier drop then shift and damp these exactly as the averaged equations say.</li>
 *   <li><b>Voltage mode, DCM</b>: the full-order model of Sun, Mitchell, Greuel, Krein and Bass
 *       (IEEE Trans. Power Electronics, 2001). Its low-frequency part is the reduced-order result
 *       Gvd(0) = V/D, ωp = 2/(R·C) (Erickson &amp; Maksimović, ch. 11); its second pole sits near
 *       2·fsw/D2 and its RHP zero near 2·fsw/D (rad/s).</li>
 *   <li><b>Peak current mode, CCM</b>: the duty cycle is eliminated through the linearized
 *       averaged peak-current relation with the compensation ramp and the ripple terms kept
 *       (Erickson &amp; Maksimović 2001, §12.3; DC gain and output pole then equal the exact
 *       periodic steady state); the averaged model's fast
 *       current-loop pole is replaced by Ridley's sampling double pole at ωn = π·fsw with
 *       Qp = 1/(π·(mc·D′ − 0.5)), mc = 1 + Se/Sn (R. B. Ridley, "A new, continuous-time model for
 *       current-mode control", IEEE Trans. Power Electronics 6(2), 1991), which describes the same
 *       current loop including its sampling.</li>
 *   <li><b>Peak current mode, DCM</b>: the duty cycle follows from i_pk = (vc − Se·d·Ts)/Ri; the
 *       low-frequency result is the output pole 2/(R·C) and the DC gain of the power balance
 *       ½·Lm·Ipk²·fsw = V²/R with the ramp correction Ipk = Vc/(Ri·mc).</li>
 * </ul>
 */
public final class AnalyticStageModel {

    private static final int IN_CONTROL = 0;
    private static final int IN_VIN = 1;
    private static final int IN_LOAD = 2;

    private AnalyticStageModel() {
    }

    /**
     * Builds every small-signal transfer function of the stage at {@code point}. Boundary points
     * use the CCM models.
     */
    public static StageTransferFunctions at(StageSpec stage, ControlSpec control, OperatingPoint point) {
        ConductionMode mode = point.isContinuous() ? ConductionMode.CCM : ConductionMode.DCM;
        double r = point.loadResistance();
        boolean current = control.scheme() == ControlScheme.CURRENT;
        double slope = current ? control.slopeVPerS() : 0;
        if (current && mode == ConductionMode.CCM) {
            // With no ramp the averaged relation's duty gain is unbounded (an infinitely fast
            // current loop); a vanishing ramp keeps the algebra finite and only moves that pole,
            // which Ridley's sampling pair replaces anyway.
            double snPrimary = control.senseVPerA() * point.vin() / stage.lm();
            slope = Math.max(slope, 1e-6 * snPrimary);
        }
        AveragedEquations eq = new AveragedEquations(stage, mode, r,
                current ? control.senseVPerA() : 0, slope);
        double iSec = point.imAvg() * stage.turns();
        AveragedEquations.Evaluation e = eq.evaluate(iSec, point.vout(), point.duty(), point.vin(), 0);

        double[][] a = {
            {e.didt().g[AveragedEquations.I], e.didt().g[AveragedEquations.VC]},
            {e.dvcdt().g[AveragedEquations.I], e.dvcdt().g[AveragedEquations.VC]}};
        double[] c = {e.vo().g[AveragedEquations.I], e.vo().g[AveragedEquations.VC]};
        int[] inputs = {AveragedEquations.D, AveragedEquations.VIN, AveragedEquations.IZ};
        double[][] b = new double[3][];
        double[] d = new double[3];
        for (int k = 0; k < 3; k++) {
            b[k] = new double[] {e.didt().g[inputs[k]], e.dvcdt().g[inputs[k]]};
            d[k] = e.vo().g[inputs[k]];
        }
        TwoStateModel dutyModel = new TwoStateModel(a, b, c, d);
        TransferFunction gvd = dutyModel.transfer(IN_CONTROL);

        List<String> warnings = new ArrayList<>();
        double qp = Double.NaN;
        double slopeForUnityQp = Double.NaN;
        TransferFunction gvc;
        TransferFunction gvcAveraged;
        TransferFunction gvg;
        TransferFunction zout;
        if (!current) {
            gvc = gvd.times(1 / control.rampV());
            gvcAveraged = gvc;
            gvg = dutyModel.transfer(IN_VIN);
            zout = dutyModel.transfer(IN_LOAD).times(-1);
        } else {
            TwoStateModel cm = eliminateDuty(a, b, c, d, e.threshold().g);
            gvc = cm.transfer(IN_CONTROL);
            gvcAveraged = gvc;
            gvg = cm.transfer(IN_VIN);
            zout = cm.transfer(IN_LOAD).times(-1);
            if (mode == ConductionMode.CCM) {
                double vonSec = point.vin() / stage.turns()
                        - stage.switchResistance() / (stage.turns() * stage.turns()) * iSec;
                double sn = control.senseVPerA() * vonSec * stage.turns() / stage.lm();
                double mc = 1 + control.slopeVPerS() / sn;
                double dPrime = 1 - point.duty();
                qp = 1 / (Math.PI * (mc * dPrime - 0.5));
                double mcUnity = (0.5 + 1 / Math.PI) / dPrime;
                slopeForUnityQp = Math.max(0, (mcUnity - 1) * sn);
                // The sampled current loop shapes every response with the voltage loop open, not
                // only the control-to-output one.
                gvc = withSamplingPoles(gvc, stage.fswHz(), qp);
                gvg = withSamplingPoles(gvg, stage.fswHz(), qp);
                zout = withSamplingPoles(zout, stage.fswHz(), qp);
                if (mc * dPrime <= 0.5) {
                    warnings.add(String.format(
                            "subharmonic oscillation: mc·D' = %.3f ≤ 0.5 at D = %.3f; add slope of at least %.4g V/s",
                            mc * dPrime, point.duty(), slopeForUnityQp));
                } else if (qp > 2) {
                    warnings.add(String.format(
                            "subharmonic risk: Qp = %.2f > 2 at D = %.3f; a slope of %.4g V/s gives Qp = 1",
                            qp, point.duty(), slopeForUnityQp));
                }
            }
        }
        List<PoleZero> features = label(gvc, mode, current);
        double rhpz = Double.NaN;
        if (mode == ConductionMode.CCM) {
            for (Root z : gvc.zeros()) {
                if (z.isRightHalfPlane() && !z.isPair()) {
                    rhpz = z.frequencyHz();
                }
            }
        }
        return new StageTransferFunctions(point, gvc, gvcAveraged, gvd, gvg, zout, features, rhpz, qp,
                slopeForUnityQp, warnings);
    }

    /**
     * Substitutes the linearized modulator d̂ = (v̂c − M_x·x̂ − M_u·û)/M_d into the duty-driven
     * model, giving a model driven by the comparator threshold (input 0), vin and the load current.
     */
    private static TwoStateModel eliminateDuty(double[][] a, double[][] b, double[] c, double[] d,
                                               double[] m) {
        double md = m[AveragedEquations.D];
        double[] mx = {m[AveragedEquations.I], m[AveragedEquations.VC]};
        double[] bd = b[IN_CONTROL];
        double[][] a2 = new double[2][2];
        for (int i = 0; i < 2; i++) {
            for (int j = 0; j < 2; j++) {
                a2[i][j] = a[i][j] - bd[i] * mx[j] / md;
            }
        }
        double[] c2 = {c[0] - d[IN_CONTROL] * mx[0] / md, c[1] - d[IN_CONTROL] * mx[1] / md};
        double[] mu = {0, m[AveragedEquations.VIN], m[AveragedEquations.IZ]};
        double[][] b2 = new double[3][];
        double[] d2 = new double[3];
        b2[IN_CONTROL] = new double[] {bd[0] / md, bd[1] / md};
        d2[IN_CONTROL] = d[IN_CONTROL] / md;
        for (int k = 1; k < 3; k++) {
            b2[k] = new double[] {b[k][0] - bd[0] * mu[k] / md, b[k][1] - bd[1] * mu[k] / md};
            d2[k] = d[k] - d[IN_CONTROL] * mu[k] / md;
        }
        return new TwoStateModel(a2, b2, c2, d2);
    }

    /**
     * Replaces the fastest real pole (the averaged model's current-loop pole) by Ridley's sampling
     * pair 1/(1 + s/(ωn·Qp) + s²/ωn²), ωn = π·fsw. With |Qp| ≤ 0.5 the pair is two real poles.
     */
    static TransferFunction withSamplingPoles(TransferFunction gvc, double fswHz, double qp) {
        List<Root> poles = new ArrayList<>(gvc.poles());
        Root fastest = null;
        for (Root p : poles) {
            if (!p.isPair() && (fastest == null || p.omega0() > fastest.omega0())) {
                fastest = p;
            }
        }
        if (fastest != null && poles.size() > 1) {
            poles.remove(fastest);
        }
        double wn = Math.PI * fswHz;
        if (Double.isInfinite(qp) || Math.abs(qp) > 0.5) {
            poles.add(Root.pair(wn, qp));
        } else {
            double h = 1 / (2 * qp);
            double s = Math.sqrt(h * h - 1);
            poles.add(Root.real(wn * (-h + s)));
            poles.add(Root.real(wn * (-h - s)));
        }
        return TransferFunction.of(gvc.gain(), gvc.integrators(), gvc.zeros(), poles);
    }

    private static List<PoleZero> label(TransferFunction tf, ConductionMode mode, boolean current) {
        List<PoleZero> out = new ArrayList<>();
        List<Root> poles = new ArrayList<>(tf.poles());
        poles.sort(Comparator.comparingDouble(Root::omega0));
        int realIndex = 0;
        for (Root p : poles) {
            String label;
            if (p.isPair()) {
                label = current ? "sampling double pole (Ridley)" : "double pole (Lm with Cout)";
            } else if (realIndex++ == 0) {
                label = mode == ConductionMode.DCM || current ? "output pole" : "low-frequency pole";
            } else {
                label = mode == ConductionMode.DCM ? "DCM high-frequency pole" : "high-frequency pole";
            }
            out.add(PoleZero.of(PoleZero.Kind.POLE, p, label));
        }
        for (Root z : tf.zeros()) {
            String label;
            if (z.isRightHalfPlane()) {
                label = mode == ConductionMode.DCM ? "DCM RHP zero" : "RHP zero";
            } else {
                label = "ESR zero";
            }
            out.add(PoleZero.of(PoleZero.Kind.ZERO, z, label));
        }
        return out;
    }
}
