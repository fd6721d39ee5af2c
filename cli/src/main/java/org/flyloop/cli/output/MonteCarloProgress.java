package org.flyloop.cli.output;

import java.io.PrintWriter;
import java.util.function.IntConsumer;
import java.util.function.LongSupplier;

/**
 * Progress of a Monte Carlo run on stderr, for a person watching a terminal: nothing during the
 * first {@value #QUIET_MS} ms (a short run should not flicker), then one self-overwriting line at
 * most every {@value #EVERY_MS} ms, erased when the run ends. Silent when stderr is not a terminal.
 * Called from the worker threads, hence synchronized.
 */
public final class MonteCarloProgress implements IntConsumer {

    static final long QUIET_MS = 1000;
    static final long EVERY_MS = 200;

    private final PrintWriter err;
    private final int total;
    private final boolean enabled;
    private final LongSupplier clockMs;
    private final long startMs;
    private long lastMs = Long.MIN_VALUE / 2;
    private int width;

    /**
     * @param err     where to write
     * @param total   the number of samples
     * @param enabled false to stay silent (stderr is not a terminal)
     * @param clockMs the time in milliseconds
     */
    public MonteCarloProgress(PrintWriter err, int total, boolean enabled, LongSupplier clockMs) {
        this.err = err;
        this.total = total;
        this.enabled = enabled;
        this.clockMs = clockMs;
        this.startMs = clockMs.getAsLong();
    }

    /** Progress on the process's stderr when it is a terminal ({@code System.console() != null}). */
    public static MonteCarloProgress forTerminal(PrintWriter err, int total) {
        return new MonteCarloProgress(err, total, System.console() != null, System::currentTimeMillis);
    }

    @Override
    public synchronized void accept(int done) {
        if (!enabled) {
            return;
        }
        long now = clockMs.getAsLong();
        if (now - startMs < QUIET_MS || now - lastMs < EVERY_MS) {
            return;
        }
        lastMs = now;
        String line = String.format(java.util.Locale.ROOT, "Monte Carlo: %d of %d samples (%d %%)", done, total,
                100L * done / total);
        width = Math.max(width, line.length());
        err.print("\r" + line);
        err.flush();
    }

    /** Erases the progress line, if one was written. */
    public synchronized void finish() {
        if (width > 0) {
            err.print("\r" + " ".repeat(width) + "\r");
            err.flush();
            width = 0;
        }
    }
}
