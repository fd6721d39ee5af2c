package org.flyloop.cli.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.flyloop.cli.plot.BodeData;
import org.flyloop.cli.plot.BodeMarker;
import org.flyloop.cli.plot.BodeTrace;
import org.flyloop.cli.plot.Emphasis;
import org.flyloop.cli.plot.MarkerKind;
import org.flyloop.cli.plot.ReferenceLine;
import org.flyloop.cli.plot.SiText;
import org.flyloop.design.Corner;
import org.flyloop.design.CornerResult;
import org.flyloop.design.DesignResult;
import org.flyloop.linear.FrequencyGrid;
import org.flyloop.linear.FrequencyResponse;
import org.flyloop.linear.TransferFunction;
import org.flyloop.loop.ClosedLoop;
import org.flyloop.loop.GainCrossover;
import org.flyloop.loop.LoopMargins;
import org.flyloop.loop.PhaseCrossover;
import org.flyloop.network.CompensatorNetwork;
import org.flyloop.network.PartNames;
import org.flyloop.stage.OperatingPoint;
import org.flyloop.stage.model.PoleZero;

/**
 * The Bode data of a design, built from the library's transfer functions: stage, compensator,
 * loop gain and closed loop at every corner, the worst-phase-margin corner emphasised, crossovers
 * and margins marked, the RHP-zero bound and fsw/2 drawn. Formatting only: every number comes
 * from {@code org.flyloop.design}, {@code org.flyloop.loop} and {@code org.flyloop.linear}.
 */
public final class DesignCurves {

    /** Grid density, points per decade (the grid is refined further around resonances). */
    public static final int POINTS_PER_DECADE = 60;

    /** Closed-loop peaking below this is not marked, dB: it would only clutter the figure. */
    static final double PEAK_WORTH_MARKING_DB = 0.5;

    private DesignCurves() {
    }

    /**
     * Decade-aligned analysis range: from a thousandth of the crossover (or a tenth of the lowest
     * stage pole or zero, if lower; never below 0.1 Hz) up to the decade at or above fsw, refined
     * around every lightly damped pole and zero of the loops and stages.
     */
    public static FrequencyGrid grid(DesignResult r) {
        double fc = r.roundedLoop().highestCrossoverHz();
        if (Double.isNaN(fc)) {
            fc = r.placement().crossoverHz();
        }
        double low = fc / 1000;
        List<TransferFunction> tfs = new ArrayList<>();
        for (CornerResult c : r.roundedLoop().results()) {
            tfs.add(c.loop());
            tfs.add(c.corner().stage().control());
            for (PoleZero pz : c.corner().stage().features()) {
                low = Math.min(low, pz.frequencyHz() / 10);
            }
        }
        low = Math.pow(10, Math.floor(Math.log10(Math.max(low, 0.1))));
        double high = Math.pow(10, Math.ceil(Math.log10(r.request().stage().fswHz()) - 1e-9));
        return FrequencyGrid.refinedFor(low, high, POINTS_PER_DECADE, tfs.toArray(new TransferFunction[0]));
    }

    /** The corner the figures emphasise: the smallest phase margin of the rounded design. */
    public static CornerResult worst(DesignResult r) {
        return r.roundedLoop().worstPhaseMargin();
    }

    /** Control-to-output of the stage at each distinct operating point. */
    public static BodeData stage(DesignResult r, FrequencyGrid grid) {
        OperatingPoint worstPoint = worst(r).corner().point();
        Map<OperatingPoint, Corner> points = new LinkedHashMap<>();
        for (Corner c : r.corners()) {
            points.putIfAbsent(c.point(), c);
        }
        List<BodeTrace> traces = new ArrayList<>();
        for (Corner c : points.values()) {
            boolean w = c.point().equals(worstPoint);
            String name = CornerNames.point(c.point()) + " " + c.point().mode().label() + (w ? " (worst)" : "");
            traces.add(trace(name, c.stage().control(), grid, w));
        }
        return BodeData.of("Power stage: control to output", "v̂o/v̂c at each operating point", traces)
                .withVerticals(limits(r));
    }

    /** The compensator with rounded parts (at each CTR of the corners) and with ideal parts. */
    public static BodeData compensator(DesignResult r, FrequencyGrid grid) {
        double worstCtr = worst(r).corner().ctr();
        Map<Double, CompensatorNetwork> byCtr = new LinkedHashMap<>();
        for (Corner c : r.corners()) {
            byCtr.computeIfAbsent(c.ctr(), ctr -> Double.isNaN(ctr) ? r.rounded()
                    : r.rounded().withParts(Map.of(PartNames.CTR, ctr)));
        }
        List<BodeTrace> traces = new ArrayList<>();
        for (Map.Entry<Double, CompensatorNetwork> e : byCtr.entrySet()) {
            double ctr = e.getKey();
            boolean w = Double.isNaN(ctr) || ctr == worstCtr;
            String name = "standard parts" + (Double.isNaN(ctr) ? "" : ", " + CornerNames.ctr(ctr))
                    + (w && byCtr.size() > 1 ? " (worst)" : "");
            traces.add(trace(name, e.getValue().transferFunction(), grid, w));
        }
        traces.add(trace("exact parts", r.ideal().transferFunction(), grid, false));
        String kind = r.rounded().kind().specName() + ", type " + r.placement().type();
        return BodeData.of("Compensator", "Gc = −v̂c/v̂o, " + kind, traces).withVerticals(limits(r));
    }

