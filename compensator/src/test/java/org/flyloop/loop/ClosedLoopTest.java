package org.flyloop.loop;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.flyloop.linear.Root;
import org.flyloop.linear.TransferFunction;
import org.junit.jupiter.api.Test;

class ClosedLoopTest {

    /**
     * Zout = R/(1 + sRC) closed by T = ωc/s: Zcl/s = (1/C)/((s + a)(s + ωc)), a = 1/(RC), so
     * Δv(t) = −(ΔI/C)·(e^(−a·t) − e^(−ωc·t))/(ωc − a), peaking at t* = ln(ωc/a)/(ωc − a)
     * (inverse Laplace transform by partial fractions).
     */
    @Test
    void loadStepMatchesTheClosedForm() {
        double r = 6, c = 1000e-6, wc = 2 * Math.PI * 2000, di = 5.0;
        double a = 1 / (r * c);
        TransferFunction zout = TransferFunction.of(r, 0, List.of(), List.of(Root.real(-a)));
        TransferFunction loop = TransferFunction.integrators(wc, 1);
        LoadStepResponse s = ClosedLoop.loadStep(zout, loop, di, 12);
        double tPeak = Math.log(wc / a) / (wc - a);
        double vPeak = -(di / c) * (Math.exp(-a * tPeak) - Math.exp(-wc * tPeak)) / (wc - a);
        assertEquals(vPeak, s.peakDeviationV(), 1e-3 * Math.abs(vPeak));
        assertEquals(tPeak, s.peakTimeS(), 0.01 * tPeak);
        for (int i = 0; i < s.timesS().length; i += 97) {
            double t = s.timesS()[i];
            double exact = -(di / c) * (Math.exp(-a * t) - Math.exp(-wc * t)) / (wc - a);
            assertEquals(exact, s.deviationV()[i], 1e-9 + 1e-7 * Math.abs(vPeak));
        }
        // Settling to ±1 % of 12 V: after the peak the response decays as e^(−a·t) (a ≪ ωc).
        double band = 0.12;
        double tSettle = Math.log((di / c) / ((wc - a) * band)) / a;
        assertEquals(tSettle, s.settlingTimeS(), 0.02 * tSettle);
    }

    @Test
    void aFastNearlyCancelledPoleDoesNotCutTheWindowShort() {
        // The same loop with an extra pole–zero doublet at 1 MHz: the response is essentially unchanged,
        // and the window must still reach the slow tail.
        double r = 6, c = 1000e-6, wc = 2 * Math.PI * 2000;
        TransferFunction zout = TransferFunction.of(r, 0, List.of(Root.realAtHz(1.01e6)),
                List.of(Root.real(-1 / (r * c)), Root.realAtHz(1e6)));
        TransferFunction plain = TransferFunction.of(r, 0, List.of(), List.of(Root.real(-1 / (r * c))));
        TransferFunction loop = TransferFunction.integrators(wc, 1);
        LoadStepResponse with = ClosedLoop.loadStep(zout, loop, 1, 12);
        LoadStepResponse without = ClosedLoop.loadStep(plain, loop, 1, 12);
        assertEquals(without.peakDeviationV(), with.peakDeviationV(), 0.01 * Math.abs(without.peakDeviationV()));
        assertEquals(without.settlingTimeS(), with.settlingTimeS(), 0.02 * without.settlingTimeS());
    }
}
