package org.flyloop.design;

import java.util.List;
import org.flyloop.linear.TransferFunction;
import org.flyloop.loop.LoopMargins;

/**
 * The loop at one corner.
 *
 * @param corner  the corner
 * @param loop    T(s) there
 * @param margins every crossover and margin
 * @param misses  the targets missed here, one line each; empty when all are met
 */
public record CornerResult(Corner corner, TransferFunction loop, LoopMargins margins, List<String> misses) {

    public CornerResult {
        misses = List.copyOf(misses);
    }

    public boolean meetsTargets() {
        return misses.isEmpty();
    }
}
