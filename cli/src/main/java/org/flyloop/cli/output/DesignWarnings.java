package org.flyloop.cli.output;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import org.flyloop.design.DesignResult;
import org.flyloop.network.PartNames;

/**
 * The warnings a design report prints: the designer's own, plus a note when the spec gives parts
 * under {@code feedback.parts} that the design replaced, so nobody mistakes the designed values
 * for an analysis of the given ones.
 */
public final class DesignWarnings {

    /** Given parts the designer takes as they are. */
    private static final Set<String> USED_BY_DESIGNER = Set.of(PartNames.R_BIAS);
    /** A given and a built value this close are the same part (far below any part tolerance). */
    private static final double SAME_PART = 1e-6;

    private DesignWarnings() {
    }

    /**
     * The designer's warnings followed by a note naming the given parts the design replaced, if
     * any (given parts equal to the built ones need no note).
     */
    public static List<String> of(DesignResult result) {
        List<String> out = new ArrayList<>(result.warnings());
        Map<String, Double> given = result.request().feedback().parts();
        Map<String, Double> built = result.rounded().parts();
        Set<String> differing = new TreeSet<>();
        for (Map.Entry<String, Double> e : given.entrySet()) {
            if (USED_BY_DESIGNER.contains(e.getKey())) {
                continue;
            }
            Double b = built.get(e.getKey());
            if (b == null || Math.abs(b - e.getValue()) > SAME_PART * Math.max(Math.abs(b), Math.abs(e.getValue()))) {
                differing.add(e.getKey());
            }
        }
        if (!differing.isEmpty()) {
            out.add("feedback.parts: the design picks other values for " + String.join(", ", differing)
                    + "; design does not analyse the given parts");
        }
        return out;
    }
}
