package org.flyloop.cli.output;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.flyloop.design.Corner;
import org.flyloop.design.CornerResult;
import org.flyloop.design.LoopEvaluation;
import org.flyloop.loop.GainCrossover;
import org.flyloop.loop.LoopMargins;
import org.flyloop.loop.PhaseCrossover;

/**
 * The loop margins of analysed corners as JSON objects, SI units and degrees/decibels as the key
 * names say. Every non-finite number becomes null: no gain crossover gives null crossover, phase
 * and delay margins; no phase crossover gives a null gain margin (the gain may rise without
 * limit). {@code ctr} appears only for corners that have one (shunt-opto networks).
 */
public final class MarginJson {

    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

    private MarginJson() {
    }

    /**
     * One corner: {@code vin, iout, mode, [ctr,] crossover_hz, phase_margin_deg, gain_margin_db,
     * delay_margin_s, peak_sensitivity, stable, targets_met, misses, gain_crossovers,
     * phase_crossovers}. Crossovers list every crossing ascending in frequency.
     */
    public static ObjectNode point(CornerResult r) {
        LoopMargins m = r.margins();
        ObjectNode o = NODES.objectNode();
        putCorner(o, r.corner());
        o.put("mode", r.corner().point().mode().label());
        if (!Double.isNaN(r.corner().ctr())) {
            put(o, "ctr", r.corner().ctr());
        }
        put(o, "crossover_hz", m.crossoverHz());
        put(o, "phase_margin_deg", m.phaseMarginDeg());
        put(o, "gain_margin_db", m.gainMarginDb());
        put(o, "delay_margin_s", m.delayMarginS());
        put(o, "peak_sensitivity", m.peakSensitivity());
        o.put("stable", m.isStable());
        o.put("targets_met", r.meetsTargets());
        ArrayNode misses = o.putArray("misses");
        r.misses().forEach(misses::add);
        ArrayNode gains = o.putArray("gain_crossovers");
        for (GainCrossover g : m.gainCrossovers()) {
            ObjectNode c = gains.addObject();
            put(c, "hz", g.frequencyHz());
            put(c, "pm_deg", g.phaseMarginDeg());
        }
        ArrayNode phases = o.putArray("phase_crossovers");
        for (PhaseCrossover p : m.phaseCrossovers()) {
            ObjectNode c = phases.addObject();
            put(c, "hz", p.frequencyHz());
            put(c, "gm_db", p.gainMarginDb());
        }
        return o;
    }

    /**
     * The worst figures over all corners: {@code phase_margin_deg, phase_margin_at, gain_margin_db,
     * gain_margin_at}, each {@code _at} naming the corner's vin and iout (and ctr where it has one).
     * The worst gain margin is the one of smallest magnitude, sign kept.
     */
    public static ObjectNode worst(LoopEvaluation evaluation) {
        ObjectNode o = NODES.objectNode();
        CornerResult pm = evaluation.worstPhaseMargin();
        CornerResult gm = evaluation.worstGainMargin();
        put(o, "phase_margin_deg", pm.margins().phaseMarginDeg());
        o.set("phase_margin_at", where(pm.corner()));
        put(o, "gain_margin_db", gm.margins().gainMarginDb());
        o.set("gain_margin_at", where(gm.corner()));
        return o;
    }

    /** {@code {vin, iout}}, plus {@code ctr} for a corner that has one. */
    public static ObjectNode where(Corner c) {
        ObjectNode o = NODES.objectNode();
        putCorner(o, c);
        if (!Double.isNaN(c.ctr())) {
            put(o, "ctr", c.ctr());
        }
        return o;
    }

    private static void putCorner(ObjectNode o, Corner c) {
        put(o, "vin", c.point().vin());
        put(o, "iout", c.point().iout());
    }

    /** A number, or null when it is not finite (JSON has no NaN or infinity). */
    static void put(ObjectNode o, String key, double v) {
        if (Double.isFinite(v)) {
            o.put(key, v);
        } else {
            o.putNull(key);
        }
    }
}
