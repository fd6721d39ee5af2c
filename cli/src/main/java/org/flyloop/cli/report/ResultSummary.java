package org.flyloop.cli.report;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.Map;
import org.flyloop.design.CornerResult;
import org.flyloop.design.DesignResult;
import org.flyloop.loop.GainCrossover;
import org.flyloop.loop.PhaseCrossover;

/**
 * The design as JSON, for {@code data/result.json} when the caller has no fuller result document:
 * verdict, parts (exact and standard), and every corner's crossovers and margins. SI units;
 * non-finite numbers are written as null.
 */
final class ResultSummary {

    private ResultSummary() {
    }

    static JsonNode of(ReportInput in) {
        JsonNodeFactory f = JsonNodeFactory.instance;
        DesignResult r = in.design();
        ObjectNode root = f.objectNode();
        root.put("spec", in.specName());
        root.put("targets_met", r.targetsMet());
        root.put("network", r.rounded().kind().specName());
        root.put("type", r.placement().type());
        root.put("placement", r.placement().method());
        number(root, "crossover_planned_hz", r.placement().crossoverHz());
        root.set("parts_exact", parts(r.ideal().parts()));
        root.set("parts_standard", parts(r.rounded().parts()));
        ArrayNode corners = root.putArray("corners");
        for (CornerResult c : r.roundedLoop().results()) {
            ObjectNode o = corners.addObject();
            number(o, "vin_v", c.corner().point().vin());
            number(o, "iout_a", c.corner().point().iout());
            number(o, "ctr", c.corner().ctr());
            o.put("mode", c.corner().point().mode().label());
            number(o, "crossover_hz", c.margins().crossoverHz());
            number(o, "phase_margin_deg", c.margins().phaseMarginDeg());
            number(o, "gain_margin_db", c.margins().gainMarginDb());
            o.put("closed_loop", c.margins().verdict().label());
            ArrayNode gains = o.putArray("gain_crossovers");
            for (GainCrossover g : c.margins().gainCrossovers()) {
                ObjectNode x = gains.addObject();
                number(x, "frequency_hz", g.frequencyHz());
                number(x, "phase_margin_deg", g.phaseMarginDeg());
            }
            ArrayNode phases = o.putArray("phase_crossovers");
            for (PhaseCrossover p : c.margins().phaseCrossovers()) {
                ObjectNode x = phases.addObject();
                number(x, "frequency_hz", p.frequencyHz());
                number(x, "gain_margin_db", p.gainMarginDb());
            }
            ArrayNode misses = o.putArray("misses");
            c.misses().forEach(misses::add);
        }
        ArrayNode warnings = root.putArray("warnings");
        r.warnings().forEach(warnings::add);
        in.notes().forEach(warnings::add);
        return root;
    }

    private static ObjectNode parts(Map<String, Double> parts) {
        ObjectNode o = JsonNodeFactory.instance.objectNode();
        parts.forEach((k, v) -> number(o, k, v));
        return o;
    }

    private static void number(ObjectNode o, String key, double v) {
        if (Double.isFinite(v)) {
            o.put(key, v);
        } else {
            o.putNull(key);
        }
    }
}
