package org.flyloop.design;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.flyloop.network.CompensatorNetwork;
import org.flyloop.network.ShuntOptoNetwork;
import org.flyloop.network.UnrealisablePlacementException;
import org.flyloop.spec.AmplifierKind;
import org.flyloop.spec.ControlScheme;
import org.flyloop.spec.FeedbackSpec;
import org.flyloop.spec.PlacementMethod;

/**
 * The designer: from the stage and the targets to a compensator with standard part values.
 *
 * <ol>
 *   <li>Corners: every vin × iout corner (× the CTR extremes for shunt-opto).</li>
 *   <li>Crossover: the requested one, or (auto) the lowest of the bounds of
 *       {@link CrossoverPlanner}; with auto, if the targets are missed after rounding the
 *       crossover steps down by 15 % until they are met (the boost the network can deliver is one
 *       of the bounds, found this way).</li>
 *   <li>Type: as given, or auto: type 3 for voltage mode with any CCM corner, type 2 otherwise
 *       (type 3 only exists for the op-amp).</li>
 *   <li>Placement: Venable's K factor for the boost needed at the most lagging corner, and/or the
 *       direct pole-zero placement; the gain puts |T| = 1 at fc at the corner where the stage gain
 *       at fc is largest, so no corner crosses above fc.</li>
 *   <li>Parts: synthesized for the network, rounded to the spec's series (IEC 60063), re-analysed.
 *       A warning is raised when rounding costs more than 3° of phase margin or moves the crossover
 *       by more than 10 %.</li>
 * </ol>
 */
public final class Designer {

    static final double CROSSOVER_STEP = 0.85;
    static final int MAX_STEPS = 25;
    static final double ROUNDING_PM_WARN_DEG = 3;
    static final double ROUNDING_FC_WARN = 0.10;

    private Designer() {
    }

    /** Designs the compensator for {@code request}. */
    public static DesignResult design(DesignRequest request) {
        List<Corner> corners = Corners.of(request.stage(), request.control(), request.feedback());
        List<CrossoverLimit> limits = CrossoverPlanner.limits(request, corners);
        int type = chooseType(request, corners);
        boolean auto = request.targets().autoCrossover();
        double fc = auto ? CrossoverPlanner.lowest(limits) : request.targets().crossoverHz();
        double ceiling = request.feedback().amplifier() == AmplifierKind.SHUNT_OPTO
                ? CrossoverPlanner.optoPoleHz(request) : Double.POSITIVE_INFINITY;

        Attempt best = null;
        for (int step = 0; step < (auto ? MAX_STEPS : 1); step++, fc *= CROSSOVER_STEP) {
            for (PlacementMethod method : methods(request.feedback())) {
                Attempt a = attempt(request, corners, type, fc, method, ceiling);
                if (a != null && (best == null || a.betterThan(best))) {
                    best = a;
                }
            }
            if (best != null && best.rounded.meetsTargets()) {
                break;
            }
        }
        if (best == null) {
            throw new IllegalArgumentException("no realisable compensator for this spec: every placement "
                    + "was refused by the network's constraints");
        }
        List<String> warnings = warnings(request, corners, limits, best);
        return new DesignResult(request, corners, limits, best.placement, best.ideal, best.roundedNetwork,
                best.idealLoop, best.rounded, warnings, rulesOfThumb(request, limits));
    }

    private record Attempt(Placement placement, CompensatorNetwork ideal, CompensatorNetwork roundedNetwork,
                           LoopEvaluation idealLoop, LoopEvaluation rounded, String note) {
        boolean betterThan(Attempt other) {
            if (rounded.meetsTargets() != other.rounded.meetsTargets()) {
                return rounded.meetsTargets();
            }
            if (rounded.meetsTargets()) {
                // Both meet: the higher crossover wins, then the larger margin.
                double f1 = placement.crossoverHz();
                double f2 = other.placement.crossoverHz();
                if (f1 != f2) {
                    return f1 > f2;
                }
            }
            return rounded.worstPhaseMarginDeg() > other.rounded.worstPhaseMarginDeg();
        }
    }

    private static Attempt attempt(DesignRequest request, List<Corner> corners, int type, double fc,
                                   PlacementMethod method, double ceiling) {
        Placement p;
        if (method == PlacementMethod.K_FACTOR) {
            double boost = PlacementPlanner.requiredBoostDeg(corners, fc, request.targets().phaseMarginDeg());
            p = PlacementPlanner.kFactor(type, fc, boost, ceiling);
        } else {
            p = PlacementPlanner.polesZeros(type, fc, PlacementPlanner.mostLaggingCorner(corners, fc),
                    request.stage().fswHz(), ceiling);
        }
        double fbGain = request.control().fbGain();
        double ctrNominal = ctrNominal(request.feedback());
        double stageGain = 0;
        for (Corner c : corners) {
            double g = c.stage().control().magnitude(fc) * fbGain;
            if (!Double.isNaN(c.ctr())) {
                g *= c.ctr() / ctrNominal;
            }
            stageGain = Math.max(stageGain, g);
        }
        NetworkSynthesizer.Synthesis s;
        CompensatorNetwork rounded;
        try {
            s = NetworkSynthesizer.synthesize(request, p, 1 / stageGain, ctrNominal);
            rounded = PartRounding.round(s.network(), request.series(), request.feedback());
        } catch (UnrealisablePlacementException e) {
            return null;
        }
        double fsw = request.stage().fswHz();
        LoopEvaluation ideal = LoopEvaluation.of(s.network(), corners, fbGain, fsw, request.targets());
        LoopEvaluation round = LoopEvaluation.of(rounded, corners, fbGain, fsw, request.targets());
        return new Attempt(p, s.network(), rounded, ideal, round, s.note());
    }

