package org.flyloop.bench;

import java.util.List;
import java.util.concurrent.TimeUnit;
import org.flyloop.linear.Root;
import org.flyloop.linear.TransferFunction;
import org.flyloop.network.OpAmpType3Network;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Loop-gain evaluation, T(jω) = k·Gc(jω)·G(jω), over a 500-point logarithmic grid: a third-order
 * compensator (op-amp type 3: integrator and two poles, two zeros) times a fourth-order stage (the
 * Lm–Cout double pole, a sampling double pole at fsw/2, the ESR zero and the RHP zero). Scores are
 * frequency points per second, single thread.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@Warmup(iterations = 2, time = 1)
@Measurement(iterations = 3, time = 2)
@Fork(1)
public class LoopGainBenchmark {

    static final int POINTS = 500;

    private final double[] frequenciesHz = new double[POINTS];
    private final double[] re = new double[POINTS];
    private final double[] im = new double[POINTS];
    private final double[] a = new double[2];
    private final double[] b = new double[2];
    private TransferFunction network;
    private TransferFunction stage;
    private TransferFunction loop;

    @Setup
    public void setUp() {
        network = OpAmpType3Network.ideal(38.3e3, 10e3, 4.75e3, 100e-9, 1.8e-9, 953, 12e-9).transferFunction();
        stage = TransferFunction.of(36, 0, List.of(Root.rightHalfPlaneAtHz(17.5e3), Root.realAtHz(3.6e3)),
                List.of(Root.pairAtHz(325, 3.7), Root.pairAtHz(50e3, 0.9)));
        loop = network.times(stage);
        for (int i = 0; i < POINTS; i++) {
            frequenciesHz[i] = 0.1 * Math.pow(50e3 / 0.1, (double) i / (POINTS - 1));
        }
    }

    /** Each factor evaluated without allocation, then multiplied: what the envelope sweeps do. */
    @Benchmark
    @OperationsPerInvocation(POINTS)
    public double[] separateFactors() {
        for (int i = 0; i < POINTS; i++) {
            network.evaluateInto(frequenciesHz[i], a);
            stage.evaluateInto(frequenciesHz[i], b);
            re[i] = a[0] * b[0] - a[1] * b[1];
            im[i] = a[0] * b[1] + a[1] * b[0];
        }
        return re;
    }

    /** The product built once as one factored function, then evaluated. */
    @Benchmark
    @OperationsPerInvocation(POINTS)
    public double[] combinedFunction() {
        for (int i = 0; i < POINTS; i++) {
            loop.evaluateInto(frequenciesHz[i], a);
            re[i] = a[0];
            im[i] = a[1];
        }
        return im;
    }
}
