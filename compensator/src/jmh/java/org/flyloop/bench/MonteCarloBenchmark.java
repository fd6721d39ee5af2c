package org.flyloop.bench;

import java.util.concurrent.TimeUnit;
import org.flyloop.envelope.EnvelopeSetup;
import org.flyloop.envelope.MonteCarloAnalysis;
import org.flyloop.envelope.MonteCarloResult;
import org.flyloop.spec.TolerancesSpec;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Monte Carlo: 10,000 samples × 400 grid points on two threads, at one corner or at all nine,
 * with the compensator's parts toleranced alone or together with the stage (each sample then
 * rebuilds the operating point and stage model of every corner).
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2, time = 2)
@Measurement(iterations = 3, time = 4)
@Fork(1)
public class MonteCarloBenchmark {

    static final int SAMPLES = 10_000;

    @Param({"parts", "all"})
    public String tolerances;

    @Param({"1", "9"})
    public int corners;

    @Param({"2"})
    public int threads;

    private EnvelopeSetup setup;

    @Setup
    public void setUp() {
        TolerancesSpec t = tolerances.equals("all") ? BenchScenarios.everything() : BenchScenarios.partsOnly();
        var request = BenchScenarios.nineCorners();
        if (corners == 1) {
            var s = request.stage();
            request = request.withStage(new org.flyloop.spec.StageSpec(org.flyloop.spec.ValueRange.of(36), s.vout(),
                    org.flyloop.spec.ValueRange.of(4), s.fswHz(), s.lm(), s.turns(), s.cout(), s.esr(),
                    s.rectifierDrop(), s.switchResistance()));
        }
        setup = EnvelopeSetup.forMonteCarlo(request, BenchScenarios.designedNetwork(), t, 400);
        if (setup.corners().size() != corners) {
            throw new IllegalStateException("expected " + corners + " corners, got " + setup.corners().size());
        }
    }

    @Benchmark
    public MonteCarloResult run() {
        return MonteCarloAnalysis.run(setup, SAMPLES, 1, threads, done -> { });
    }
}
