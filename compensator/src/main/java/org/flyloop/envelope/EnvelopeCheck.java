package org.flyloop.envelope;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.function.IntConsumer;
import org.flyloop.design.Corner;
import org.flyloop.design.CrossoverLimit;
import org.flyloop.design.CrossoverPlanner;
import org.flyloop.design.DesignRequest;
import org.flyloop.design.DesignResult;
import org.flyloop.design.LoopEvaluation;
import org.flyloop.design.Placement;
import org.flyloop.linear.Root;
import org.flyloop.linear.TransferFunction;
import org.flyloop.network.CompensatorNetwork;
import org.flyloop.network.NetworkKind;
import org.flyloop.network.ShuntOptoNetwork;
import org.flyloop.spec.TolerancesSpec;

/**
 * A given compensator checked over the operating envelope: the full margin analysis (with the
 * Nyquist verdict) at every envelope corner with nominal parts, the tolerance worst case when any
 * toleranced quantity moves the loop, and optionally a Monte Carlo run.
 *
 * @param request    the spec's stage, controller, feedback, targets and series
 * @param network    the compensator checked
 * @param envelope   the envelope corners
 * @param corners    the same corners resolved with the nominal stage
 * @param nominal    the loop at every corner with nominal parts
 * @param worstCase  the tolerance worst case; null when nothing is toleranced
 * @param monteCarlo the Monte Carlo run; null when none was asked for
 */
public record EnvelopeCheck(DesignRequest request, CompensatorNetwork network, List<EnvelopeCorner> envelope,
                            List<Corner> corners, LoopEvaluation nominal, WorstCase worstCase,
                            MonteCarloResult monteCarlo) {

    public EnvelopeCheck {
        envelope = List.copyOf(envelope);
        corners = List.copyOf(corners);
    }

    /**
     * Checks {@code network} at every corner, and under {@code tolerances} when any toleranced
     * quantity moves the loop.
     *
     * @throws org.flyloop.stage.InfeasibleOperatingPointException when the nominal stage cannot run
     *         at a corner
     */
    public static EnvelopeCheck run(DesignRequest request, CompensatorNetwork network, TolerancesSpec tolerances) {
        EnvelopeSetup setup = EnvelopeSetup.forWorstCase(request, network, tolerances, EnvelopeSetup.DEFAULT_POINTS);
        List<Corner> corners = EnvelopeCorners.resolveAll(setup.corners(), request.stage(), request.control());
        LoopEvaluation nominal = LoopEvaluation.of(network, corners, request.control().fbGain(),
                request.stage().fswHz(), request.targets());
        WorstCase worst = setup.box().size() > 0 ? WorstCaseAnalysis.run(setup) : null;
        return new EnvelopeCheck(request, network, setup.corners(), corners, nominal, worst, null);
    }

    /**
     * This check with a Monte Carlo run added.
     *
     * @throws IllegalArgumentException when nothing is toleranced (every sample would be the same)
     */
    public EnvelopeCheck withMonteCarlo(TolerancesSpec tolerances, int samples, long seed, int threads,
                                        IntConsumer progress) {
        EnvelopeSetup setup = EnvelopeSetup.forMonteCarlo(request, network, tolerances, EnvelopeSetup.DEFAULT_POINTS);
        if (setup.box().size() == 0) {
            throw new IllegalArgumentException("nothing to sample: no toleranced quantity moves the loop");
        }
        MonteCarloResult mc = MonteCarloAnalysis.run(setup, samples, seed, threads, progress);
        return new EnvelopeCheck(request, network, envelope, corners, nominal, worstCase, mc);
    }

    /**
     * The check in the designer's result shape, so that reports of a design and of a check read
     * alike: the given network stands as both the ideal and the built network, its placement is
     * "given" with the network's own zeros and poles, and its crossover is the highest over the
     * corners.
     */
    public DesignResult asDesignResult() {
        TransferFunction gc = network.transferFunction();
        List<Double> zeros = frequencies(gc.zeros());
        List<Double> poles = frequencies(gc.poles());
        double fc = nominal.highestCrossoverHz();
        double boost = 0;
        for (double z : zeros) {
            boost += Math.toDegrees(Math.atan(fc / z));
        }
        for (double p : poles) {
            boost -= Math.toDegrees(Math.atan(fc / p));
        }
        Placement given = new Placement("given", type(network), fc, boost, zeros, poles);
        List<CrossoverLimit> limits = CrossoverPlanner.limits(request, corners);
        return new DesignResult(request, corners, limits, given, network, network, nominal, nominal, warnings(),
                rulesOfThumb(limits));
    }

    private static List<Double> frequencies(List<Root> roots) {
        return roots.stream().map(Root::frequencyHz).sorted().toList();
    }

    private static int type(CompensatorNetwork n) {
        if (n instanceof ShuntOptoNetwork so) {
            return so.type();
        }
        return n.kind() == NetworkKind.OPAMP_TYPE1 ? 1 : n.kind() == NetworkKind.OPAMP_TYPE3 ? 3 : 2;
    }

    /** The stage's physics warnings at the corners, then every missed target. */
    public List<String> warnings() {
        Set<String> out = new LinkedHashSet<>();
        for (Corner c : corners) {
            out.addAll(c.stage().warnings());
        }
        for (String miss : misses()) {
            out.add("target missed " + miss);
        }
        return new ArrayList<>(out);
    }

    /** The rules of thumb behind the corners and the crossover bounds. */
    public List<String> rulesOfThumb(List<CrossoverLimit> limits) {
        List<String> out = new ArrayList<>();
        out.add(String.format(Locale.ROOT, "envelope corners at %.2f× and %.2f× the CCM/DCM boundary load, on either "
                + "side of the model change (common practice, no source)", EnvelopeCorners.DCM_SIDE,
                EnvelopeCorners.CCM_SIDE));
        for (CrossoverLimit l : limits) {
            out.add("crossover bound, " + l.name() + ": " + l.basis());
        }
        return out;
    }

    /** True when every corner meets every target with nominal parts and in the worst case. */
    public boolean meetsTargets() {
        return misses().isEmpty();
    }

    /** Every missed target, one line each, naming the corner. */
    public List<String> misses() {
        List<String> out = new ArrayList<>();
        for (int c = 0; c < envelope.size(); c++) {
            for (String miss : nominal.results().get(c).misses()) {
                out.add("at " + envelope.get(c).label() + ": " + miss);
            }
        }
        if (worstCase != null) {
            for (String miss : worstCase.misses(request.targets())) {
                out.add("in the tolerance worst case " + miss);
            }
        }
        return out;
    }
}
