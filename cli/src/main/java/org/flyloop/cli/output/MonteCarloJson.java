package org.flyloop.cli.output;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.flyloop.envelope.CornerDistribution;
import org.flyloop.envelope.Distribution;
import org.flyloop.envelope.MonteCarloResult;

/**
 * A Monte Carlo run as JSON:
 * <pre>
 * {"n", "seed", "parameters": [names], "fraction_failing",
 *  "pm_p01", "pm_p50", "pm_p99", "pm_min", "gm_p01", "gm_p50", "gm_p99", "gm_min",
 *  "corners": [{"vin", "iout", ["ctr",] ["boundary_factor",] "pm_p01", "pm_p50", "pm_p99",
 *               "gm_p01", "gm_p50", "gm_p99", "fc_p01", "fc_p50", "fc_p99", "fraction_failing"}]}
 * </pre>
 * The top-level pm and gm figures are per sample the worst over the corners (what one built unit
 * achieves over its whole envelope); gm is the magnitude of the gain margin, the quantity its
 * target applies to. Percentiles are Hyndman and Fan's definition 7. A figure without a finite
 * value (no phase crossover: unlimited gain margin) is null.
 */
public final class MonteCarloJson {

    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

    private MonteCarloJson() {
    }

    /** The Monte Carlo object. */
    public static ObjectNode of(MonteCarloResult r) {
        ObjectNode o = NODES.objectNode();
        o.put("n", r.samples());
        o.put("seed", r.seed());
        ArrayNode names = o.putArray("parameters");
        r.parameters().forEach(names::add);
        MarginJson.put(o, "fraction_failing", r.fractionFailing());
        percentiles(o, "pm", r.worstPhaseMarginDeg());
        MarginJson.put(o, "pm_min", r.worstPhaseMarginDeg().min());
        percentiles(o, "gm", r.worstGainMarginDb());
        MarginJson.put(o, "gm_min", r.worstGainMarginDb().min());
        ArrayNode corners = o.putArray("corners");
        for (CornerDistribution c : r.corners()) {
            ObjectNode n = EnvelopeJson.corner(c.corner());
            percentiles(n, "pm", c.phaseMarginDeg());
            percentiles(n, "gm", c.gainMarginDb());
            percentiles(n, "fc", c.crossoverHz());
            MarginJson.put(n, "fraction_failing", c.fractionFailing());
            corners.add(n);
        }
        return o;
    }

    private static void percentiles(ObjectNode o, String prefix, Distribution d) {
        MarginJson.put(o, prefix + "_p01", d.p01());
        MarginJson.put(o, prefix + "_p50", d.p50());
        MarginJson.put(o, prefix + "_p99", d.p99());
    }
}
