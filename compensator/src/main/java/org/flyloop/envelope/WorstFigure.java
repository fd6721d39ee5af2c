package org.flyloop.envelope;

import java.util.Map;

/**
 * The worst value of one figure over the envelope and the tolerance box, and where it occurs.
 *
 * @param figure     which figure
 * @param value      its value (° for the phase margin, dB for the gain margin, Hz for crossovers);
 *                   NaN when no corner and tolerance set gave one (e.g. no crossover anywhere)
 * @param corner     the corner, null with a NaN value
 * @param deviations the relative deviation of each toleranced quantity there, by name
 */
public record WorstFigure(EnvelopeFigure figure, double value, EnvelopeCorner corner, Map<String, Double> deviations) {

    public WorstFigure {
        deviations = deviations == null ? Map.of() : java.util.Collections.unmodifiableMap(
                new java.util.LinkedHashMap<>(deviations));
    }

    /** True when some corner produced a value. */
    public boolean isPresent() {
        return corner != null;
    }
}