    /** Loop gain at every corner with every crossover and margin marked. */
    public static BodeData loop(DesignResult r, FrequencyGrid grid) {
        CornerResult worst = worst(r);
        CornerResult worstGm = r.roundedLoop().worstGainMargin();
        List<BodeTrace> traces = new ArrayList<>();
        List<BodeMarker> unlabelled = new ArrayList<>();
        List<BodeMarker> labelled = new ArrayList<>();
        for (CornerResult c : r.roundedLoop().results()) {
            boolean w = c == worst;
            traces.add(trace(cornerName(c, w), c.loop(), grid, w));
            List<BodeMarker> marks = marks(c.loop(), c.margins(), w, w || c == worstGm);
            (w || c == worstGm ? labelled : unlabelled).addAll(marks);
        }
        List<BodeMarker> all = new ArrayList<>(unlabelled);
        all.addAll(labelled);
        return BodeData.of("Loop gain", "T = Gc · k_fb · Gvc at every corner; worst phase margin drawn bold", traces)
                .withMarkers(all).withVerticals(limits(r))
                .withGuides(List.of(ReferenceLine.guide(0)),
                        List.of(ReferenceLine.guide(-180), ReferenceLine.guide(-540), ReferenceLine.guide(180)));
    }

    /** Reference-to-output closed loop T/(1 + T) at every corner, with its peak at the worst corner. */
    public static BodeData closedLoop(DesignResult r, FrequencyGrid grid) {
        CornerResult worst = worst(r);
        List<BodeTrace> traces = new ArrayList<>();
        List<BodeMarker> marks = new ArrayList<>();
        for (CornerResult c : r.roundedLoop().results()) {
            boolean w = c == worst;
            BodeTrace t = trace(cornerName(c, w), ClosedLoop.referenceToOutput(c.loop()), grid, w);
            traces.add(t);
            if (w) {
                double[] mag = t.magnitudeDb();
                int peak = 0;
                for (int i = 1; i < mag.length; i++) {
                    peak = mag[i] > mag[peak] ? i : peak;
                }
                if (mag[peak] > PEAK_WORTH_MARKING_DB) {
                    marks.add(new BodeMarker(t.frequencyHz()[peak], mag[peak], t.phaseDeg()[peak], MarkerKind.PEAK,
                            "peak +" + SiText.fixed(mag[peak], 1) + " dB at "
                                    + SiText.format(t.frequencyHz()[peak], "Hz", 3)));
                }
            }
        }
        return BodeData.of("Closed loop: reference to output", "T/(1 + T), normalised to its DC value", traces)
                .withMarkers(marks).withVerticals(limits(r))
                .withGuides(List.of(ReferenceLine.guide(-3, "−3 dB")), List.of());
    }

    /**
     * The RHP-zero bound (the targets' fraction of the lowest CCM RHP zero over the corners) and
     * fsw/2, as labelled vertical limits.
     */
    public static List<ReferenceLine> limits(DesignResult r) {
        List<ReferenceLine> out = new ArrayList<>();
        double lowest = Double.NaN;
        for (Corner c : r.corners()) {
            double z = c.stage().rhpZeroHz();
            if (!Double.isNaN(z)) {
                lowest = Double.isNaN(lowest) ? z : Math.min(lowest, z);
            }
        }
        if (!Double.isNaN(lowest)) {
            double fraction = r.request().targets().rhpZeroFraction();
            out.add(ReferenceLine.limit(fraction * lowest,
                    "RHP-zero limit " + SiText.format(fraction * lowest, "Hz", 3)));
        }
        double half = r.request().stage().fswHz() / 2;
        out.add(ReferenceLine.limit(half, "fsw/2 = " + SiText.format(half, "Hz", 3)));
        return out;
    }

    /** Crossover and margin markers of one loop gain. */
    static List<BodeMarker> marks(TransferFunction loop, LoopMargins m, boolean everyOne, boolean worstGm) {
        List<BodeMarker> out = new ArrayList<>();
        for (GainCrossover g : m.gainCrossovers()) {
            String label = everyOne ? "fc = " + SiText.format(g.frequencyHz(), "Hz", 3) + ", PM = "
                    + SiText.fixed(g.phaseMarginDeg(), 1) + "°" : "";
            out.add(new BodeMarker(g.frequencyHz(), loop.magnitudeDb(g.frequencyHz()), loop.phaseDeg(g.frequencyHz()),
                    MarkerKind.GAIN_CROSSOVER, label));
        }
        for (PhaseCrossover p : m.phaseCrossovers()) {
            boolean label = everyOne || (worstGm && p == m.worstGain());
            out.add(new BodeMarker(p.frequencyHz(), loop.magnitudeDb(p.frequencyHz()), loop.phaseDeg(p.frequencyHz()),
                    MarkerKind.PHASE_CROSSOVER, label ? "GM = " + SiText.fixed(p.gainMarginDb(), 1) + " dB" : ""));
        }
        return out;
    }

    static String cornerName(CornerResult c, boolean worst) {
        return CornerNames.corner(c.corner()) + (worst ? " (worst)" : "");
    }

    static BodeTrace trace(String name, TransferFunction h, FrequencyGrid grid, boolean strong) {
        return BodeTrace.of(name, FrequencyResponse.of(h, grid), strong ? Emphasis.STRONG : Emphasis.NORMAL);
    }
}
