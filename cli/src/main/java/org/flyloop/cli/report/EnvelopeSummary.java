package org.flyloop.cli.report;

import java.util.List;

/**
 * What a tolerance-envelope analysis found, as plain data for the report (the analysis itself
 * lives elsewhere; this record only carries its summary).
 *
 * @param method      how the cases were chosen, e.g. "all tolerance extremes (256 cases)"
 * @param cases       number of cases evaluated
 * @param targetsMet  true when every case meets every target
 * @param worstCases  the worst value of each figure of merit and where it occurs
 * @param notes       further remarks, one line each
 */
public record EnvelopeSummary(String method, int cases, boolean targetsMet, List<WorstCase> worstCases,
                              List<String> notes) {

    public EnvelopeSummary {
        worstCases = List.copyOf(worstCases);
        notes = List.copyOf(notes);
    }

    /**
     * The worst value of one figure of merit over the envelope.
     *
     * @param quantity  e.g. "phase margin"
     * @param value     the worst value, in {@code unit}
     * @param unit      e.g. "°", "dB", "Hz"
     * @param condition where it occurs, e.g. "Lm −10 %, Cout −20 %, 90 V / 2 A"
     */
    public record WorstCase(String quantity, double value, String unit, String condition) {
    }
}
