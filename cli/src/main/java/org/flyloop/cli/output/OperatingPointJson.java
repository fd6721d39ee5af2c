package org.flyloop.cli.output;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import org.flyloop.stage.ConductionMode;
import org.flyloop.stage.OperatingPoint;

/**
 * Operating points as JSON: {@code {"points":[{...}, ...]}}, SI units, snake_case keys.
 * {@code duty2} is null in CCM (not an independent interval there); any non-finite number is
 * written as null so the output stays standard JSON.
 */
public final class OperatingPointJson {

    private static final ObjectMapper MAPPER = new ObjectMapper();

    private OperatingPointJson() {
    }

    /** The JSON document on one line, followed by a newline. */
    public static String render(List<OperatingPoint> points) {
        ObjectNode root = MAPPER.createObjectNode();
        ArrayNode list = root.putArray("points");
        for (OperatingPoint p : points) {
            ObjectNode o = list.addObject();
            put(o, "vin", p.vin());
            put(o, "iout", p.iout());
            put(o, "vout", p.vout());
            o.put("mode", p.mode().label());
            put(o, "duty", p.duty());
            put(o, "duty2", p.mode() == ConductionMode.CCM ? Double.NaN : p.duty2());
            put(o, "duty3", p.duty3());
            put(o, "ipk", p.ipk());
            put(o, "ivalley", p.ivalley());
            put(o, "im_avg", p.imAvg());
            put(o, "isec_pk", p.isecPk());
            put(o, "isw_rms", p.iswRms());
            put(o, "irect_rms", p.irectRms());
            put(o, "iin_avg", p.iinAvg());
            put(o, "iout_boundary", p.ioutBoundary());
            put(o, "vsw_max", p.vswMax());
        }
        try {
            return MAPPER.writeValueAsString(root) + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("a tree of numbers and text always serialises", e);
        }
    }

    private static void put(ObjectNode o, String key, double v) {
        if (Double.isFinite(v)) {
            o.put(key, v);
        } else {
            o.putNull(key);
        }
    }
}
