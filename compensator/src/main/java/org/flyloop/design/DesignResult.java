package org.flyloop.design;

import java.util.List;
import org.flyloop.network.CompensatorNetwork;

/**
 * What the designer produced: the placement, the network with ideal and with rounded parts, both
 * analysed at every corner, and every warning.
 *
 * @param request      what was asked
 * @param corners      the corners analysed
 * @param limits       the crossover bounds that applied
 * @param placement    the chosen zeros and poles
 * @param ideal        the network with exact part values
 * @param rounded      the network with parts on their preferred series (what gets built)
 * @param idealLoop    the ideal network at every corner
 * @param roundedLoop  the rounded network at every corner
 * @param warnings     design warnings, one line each
 * @param rulesOfThumb the rules of thumb the design used, each named as common practice
 */
public record DesignResult(DesignRequest request, List<Corner> corners, List<CrossoverLimit> limits,
                           Placement placement, CompensatorNetwork ideal, CompensatorNetwork rounded,
                           LoopEvaluation idealLoop, LoopEvaluation roundedLoop, List<String> warnings,
                           List<String> rulesOfThumb) {

    public DesignResult {
        corners = List.copyOf(corners);
        limits = List.copyOf(limits);
        warnings = List.copyOf(warnings);
        rulesOfThumb = List.copyOf(rulesOfThumb);
    }

    /** True when the rounded network meets every target at every corner. */
    public boolean targetsMet() {
        return roundedLoop.meetsTargets();
    }
}
