package org.flyloop.stage.model;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.flyloop.spec.StageSpec;
import org.flyloop.spec.ValueRange;
import org.flyloop.stage.ConductionMode;
import org.flyloop.stage.OperatingPoint;

/**
 * Stages and operating points for the model tests, solved here from the averaged DC equations so
 * that the model tests do not depend on the operating-point solver. Invented demo values.
 */
final class StageCases {
    private StageCases() {
    }

    static StageSpec stage(double vin, double vout, double iout, double fsw, double lm, double n,
                           double c, double esr, double vf, double rds) {
        return new StageSpec(ValueRange.of(vin), vout, ValueRange.of(iout), fsw, lm, n, c, esr, vf, rds);
    }

    /**
     * CCM point: D·(Vg′ − Rds′·i) = (1 − D)·(V + Vf), i = Iout/(1 − D), secondary-referred.
     */
    static OperatingPoint ccm(StageSpec s, double vin, double iout) {
        double n = s.turns();
        double vg = vin / n;
        double rds = s.switchResistance() / (n * n);
        double v = s.vout();
        double d = new BrentSolver(1e-15).solve(200, x -> x * (vg - rds * iout / (1 - x))
                - (1 - x) * (v + s.rectifierDrop()), 1e-9, 0.99);
        double iSec = iout / (1 - d);
        double ripple = (vg - rds * iSec) * d * s.periodS() / s.secondaryInductance();
        if (iSec - ripple / 2 <= 0) {
            throw new IllegalArgumentException("not CCM");
        }
        double im = iSec / n;
        return new OperatingPoint(vin, iout, v, ConductionMode.CCM, d, 1 - d, 0, im + ripple / (2 * n),
                im - ripple / (2 * n), im, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN,
                vin + n * (v + s.rectifierDrop()));
    }

    /**
     * DCM point: P = Vg′·D·Ts/(Ls + Rds′·D·Ts/2), D2 = Ls·P/((V + Vf)·Ts), Iout = P·D2/2.
     */
    static OperatingPoint dcm(StageSpec s, double vin, double iout) {
        double n = s.turns();
        double vg = vin / n;
        double rds = s.switchResistance() / (n * n);
        double ls = s.secondaryInductance();
        double ts = s.periodS();
        double w = s.vout() + s.rectifierDrop();
        double d = new BrentSolver(1e-15).solve(200, x -> {
            double p = vg * x * ts / (ls + rds * x * ts / 2);
            double d2 = ls * p / (w * ts);
            return p * d2 / 2 - iout;
        }, 1e-9, 0.99);
        double p = vg * d * ts / (ls + rds * d * ts / 2);
        double d2 = ls * p / (w * ts);
        if (d + d2 >= 1) {
            throw new IllegalArgumentException("not DCM");
        }
        double iSec = p * (d + d2) / 2;
        return new OperatingPoint(vin, iout, s.vout(), ConductionMode.DCM, d, d2, 1 - d - d2, p / n, 0,
                iSec / n, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN,
                vin + n * w);
    }
}
