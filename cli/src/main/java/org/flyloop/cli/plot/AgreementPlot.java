package org.flyloop.cli.plot;

import java.util.ArrayList;
import java.util.List;

/**
 * The model-agreement figure: both models on a Bode pair, and below it their difference in
 * magnitude and in phase (model minus reference), with the largest difference inside the
 * comparison range marked.
 */
public final class AgreementPlot {

    private AgreementPlot() {
    }

    public static Figure figure(AgreementData d) {
        List<Trace> mag = new ArrayList<>();
        List<Trace> phase = new ArrayList<>();
        for (BodeTrace t : d.bodeTraces()) {
            mag.add(t.magnitudeTrace());
            phase.add(t.phaseTrace());
        }
        double[] f = d.reference().frequencyHz();
        double[] dDb = d.differenceDb();
        double[] dDeg = d.differenceDeg();
        String name = d.model().name();
        Panel magnitude = Panel.of("magnitude", "magnitude", "dB", Scale.DECIBEL, mag);
        Panel phasePanel = new Panel("phase", "phase", "°", Scale.DEGREE, phase, List.of(), List.of(), List.of(),
                0.85, 0);
        Panel diffDb = new Panel("difference-magnitude", "Δ magnitude", "dB", Scale.LINEAR,
                List.of(new Trace(name, f, dDb, d.model().emphasis())), worst(d, f, dDb, "dB", 2),
                List.of(ReferenceLine.guide(0)), List.of(), 0.6, 1);
        Panel diffDeg = new Panel("difference-phase", "Δ phase", "°", Scale.LINEAR,
                List.of(new Trace(name, f, dDeg, d.model().emphasis())), worst(d, f, dDeg, "°", 1),
                List.of(ReferenceLine.guide(0)), List.of(), 0.6, 10);
        List<ReferenceLine> verticals = new ArrayList<>(d.verticals());
        if (Double.isFinite(d.comparisonLimitHz()) && d.comparisonLimitHz() < f[f.length - 1]) {
            verticals.add(ReferenceLine.limit(d.comparisonLimitHz(),
                    "compared up to " + SiText.format(d.comparisonLimitHz(), "Hz", 3)));
        }
        return new Figure(d.title(), d.subtitle(), "frequency", "Hz", Scale.LOG,
                List.of(magnitude, phasePanel, diffDb, diffDeg), verticals);
    }

    private static List<Marker> worst(AgreementData d, double[] f, double[] diff, String unit, int decimals) {
        int i = d.worstIndex(diff);
        if (i < 0) {
            return List.of();
        }
        String value = unit.equals("°") ? SiText.fixed(diff[i], decimals) + "°"
                : SiText.fixed(diff[i], decimals) + " " + unit;
        return List.of(new Marker(f[i], diff[i], MarkerKind.DISAGREEMENT,
                "largest: " + value + " at " + SiText.format(f[i], "Hz", 3)));
    }
}
