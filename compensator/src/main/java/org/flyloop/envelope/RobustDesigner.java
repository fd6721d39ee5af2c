package org.flyloop.envelope;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.apache.commons.math3.exception.MathIllegalArgumentException;
import org.apache.commons.math3.exception.MathIllegalStateException;
import org.apache.commons.math3.optim.InitialGuess;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.SimpleBounds;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.nonlinear.scalar.ObjectiveFunction;
import org.apache.commons.math3.optim.nonlinear.scalar.noderiv.BOBYQAOptimizer;
import org.flyloop.design.Corner;
import org.flyloop.design.CornerResult;
import org.flyloop.design.CrossoverPlanner;
import org.flyloop.design.DesignRequest;
import org.flyloop.design.DesignResult;
import org.flyloop.design.Designer;
import org.flyloop.design.LoopEvaluation;
import org.flyloop.design.NetworkSynthesizer;
import org.flyloop.design.PartRounding;
import org.flyloop.design.Placement;
import org.flyloop.network.CompensatorNetwork;
import org.flyloop.spec.AmplifierKind;
import org.flyloop.spec.TolerancesSpec;

/**
 * Chooses the compensator whose worst-case phase margin over the whole envelope and every
 * tolerance is largest, at the designer's crossover and with the gain-margin target kept.
 *
 * <ol>
 *   <li>Start from {@link Designer#design}: its type, crossover fc and placement.</li>
 *   <li>Variables: ln of each zero and pole frequency, zeros within [fc/{@value #SPREAD}, fc] and
 *       poles within [fc, min(fsw/2, optocoupler ceiling, {@value #SPREAD}·fc)], so that every
 *       candidate is realisable (zero below its pole). The gain is set as the designer sets it:
 *       |T| = 1 at fc at the envelope corner where the stage gain at fc is largest, so the nominal
 *       crossover stays at fc.</li>
 *   <li>Objective: the smallest phase margin over a working set of tolerance points at every
 *       corner, less {@value #GM_PENALTY_DEG_PER_DB}° per dB that the gain margin falls short of its
 *       target (−{@value #NO_CROSSOVER_DEG}° for a loop without crossover). Maximised with Powell's
 *       BOBYQA (Commons Math; M. J. D. Powell, Cambridge report DAMTP 2009/NA06).</li>
 *   <li>The working set starts as the nominal point plus the worst points of the starting design's
 *       worst case; after each optimisation the full worst case ({@link WorstCaseAnalysis}) of the
 *       optimum is run, and its worst points join the set while they are worse than the set
 *       predicted (at most {@value #MAX_ROUNDS} rounds). Optimising a max-min over a working set
 *       of scenarios and adding the most violated one is the classic outer-approximation scheme for
 *       minimax design; it spares a full vertex enumeration per objective call.</li>
 *   <li>Round to the spec's series ({@link PartRounding}) and recheck: nominal corners and worst
 *       case of the rounded network. The result is kept only if its worst-case phase margin beats
 *       the rounded starting design's; otherwise the starting design stands.</li>
 * </ol>
 */
public final class RobustDesigner {

    static final double SPREAD = 20;
    static final double GM_PENALTY_DEG_PER_DB = 50;
    static final double NO_CROSSOVER_DEG = 1000;
    static final int MAX_ROUNDS = 3;
    static final int EVALUATIONS_PER_ROUND = 200;
    /** A full worst case this much below the working set's prediction adds its points to the set. */
    static final double PREDICTION_SLACK_DEG = 0.5;

    private RobustDesigner() {
    }

    /** The robust design for {@code request} under {@code tolerances}. */
    public static RobustDesign design(DesignRequest request, TolerancesSpec tolerances) {
        return design(Designer.design(request), tolerances);
    }

    /** The robust design starting from the designer's {@code start} (its request, type and crossover). */
    public static RobustDesign design(DesignResult start, TolerancesSpec tolerances) {
        DesignRequest request = start.request();
        EnvelopeSetup setup = EnvelopeSetup.forWorstCase(request, start.rounded(), tolerances,
                EnvelopeSetup.DEFAULT_POINTS);
        WorstCase startWorst = WorstCaseAnalysis.run(setup);
        Placement p0 = start.placement();
        if (p0.type() == 1) {
            return new RobustDesign(start, start, startWorst, startWorst, 0, false);
        }
        List<Corner> corners = EnvelopeCorners.resolveAll(setup.corners(), request.stage(), request.control());
        Problem problem = new Problem(request, setup, corners, p0);
        List<double[]> workingSet = new ArrayList<>();
        workingSet.add(nominalPoint(setup.box()));
        addWorstPoints(workingSet, startWorst, setup.box());

        double[] x = problem.startPoint();
        for (int round = 0; round < MAX_ROUNDS; round++) {
            problem.useWorkingSet(workingSet);
            x = problem.maximise(x);
            CompensatorNetwork ideal = problem.network(x);
            if (ideal == null) {
                break;
            }
            WorstCase full = WorstCaseAnalysis.run(setup.withNetwork(ideal), false);
            double predicted = problem.objective(x);
            if (!(full.phaseMargin().value() < predicted - PREDICTION_SLACK_DEG) || !addWorstPoints(workingSet, full, setup.box())) {
                break;
            }
        }
        CompensatorNetwork ideal = problem.network(x);
        if (ideal == null) {
            return new RobustDesign(start, start, startWorst, startWorst, problem.evaluations, false);
        }
        CompensatorNetwork rounded = PartRounding.round(ideal, request.series(), request.feedback());
        WorstCase worst = WorstCaseAnalysis.run(setup.withNetwork(rounded));
        if (!(rankedPm(worst) > rankedPm(startWorst))) {
            return new RobustDesign(start, start, startWorst, startWorst, problem.evaluations, false);
        }
        DesignResult chosen = result(request, start, corners, problem.placement(x), ideal, rounded, startWorst, worst);
        return new RobustDesign(chosen, start, startWorst, worst, problem.evaluations, true);
    }

