package org.flyloop.cli.output;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.Map;
import org.flyloop.envelope.EnvelopeCorner;
import org.flyloop.envelope.EnvelopeFigure;
import org.flyloop.envelope.LoadSetting;
import org.flyloop.envelope.WorstCase;
import org.flyloop.envelope.WorstFigure;
import org.flyloop.spec.TargetsSpec;

/**
 * The tolerance worst case as JSON:
 * <pre>
 * {"method", "parameters": [names], "loops", "targets_met", "misses": [...],
 *  "phase_margin": {"deg", "at", "deviations"}, "gain_margin": {"db", "at", "deviations"},
 *  "lowest_crossover": {"hz", "at", "deviations"}, "highest_crossover": {"hz", "at", "deviations"}}
 * </pre>
 * {@code at} is the corner ({@link #corner}); {@code deviations} maps each toleranced quantity
 * ("stage.lm", "parts.r_zero", "ctr") to its relative deviation there (−0.2 for −20 %). A figure no
 * corner produced (no crossover anywhere) has null value, at and deviations; a phase margin of a
 * loop without crossover is null with its corner given.
 */
public final class EnvelopeJson {

    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

    private EnvelopeJson() {
    }

    /** The worst-case object. */
    public static ObjectNode worstCase(WorstCase w, TargetsSpec targets) {
        ObjectNode o = NODES.objectNode();
        o.put("method", w.method());
        ArrayNode names = o.putArray("parameters");
        w.parameters().forEach(names::add);
        o.put("loops", w.loopsAnalysed());
        o.put("targets_met", w.meets(targets));
        ArrayNode misses = o.putArray("misses");
        w.misses(targets).forEach(misses::add);
        o.set("phase_margin", figure(w.of(EnvelopeFigure.PHASE_MARGIN), "deg"));
        o.set("gain_margin", figure(w.of(EnvelopeFigure.GAIN_MARGIN), "db"));
        o.set("lowest_crossover", figure(w.of(EnvelopeFigure.LOWEST_CROSSOVER), "hz"));
        o.set("highest_crossover", figure(w.of(EnvelopeFigure.HIGHEST_CROSSOVER), "hz"));
        return o;
    }

    private static ObjectNode figure(WorstFigure f, String unitKey) {
        ObjectNode o = NODES.objectNode();
        MarginJson.put(o, unitKey, f.value());
        if (!f.isPresent()) {
            o.putNull("at");
            o.putNull("deviations");
            return o;
        }
        o.set("at", corner(f.corner()));
        ObjectNode d = o.putObject("deviations");
        for (Map.Entry<String, Double> e : f.deviations().entrySet()) {
            MarginJson.put(d, e.getKey(), e.getValue());
        }
        return o;
    }

    /**
     * {@code {vin, iout}} with the nominal stage's load, plus {@code ctr} where the corner has one
     * and {@code boundary_factor} for a corner placed beside the CCM/DCM boundary.
     */
    public static ObjectNode corner(EnvelopeCorner c) {
        ObjectNode o = NODES.objectNode();
        MarginJson.put(o, "vin", c.vinV());
        MarginJson.put(o, "iout", c.nominalIoutA());
        if (!Double.isNaN(c.ctr())) {
            MarginJson.put(o, "ctr", c.ctr());
        }
        if (c.load() instanceof LoadSetting.Boundary b) {
            MarginJson.put(o, "boundary_factor", b.factor());
        }
        return o;
    }
}
