package org.flyloop.cli.output;

/** The caution printed after human-readable results. */
public final class SafetyNotice {

    /** One line, so that it survives being piped through line-oriented tools. */
    public static final String ONE_LINE = "Caution: offline flybacks carry lethal voltages. These are calculated values:"
            + " keep the isolation barrier, verify the loop on the bench with a frequency-response analyzer,"
            + " and follow applicable safety standards, local codes and licensed practice.";

    private SafetyNotice() {
    }
}
