package org.flyloop.cli.output;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.Map;
import org.flyloop.design.CornerResult;
import org.flyloop.design.CrossoverLimit;
import org.flyloop.design.DesignResult;
import org.flyloop.design.Placement;
import org.flyloop.network.CompensatorNetwork;
import org.flyloop.network.ShuntOptoNetwork;
import org.flyloop.spec.TargetsSpec;

/**
 * A design as one JSON document, SI units (ohms, farads, siemens, hertz, seconds; degrees and
 * decibels where the key says so):
 * <pre>
 * {"network": {"amplifier", "type", "kind", "placement", "boost_deg", "zeros_hz", "poles_hz"},
 *  "parts": {name: value}, "ideal_parts": {name: value},
 *  "crossover_target_hz", "limits": [{"name", "hz", "basis"}],
 *  "points": [...], "worst": {...},
 *  "targets": {"phase_margin_deg", "gain_margin_db", "crossover_hz"},
 *  "targets_met", "warnings": [...], "rules_of_thumb": [...]}
 * </pre>
 * {@code parts} are the built (rounded) values, {@code ideal_parts} the exact ones;
 * {@code network.type} is the type of the built network (a shunt-opto network pushed onto its
 * fast-lane floor is built as type 1 even when type 2 was placed); {@code crossover_target_hz}
 * is the crossover the gain was set for; {@code targets.crossover_hz} is null when the spec leaves
 * the crossover to the designer. Points and worst: see {@link MarginJson}. Non-finite numbers are
 * null.
 */
public final class DesignJson {

    private static final ObjectMapper MAPPER = new ObjectMapper();

    private DesignJson() {
    }

    /** The document as a tree, for commands that add to it or write it elsewhere. */
    public static ObjectNode of(DesignResult result) {
        ObjectNode root = MAPPER.createObjectNode();
        Placement p = result.placement();
        ObjectNode network = root.putObject("network");
        network.put("amplifier", result.request().feedback().amplifier().specName());
        network.put("type", networkType(result.rounded()));
        network.put("kind", result.rounded().kind().specName());
        network.put("placement", p.method());
        MarginJson.put(network, "boost_deg", p.boostDeg());
        ArrayNode zeros = network.putArray("zeros_hz");
        p.zerosHz().forEach(zeros::add);
        ArrayNode poles = network.putArray("poles_hz");
        p.polesHz().forEach(poles::add);
        root.set("parts", parts(result.rounded()));
        root.set("ideal_parts", parts(result.ideal()));
        MarginJson.put(root, "crossover_target_hz", p.crossoverHz());
        ArrayNode limits = root.putArray("limits");
        for (CrossoverLimit l : result.limits()) {
            ObjectNode o = limits.addObject();
            o.put("name", l.name());
            MarginJson.put(o, "hz", l.frequencyHz());
            o.put("basis", l.basis());
        }
        ArrayNode points = root.putArray("points");
        for (CornerResult r : result.roundedLoop().results()) {
            points.add(MarginJson.point(r));
        }
        root.set("worst", MarginJson.worst(result.roundedLoop()));
        TargetsSpec t = result.request().targets();
        ObjectNode targets = root.putObject("targets");
        MarginJson.put(targets, "phase_margin_deg", t.phaseMarginDeg());
        MarginJson.put(targets, "gain_margin_db", t.gainMarginDb());
        MarginJson.put(targets, "crossover_hz", t.crossoverHz());
        root.put("targets_met", result.targetsMet());
        ArrayNode warnings = root.putArray("warnings");
        DesignWarnings.of(result).forEach(warnings::add);
        ArrayNode rules = root.putArray("rules_of_thumb");
        result.rulesOfThumb().forEach(rules::add);
        return root;
    }

    /** The document on one line, followed by a newline. */
    public static String render(DesignResult result) {
        try {
            return MAPPER.writeValueAsString(of(result)) + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("a tree of numbers and text always serialises", e);
        }
    }

    /** The type (1, 2 or 3) of a built network: its pole-zero pairs besides the integrator, plus one. */
    static int networkType(CompensatorNetwork n) {
        return switch (n.kind()) {
            case OPAMP_TYPE1 -> 1;
            case OPAMP_TYPE2, OTA -> 2;
            case OPAMP_TYPE3 -> 3;
            case SHUNT_OPTO -> ((ShuntOptoNetwork) n).type();
        };
    }

    private static ObjectNode parts(CompensatorNetwork n) {
        ObjectNode o = MAPPER.createObjectNode();
        for (Map.Entry<String, Double> e : n.parts().entrySet()) {
            MarginJson.put(o, e.getKey(), e.getValue());
        }
        return o;
    }
}