    private static double rankedPm(WorstCase w) {
        double v = w.phaseMargin().value();
        return Double.isNaN(v) ? Double.NEGATIVE_INFINITY : v;
    }

    /** The point of the box where every quantity is at its nominal value. */
    static double[] nominalPoint(ToleranceBox box) {
        double[] u = new double[box.size()];
        for (int j = 0; j < u.length; j++) {
            var band = box.parameters().get(j).band();
            u[j] = band.high() == band.low() ? 0.5 : -band.low() / (band.high() - band.low());
        }
        return u;
    }

    /** Adds the points behind the worst phase and gain margins; false when all were already there. */
    private static boolean addWorstPoints(List<double[]> set, WorstCase worst, ToleranceBox box) {
        boolean added = false;
        for (WorstFigure w : List.of(worst.phaseMargin(), worst.gainMargin())) {
            if (!w.isPresent()) {
                continue;
            }
            double[] u = pointOf(w, box);
            if (set.stream().noneMatch(p -> Arrays.equals(p, u))) {
                set.add(u);
                added = true;
            }
        }
        return added;
    }

    /** The box position of a worst figure, recovered from its relative deviations. */
    private static double[] pointOf(WorstFigure w, ToleranceBox box) {
        double[] u = new double[box.size()];
        for (int j = 0; j < u.length; j++) {
            ToleranceParameter p = box.parameters().get(j);
            double d = w.deviations().get(p.name());
            double width = p.band().high() - p.band().low();
            u[j] = width == 0 ? 0.5 : (d - p.band().low()) / width;
        }
        return u;
    }

    private static DesignResult result(DesignRequest request, DesignResult start, List<Corner> corners,
                                       Placement placement, CompensatorNetwork ideal, CompensatorNetwork rounded,
                                       WorstCase startWorst, WorstCase worst) {
        double fsw = request.stage().fswHz();
        double k = request.control().fbGain();
        LoopEvaluation idealLoop = LoopEvaluation.of(ideal, corners, k, fsw, request.targets());
        LoopEvaluation roundedLoop = LoopEvaluation.of(rounded, corners, k, fsw, request.targets());
        Set<String> warnings = new LinkedHashSet<>();
        for (Corner c : corners) {
            warnings.addAll(c.stage().warnings());
        }
        warnings.add(String.format(Locale.ROOT, "robust placement: worst-case phase margin over %d corners and "
                        + "the tolerance box %.1f° (designer's placement: %.1f°)", corners.size(),
                worst.phaseMargin().value(), startWorst.phaseMargin().value()));
        for (CornerResult r : roundedLoop.results()) {
            for (String miss : r.misses()) {
                warnings.add("target missed at " + r.corner().describe() + ": " + miss);
            }
        }
        for (String miss : worst.misses(request.targets())) {
            warnings.add("tolerance worst case: " + miss);
        }
        List<String> rules = new ArrayList<>(start.rulesOfThumb());
        rules.add(String.format(Locale.ROOT, "robust placement keeps zeros within [fc/%.0f, fc] and poles within "
                + "[fc, %.0f·fc] (common practice, no source)", SPREAD, SPREAD));
        return new DesignResult(request, corners, CrossoverPlanner.limits(request, corners), placement, ideal, rounded,
                idealLoop, roundedLoop, new ArrayList<>(warnings), rules);
    }

    /** The optimisation: variables, bounds, candidate networks and the working-set objective. */
    private static final class Problem {
        final DesignRequest request;
        final EnvelopeSetup setup;
        final Placement start;
        final int zeros;
        final double[] lower;
        final double[] upper;
        final double gainAtCrossover;
        final double ctrNominal;
        long evaluations;
        private List<double[]> points = List.of();
        private LoopEngine.StageSide[] stages = new LoopEngine.StageSide[0];

