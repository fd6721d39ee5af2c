package org.flyloop.envelope;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.IntConsumer;
import org.flyloop.spec.TargetsSpec;

/**
 * Monte Carlo over the tolerance box: each sample draws every toleranced quantity uniformly within
 * its band (independently) and evaluates the loop at every corner.
 *
 * <p>Reproducible and thread-count independent: sample i draws from its own stream
 * ({@link SampleSeeds}) and writes only its own slots of the result arrays, and every summary is
 * computed from those arrays after all samples are in, so a run on any number of threads gives
 * bit-for-bit the result of the sequential run with the same seed.
 *
 * <p>When no stage quantity is toleranced the stage side is built once and shared (read-only) by
 * all threads; otherwise each sample rebuilds the operating points and stage models of every
 * corner.
 */
public final class MonteCarloAnalysis {

    /** Largest number of samples accepted (memory: three figures per corner per sample). */
    public static final int MAX_SAMPLES = 200_000;
    private static final int CHUNK = 64;

    private MonteCarloAnalysis() {
    }

    /** A run on as many threads as there are processors, without progress reports. */
    public static MonteCarloResult run(EnvelopeSetup setup, int samples, long seed) {
        return run(setup, samples, seed, Runtime.getRuntime().availableProcessors(), done -> { });
    }

    /**
     * Runs {@code samples} samples.
     *
     * @param threads  worker threads (1: in the calling thread)
     * @param progress called now and then with the number of samples done, from any worker thread
     */
    public static MonteCarloResult run(EnvelopeSetup setup, int samples, long seed, int threads, IntConsumer progress) {
        if (samples < 1 || samples > MAX_SAMPLES) {
            throw new IllegalArgumentException("the number of Monte Carlo samples must lie between 1 and "
                    + MAX_SAMPLES + ", got " + samples);
        }
        if (threads < 1) {
            throw new IllegalArgumentException("at least one thread is needed, got " + threads);
        }
        int corners = setup.corners().size();
        SampleTable out = new SampleTable(corners, samples);
        boolean stageVaries = setup.box().stageCount() > 0;
        LoopEngine.StageSide shared = null;
        if (!stageVaries) {
            LoopEngine e = new LoopEngine(setup);
            shared = e.fillStage(e.newStageSide(), new double[setup.box().size()], -1);
        }
        AtomicInteger next = new AtomicInteger();
        AtomicInteger done = new AtomicInteger();
        LoopEngine.StageSide sharedStage = shared;
        Runnable worker = () -> {
            LoopEngine engine = new LoopEngine(setup);
            LoopEngine.StageSide stage = stageVaries ? engine.newStageSide() : sharedStage;
            LoopEngine.NetworkSide network = engine.newNetworkSide();
            double[] u = new double[setup.box().size()];
            for (int start = next.getAndAdd(CHUNK); start < samples; start = next.getAndAdd(CHUNK)) {
                int end = Math.min(samples, start + CHUNK);
                for (int i = start; i < end; i++) {
                    sample(engine, stage, network, u, seed, i, stageVaries, out);
                }
                progress.accept(done.addAndGet(end - start));
            }
        };
        if (threads == 1) {
            worker.run();
        } else {
            runOn(threads, worker);
        }
        return summarise(setup, samples, seed, out);
    }

    private static void runOn(int threads, Runnable worker) {
        ExecutorService pool = Executors.newFixedThreadPool(threads, r -> {
            Thread t = new Thread(r, "flyloop-monte-carlo");
            t.setDaemon(true);
            return t;
        });
        try {
            List<Future<?>> futures = new ArrayList<>();
            for (int t = 0; t < threads; t++) {
                futures.add(pool.submit(worker));
            }
            for (Future<?> f : futures) {
                f.get();
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("Monte Carlo run interrupted", e);
        } catch (ExecutionException e) {
            if (e.getCause() instanceof RuntimeException r) {
                throw r;
            }
            throw new IllegalStateException(e.getCause());
        } finally {
            pool.shutdownNow();
        }
    }

    /** Draws sample {@code i} and stores its figures at every corner. */
    private static void sample(LoopEngine engine, LoopEngine.StageSide stage, LoopEngine.NetworkSide network,
                               double[] u, long seed, int i, boolean stageVaries, SampleTable out) {
        SplittableRandom random = SampleSeeds.stream(seed, i);
        for (int j = 0; j < u.length; j++) {
            u[j] = random.nextDouble();
        }
        if (stageVaries) {
            engine.fillStage(stage, u, -1);
        }
        engine.fillNetwork(network, u);
        TargetsSpec targets = engine.setup().request().targets();
        for (int c = 0; c < out.pm.length; c++) {
            LoopFigures f = engine.figures(stage, network, c);
            if (f == null) {
                out.pm[c][i] = Double.NaN;
                out.gm[c][i] = Double.NaN;
                out.fc[c][i] = Double.NaN;
                out.failed[c][i] = true;
            } else {
                out.pm[c][i] = f.rankedPhaseMarginDeg();
                out.gm[c][i] = f.gainMarginMagnitudeDb();
                out.fc[c][i] = f.crossoverHz();
                out.failed[c][i] = !f.meets(targets);
            }
        }
    }

    private static MonteCarloResult summarise(EnvelopeSetup setup, int n, long seed, SampleTable out) {
        int corners = out.pm.length;
        double[] worstPm = new double[n];
        double[] worstGm = new double[n];
        int failing = 0;
        for (int i = 0; i < n; i++) {
            double pm = Double.NaN;
            double gm = Double.NaN;
            boolean failed = false;
            for (int c = 0; c < corners; c++) {
                pm = minIgnoringNaN(pm, out.pm[c][i]);
                gm = minIgnoringNaN(gm, out.gm[c][i]);
                failed |= out.failed[c][i];
            }
            worstPm[i] = pm;
            worstGm[i] = gm;
            failing += failed ? 1 : 0;
        }
        List<CornerDistribution> perCorner = new ArrayList<>();
        for (int c = 0; c < corners; c++) {
            int f = 0;
            for (int i = 0; i < n; i++) {
                f += out.failed[c][i] ? 1 : 0;
            }
            perCorner.add(new CornerDistribution(setup.corners().get(c), Distribution.of(out.pm[c]),
                    Distribution.of(out.gm[c]), Distribution.of(out.fc[c]), (double) f / n));
        }
        List<String> names = setup.box().parameters().stream().map(ToleranceParameter::name).toList();
        return new MonteCarloResult(n, seed, names, perCorner, Distribution.of(worstPm), Distribution.of(worstGm),
                (double) failing / n, out.pm, out.gm, out.fc);
    }

    private static double minIgnoringNaN(double a, double b) {
        if (Double.isNaN(a)) {
            return b;
        }
        return Double.isNaN(b) ? a : Math.min(a, b);
    }

    /** The per-corner, per-sample figures; each slot is written by exactly one sample. */
    private static final class SampleTable {
        final double[][] pm;
        final double[][] gm;
        final double[][] fc;
        final boolean[][] failed;

        SampleTable(int corners, int samples) {
            pm = new double[corners][samples];
            gm = new double[corners][samples];
            fc = new double[corners][samples];
            failed = new boolean[corners][samples];
        }
    }
}