    /** The CTR the network is designed at: the nominal if given, else the geometric mean of the range. */
    static double ctrNominal(FeedbackSpec fb) {
        return fb.amplifier() == AmplifierKind.SHUNT_OPTO ? fb.ctr().typical() : Double.NaN;
    }

    private static List<PlacementMethod> methods(FeedbackSpec fb) {
        return fb.placement() == PlacementMethod.BEST
                ? List.of(PlacementMethod.K_FACTOR, PlacementMethod.POLES_ZEROS) : List.of(fb.placement());
    }

    /** Type 3 for an op-amp in voltage mode with any CCM corner, type 2 otherwise, unless given. */
    static int chooseType(DesignRequest request, List<Corner> corners) {
        FeedbackSpec fb = request.feedback();
        if (!fb.autoType()) {
            return fb.type();
        }
        boolean anyCcm = corners.stream().anyMatch(c -> c.point().isContinuous());
        boolean voltage = request.control().scheme() == ControlScheme.VOLTAGE;
        return voltage && anyCcm && fb.amplifier() == AmplifierKind.OPAMP ? 3 : 2;
    }

    private static List<String> warnings(DesignRequest request, List<Corner> corners, List<CrossoverLimit> limits,
                                         Attempt best) {
        Set<String> out = new LinkedHashSet<>();
        for (Corner c : corners) {
            out.addAll(c.stage().warnings());
        }
        if (best.note != null) {
            out.add(best.note);
        }
        double pmIdeal = best.idealLoop.worstPhaseMarginDeg();
        double pmRounded = best.rounded.worstPhaseMarginDeg();
        if (pmIdeal - pmRounded > ROUNDING_PM_WARN_DEG) {
            out.add(String.format(Locale.ROOT, "rounding to %s/%s costs %.1f° of phase margin (%.1f° → %.1f°)",
                    request.series().resistors(), request.series().capacitors(), pmIdeal - pmRounded, pmIdeal,
                    pmRounded));
        }
        double fcIdeal = best.idealLoop.highestCrossoverHz();
        double fcRounded = best.rounded.highestCrossoverHz();
        if (Math.abs(fcRounded / fcIdeal - 1) > ROUNDING_FC_WARN) {
            out.add(String.format(Locale.ROOT, "rounding moves the crossover by %.0f %% (%.4g Hz → %.4g Hz)",
                    100 * (fcRounded / fcIdeal - 1), fcIdeal, fcRounded));
        }
        for (CornerResult r : best.rounded.results()) {
            double f = r.margins().crossoverHz();
            double rhpz = r.corner().stage().rhpZeroHz();
            if (!Double.isNaN(f) && !Double.isNaN(rhpz) && f > request.targets().rhpZeroFraction() * rhpz) {
                out.add(String.format(Locale.ROOT, "RHP-zero limit: at %s the crossover %.4g Hz exceeds %.3g × "
                        + "f_RHPZ = %.4g Hz", r.corner().describe(), f, request.targets().rhpZeroFraction(),
                        request.targets().rhpZeroFraction() * rhpz));
            }
        }
        if (request.feedback().amplifier() == AmplifierKind.SHUNT_OPTO) {
            double opto = CrossoverPlanner.optoPoleHz(request);
            double fc = best.rounded.highestCrossoverHz();
            if (Double.isFinite(opto) && fc > opto * CrossoverPlanner.OPTO_POLE_FRACTION) {
                out.add(String.format(Locale.ROOT, "optocoupler pole too low: %.4g Hz is less than 3 × the "
                        + "crossover %.4g Hz", opto, fc));
            }
            if (best.roundedNetwork instanceof ShuntOptoNetwork so) {
                out.addAll(NetworkSynthesizer.bias(request).violations(so));
            }
        }
        if (request.targets().autoCrossover()) {
            double lowest = CrossoverPlanner.lowest(limits);
            if (best.placement.crossoverHz() < 0.999 * lowest) {
                out.add(String.format(Locale.ROOT, "crossover lowered from %.4g Hz to %.4g Hz to meet the phase- and "
                        + "gain-margin targets at every corner with a type %d network", lowest,
                        best.placement.crossoverHz(), best.placement.type()));
                if (best.placement.crossoverHz() < 0.1 * lowest) {
                    out.add(String.format(Locale.ROOT, "the crossover fell below a tenth of its bound (%.4g Hz): the "
                            + "loop is slow; look at the stage's double pole and the network type before building it",
                            lowest));
                }
            }
        }
        for (CornerResult r : best.rounded.results()) {
            for (String miss : r.misses()) {
                out.add("target missed at " + r.corner().describe() + ": " + miss);
            }
        }
        return new ArrayList<>(out);
    }

    private static List<String> rulesOfThumb(DesignRequest request, List<CrossoverLimit> limits) {
        List<String> out = new ArrayList<>();
        for (CrossoverLimit l : limits) {
            out.add("crossover bound, " + l.name() + ": " + l.basis());
        }
        out.add("phase boost bounded to 80° (type 2) and 160° (type 3) for sensible part spreads "
                + "(common practice, no source)");
        out.add("direct placement: zeros at the stage's double or output pole, poles at the ESR zero and the "
                + "RHP zero or fsw/2 (common practice, no source)");
        if (Double.isNaN(request.feedback().rUpper()) && Double.isNaN(request.feedback().rLower())) {
            out.add("r_lower = 10 kΩ when the spec gives no divider resistor (common practice, no source)");
        }
        out.add("load-step settling band ±1 % of Vout (common practice, no source)");
        return out;
    }
}
