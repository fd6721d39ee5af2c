package org.flyloop.stage;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.flyloop.spec.StageSpec;
import org.flyloop.spec.ValueRange;

/**
 * Random lossless stages: the solver's duty must satisfy the published conversion ratio of the
 * mode that the critical-K criterion selects (Erickson &amp; Maksimović, Fundamentals of Power
 * Electronics, 2nd ed. 2001: flyback CCM M = D/(n·(1 − D)), Sec. 6.3.4; buck-boost DCM M = D/√K
 * with Kcrit = (1 − D)², Ch. 5, Table 5.2; R′ = N²·R).
 */
class OperatingPointPropertyTest {

    @Property(tries = 300)
    boolean dutyObeysTheRatioOfTheCriticalKMode(
            @ForAll @DoubleRange(min = 10, max = 400) double vin,
            @ForAll @DoubleRange(min = 3, max = 48) double vout,
            @ForAll @DoubleRange(min = 0.2, max = 12) double turns,
            @ForAll @DoubleRange(min = 20, max = 2000) double lmMicrohenry,
            @ForAll @DoubleRange(min = 30, max = 300) double fswKilohertz,
            @ForAll @DoubleRange(min = 0.01, max = 5) double iout) {
        double lm = lmMicrohenry * 1e-6;
        double fsw = fswKilohertz * 1e3;
        StageSpec stage = new StageSpec(ValueRange.of(vin), vout, ValueRange.of(iout), fsw, lm, turns,
                100e-6, 0, 0, 0);
        OperatingPoint op = new OperatingPointSolver(stage, ExampleStages.voltageMode(0.99)).solve(vin, iout);
        double r = vout / iout;
        double ts = 1 / fsw;
        double k = 2 * lm / (turns * turns * r * ts);
        double dCcm = turns * vout / (vin + turns * vout);
        double kCrit = (1 - dCcm) * (1 - dCcm);
        boolean ccm = k > kCrit;
        double d = op.duty();
        double predicted = ccm ? vin / turns * d / (1 - d) : vin * d * Math.sqrt(r * ts / (2 * lm));
        boolean ratioHolds = Math.abs(predicted - vout) <= 1e-8 * vout;
        boolean modeHolds = op.mode() == ConductionMode.BOUNDARY
                ? Math.abs(k - kCrit) <= 0.0101 * kCrit
                : op.mode() == (ccm ? ConductionMode.CCM : ConductionMode.DCM);
        return ratioHolds && modeHolds;
    }
}