        Problem(DesignRequest request, EnvelopeSetup setup, List<Corner> corners, Placement start) {
            this.request = request;
            this.setup = setup;
            this.start = start;
            this.zeros = start.zerosHz().size();
            int n = zeros + start.polesHz().size();
            double fc = start.crossoverHz();
            double cap = Math.min(request.stage().fswHz() / 2, SPREAD * fc);
            if (request.feedback().amplifier() == AmplifierKind.SHUNT_OPTO) {
                cap = Math.min(cap, optoCeilingHz(request));
            }
            lower = new double[n];
            upper = new double[n];
            for (int j = 0; j < n; j++) {
                boolean zero = j < zeros;
                lower[j] = Math.log(zero ? fc / SPREAD : fc * 1.001);
                upper[j] = Math.log(zero ? fc / 1.001 : Math.max(cap, fc * 1.01));
            }
            ctrNominal = request.feedback().amplifier() == AmplifierKind.SHUNT_OPTO
                    ? request.feedback().ctr().typical() : Double.NaN;
            double stageGain = 0;
            for (Corner c : corners) {
                double g = c.stage().control().magnitude(fc) * request.control().fbGain();
                if (!Double.isNaN(c.ctr())) {
                    g *= c.ctr() / ctrNominal;
                }
                stageGain = Math.max(stageGain, g);
            }
            gainAtCrossover = 1 / stageGain;
        }

        /** The optocoupler's own pole at the spec's pull-up, Hz (the designer's ceiling). */
        private static double optoCeilingHz(DesignRequest request) {
            double c = request.feedback().optoCapacitance();
            double r = request.feedback().rPullup();
            return c > 0 && r > 0 ? 1 / (2 * Math.PI * r * c) : Double.POSITIVE_INFINITY;
        }

        double[] startPoint() {
            double[] x = new double[lower.length];
            for (int j = 0; j < x.length; j++) {
                double f = j < zeros ? start.zerosHz().get(j) : start.polesHz().get(j - zeros);
                x[j] = Math.max(lower[j], Math.min(upper[j], Math.log(f)));
            }
            return x;
        }

        Placement placement(double[] x) {
            List<Double> z = new ArrayList<>();
            List<Double> p = new ArrayList<>();
            for (int j = 0; j < x.length; j++) {
                (j < zeros ? z : p).add(Math.exp(x[j]));
            }
            z.sort(null);
            p.sort(null);
            double fc = start.crossoverHz();
            double boost = 0;
            for (double f : z) {
                boost += Math.toDegrees(Math.atan(fc / f));
            }
            for (double f : p) {
                boost -= Math.toDegrees(Math.atan(fc / f));
            }
            return new Placement("robust", start.type(), fc, boost, z, p);
        }

        /** The ideal network at {@code x}, or null when the network refuses it. */
        CompensatorNetwork network(double[] x) {
            try {
                return NetworkSynthesizer.synthesize(request, placement(x), gainAtCrossover, ctrNominal).network();
            } catch (IllegalArgumentException e) {
                return null;
            }
        }

        void useWorkingSet(List<double[]> set) {
            points = List.copyOf(set);
            LoopEngine engine = new LoopEngine(setup);
            stages = new LoopEngine.StageSide[points.size()];
            for (int s = 0; s < points.size(); s++) {
                stages[s] = engine.fillStage(engine.newStageSide(), points.get(s), -1);
            }
        }

        /** Smallest penalised phase margin over the working set and the corners. */
        double objective(double[] x) {
            CompensatorNetwork n = network(x);
            if (n == null) {
                return -NO_CROSSOVER_DEG;
            }
            LoopEngine engine = new LoopEngine(setup.withNetwork(n));
            LoopEngine.NetworkSide side = engine.newNetworkSide();
            double worst = Double.POSITIVE_INFINITY;
            double gmTarget = request.targets().gainMarginDb();
            for (int s = 0; s < points.size(); s++) {
                engine.fillNetwork(side, points.get(s));
                for (int c = 0; c < setup.corners().size(); c++) {
                    LoopFigures f = engine.figures(stages[s], side, c);
                    if (f == null) {
                        continue;
                    }
                    double v = f.hasCrossover() ? f.phaseMarginDeg() : -NO_CROSSOVER_DEG;
                    v -= GM_PENALTY_DEG_PER_DB * Math.max(0, gmTarget - f.gainMarginMagnitudeDb());
                    worst = Math.min(worst, v);
                }
            }
            evaluations += engine.loopsScanned();
            return Math.max(worst, -NO_CROSSOVER_DEG);
        }

        /** BOBYQA from {@code x0}; the best point seen is returned whatever the optimiser reports. */
        double[] maximise(double[] x0) {
            double[][] best = {x0.clone()};
            double[] bestValue = {objective(x0)};
            ObjectiveFunction f = new ObjectiveFunction(x -> {
                double v = objective(x);
                if (v > bestValue[0]) {
                    bestValue[0] = v;
                    best[0] = x.clone();
                }
                return v;
            });
            double radius = 0.25;
            for (int j = 0; j < lower.length; j++) {
                radius = Math.min(radius, (upper[j] - lower[j]) / 2.5);
            }
            try {
                new BOBYQAOptimizer(2 * lower.length + 1, radius, 1e-4).optimize(new MaxEval(EVALUATIONS_PER_ROUND),
                        f, GoalType.MAXIMIZE, new InitialGuess(x0.clone()), new SimpleBounds(lower, upper));
            } catch (MathIllegalStateException | MathIllegalArgumentException e) {
                // budget spent or a degenerate model: the best point seen stands
            }
            return best[0];
        }
    }
}
