package org.flyloop.cli.plot;

import java.util.ArrayList;
import java.util.List;
import org.flyloop.linear.FrequencyGrid;
import org.flyloop.linear.FrequencyResponse;
import org.flyloop.linear.Root;
import org.flyloop.linear.TransferFunction;
import org.flyloop.loop.GainCrossover;
import org.flyloop.loop.LoopMargins;
import org.flyloop.loop.MarginAnalyzer;
import org.flyloop.loop.PhaseCrossover;

/**
 * The invented loop of {@link BodePlotTest}: T(s) = ωI/(s·(1 + s/ωp1)·(1 + s/ωp2)), two corners of it,
 * its crossover markers and the fsw/2 limit, as figure data.
 */
final class BodePlotTestData {

    private BodePlotTestData() {
    }

    // Invented loop: integrator gain ωI, real poles at 2 kHz and 20 kHz.
    static final double WI = 2 * Math.PI * 1500;
    static final double FP1 = 2e3;
    static final double FP2 = 20e3;

    static final TransferFunction LOOP = TransferFunction.of(WI, 1, List.of(),
            List.of(Root.realAtHz(FP1), Root.realAtHz(FP2)));
    static final TransferFunction OTHER_CORNER = LOOP.times(0.5);

    /** |T(j2πf)| written out from the factors, independent of the library's evaluation. */
    static double magnitude(double f) {
        double w = 2 * Math.PI * f;
        return WI / (w * Math.hypot(1, f / FP1) * Math.hypot(1, f / FP2));
    }

    /**
     * Phase crossover: ∠T = −90° − atan(f/fp1) − atan(f/fp2) = −180° when
     * atan(f/fp1) + atan(f/fp2) = 90°, i.e. (f/fp1)·(f/fp2) = 1, so f180 = √(fp1·fp2).
     */
    static final double F180 = Math.sqrt(FP1 * FP2);

    static BodeData data() {
        FrequencyGrid grid = FrequencyGrid.logarithmic(10, 1e6, 60);
        LoopMargins m = MarginAnalyzer.analyze(LOOP, 1, 5e5);
        List<BodeMarker> marks = new ArrayList<>();
        for (GainCrossover g : m.gainCrossovers()) {
            marks.add(new BodeMarker(g.frequencyHz(), LOOP.magnitudeDb(g.frequencyHz()), LOOP.phaseDeg(g.frequencyHz()),
                    MarkerKind.GAIN_CROSSOVER, "fc = " + SiText.format(g.frequencyHz(), "Hz", 3) + ", PM = "
                    + SiText.fixed(g.phaseMarginDeg(), 1) + "°"));
        }
        for (PhaseCrossover p : m.phaseCrossovers()) {
            marks.add(new BodeMarker(p.frequencyHz(), LOOP.magnitudeDb(p.frequencyHz()), LOOP.phaseDeg(p.frequencyHz()),
                    MarkerKind.PHASE_CROSSOVER, "GM = " + SiText.fixed(p.gainMarginDb(), 1) + " dB"));
        }
        return BodeData.of("Invented loop", "two poles and an integrator", List.of(
                BodeTrace.of("corner A (worst)", FrequencyResponse.of(LOOP, grid), Emphasis.STRONG),
                BodeTrace.of("corner B", FrequencyResponse.of(OTHER_CORNER, grid), Emphasis.NORMAL)))
                .withMarkers(marks)
                .withVerticals(List.of(ReferenceLine.limit(50e3, "fsw/2 = 50 kHz")))
                .withGuides(List.of(ReferenceLine.guide(0)), List.of(ReferenceLine.guide(-180)));
    }

}
