package org.flyloop.bench;

import java.util.concurrent.TimeUnit;
import org.flyloop.envelope.EnvelopeSetup;
import org.flyloop.envelope.WorstCase;
import org.flyloop.envelope.WorstCaseAnalysis;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * The envelope check: 9 corners × 16 tolerance vertices (plus the centre) × 500 grid points, every
 * loop's crossover, phase margin and gain margin, in-process. {@code vertices} stops at the
 * vertex enumeration; {@code refined} adds the compass search inside the box.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2, time = 2)
@Measurement(iterations = 3, time = 2)
@Fork(1)
public class EnvelopeBenchmark {

    private EnvelopeSetup setup;

    @Setup
    public void setUp() {
        setup = EnvelopeSetup.forWorstCase(BenchScenarios.nineCorners(), BenchScenarios.designedNetwork(),
                BenchScenarios.fourQuantities(), 500);
        if (setup.corners().size() != 9 || setup.box().size() != 4) {
            throw new IllegalStateException("the scenario must have 9 corners and 4 toleranced quantities");
        }
    }

    @Benchmark
    public WorstCase vertices() {
        return WorstCaseAnalysis.run(setup, false);
    }

    @Benchmark
    public WorstCase refined() {
        return WorstCaseAnalysis.run(setup, true);
    }
}
