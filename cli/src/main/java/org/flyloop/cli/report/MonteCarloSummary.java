package org.flyloop.cli.report;

import java.util.List;

/**
 * What a Monte Carlo run found, as plain data for the report.
 *
 * @param runs               number of random designs evaluated
 * @param seed               seed of the random stream, so the run can be repeated
 * @param runsMeetingTargets how many met every target
 * @param distributions      spread of each figure of merit
 * @param notes              further remarks, one line each
 */
public record MonteCarloSummary(int runs, long seed, int runsMeetingTargets, List<Distribution> distributions,
                                List<String> notes) {

    public MonteCarloSummary {
        if (runs < 0 || runsMeetingTargets < 0 || runsMeetingTargets > runs) {
            throw new IllegalArgumentException("need 0 <= runs meeting targets <= runs");
        }
        distributions = List.copyOf(distributions);
        notes = List.copyOf(notes);
    }

    /** Fraction of runs that met every target (NaN with no runs). */
    public double yield() {
        return runs == 0 ? Double.NaN : (double) runsMeetingTargets / runs;
    }

    /**
     * The spread of one figure of merit over the runs.
     *
     * @param quantity e.g. "phase margin"
     * @param unit     e.g. "°"
     * @param min      smallest value
     * @param p01      1st percentile
     * @param median   median
     * @param p99      99th percentile
     * @param max      largest value
     */
    public record Distribution(String quantity, String unit, double min, double p01, double median, double p99,
                               double max) {
    }
}
