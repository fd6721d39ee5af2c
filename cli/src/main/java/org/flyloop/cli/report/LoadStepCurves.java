package org.flyloop.cli.report;

import org.flyloop.cli.plot.Band;
import org.flyloop.cli.plot.Emphasis;
import org.flyloop.cli.plot.Marker;
import org.flyloop.cli.plot.MarkerKind;
import org.flyloop.cli.plot.ReferenceLine;
import org.flyloop.cli.plot.SiText;
import org.flyloop.cli.plot.StepData;
import org.flyloop.cli.plot.Trace;
import org.flyloop.design.CornerResult;
import org.flyloop.design.DesignResult;
import org.flyloop.loop.ClosedLoop;
import org.flyloop.loop.LoadStepResponse;

/**
 * Load-step figures: the linear closed-loop response at the worst-phase-margin corner from
 * {@link ClosedLoop#loadStep}, with its peak, settling band and settling time marked; further
 * series (the averaged model, a switching simulation) join with {@link #withSeries}.
 */
public final class LoadStepCurves {

    /**
     * Default load step as a fraction of the largest load: half of full load (common practice,
     * no source).
     */
    public static final double DEFAULT_STEP_FRACTION = 0.5;
    /** Name of the linear series. */
    public static final String LINEAR_NAME = "linear closed-loop model";

    private LoadStepCurves() {
    }

    /**
     * The linear response to a load step of {@code stepA} up to full load, at the full-load corner
     * with the smallest phase margin ({@link org.flyloop.design.LoopEvaluation#loadStepCorner}).
     */
    public static LoadStepResponse linearResponse(DesignResult r, double stepA) {
        CornerResult c = r.roundedLoop().loadStepCorner();
        return ClosedLoop.loadStep(c.corner().stage().outputImpedance(), c.loop(), stepA, r.request().stage().vout());
    }

    /** The load-step figure data with the linear series, its peak, band and settling time. */
    public static StepData loadStep(DesignResult r, double stepA) {
        LoadStepResponse s = linearResponse(r, stepA);
        CornerResult c = r.roundedLoop().loadStepCorner();
        String subtitle = "step of " + signed(stepA, "A") + " up to " + CornerNames.corner(c.corner())
                + " (full load, worst phase margin there)";
        StepData d = StepData.of("Load step: output deviation", subtitle, "output deviation", "V",
                java.util.List.of(new Trace(LINEAR_NAME, s.timesS(), s.deviationV(), Emphasis.STRONG)));
        d = d.withMarker(new Marker(s.peakTimeS(), s.peakDeviationV(), MarkerKind.PEAK,
                "peak " + SiText.format(s.peakDeviationV(), "V", 3) + " at " + SiText.format(s.peakTimeS(), "s", 3)));
        double[] dv = s.deviationV();
        double last = dv[dv.length - 1];
        d = d.withBand(new Band(last - s.settlingBandV(), last + s.settlingBandV(),
                "settling band ±" + SiText.format(s.settlingBandV(), "V", 3) + " (±"
                        + SiText.plain(100 * ClosedLoop.SETTLING_BAND_FRACTION, 2) + " % of Vout)"));
        if (Double.isFinite(s.settlingTimeS()) && s.settlingTimeS() > 0) {
            double[] t = s.timesS();
            int i = 0;
            while (i + 1 < t.length && t[i + 1] < s.settlingTimeS()) {
                i++;
            }
            double frac = i + 1 < t.length ? (s.settlingTimeS() - t[i]) / (t[i + 1] - t[i]) : 0;
            double y = i + 1 < t.length ? dv[i] + frac * (dv[i + 1] - dv[i]) : dv[i];
            d = d.withVertical(ReferenceLine.cursor(s.settlingTimeS()))
                    .withMarker(new Marker(s.settlingTimeS(), y, MarkerKind.SETTLING,
                            "settled after " + SiText.format(s.settlingTimeS(), "s", 3)));
        }
        return d;
    }

    /**
     * A copy of {@code d} with another model's deviation overlaid, its peak marked too.
     *
     * @param name       legend name, e.g. "averaged model (large signal)"
     * @param timeS      times, s, step at 0
     * @param deviationV output minus its value before the step, V
     */
    public static StepData withSeries(StepData d, String name, double[] timeS, double[] deviationV) {
        int peak = 0;
        for (int i = 0; i < deviationV.length; i++) {
            peak = Math.abs(deviationV[i]) > Math.abs(deviationV[peak]) ? i : peak;
        }
        StepData out = d.withSeries(new Trace(name, timeS, deviationV, Emphasis.NORMAL));
        if (deviationV.length > 0) {
            out = out.withMarker(new Marker(timeS[peak], deviationV[peak], MarkerKind.PEAK,
                    name + ": peak " + SiText.format(deviationV[peak], "V", 3)));
        }
        return out;
    }

    static String signed(double v, String unit) {
        return (v > 0 ? "+" : "") + SiText.format(v, unit, 3);
    }
}
