package org.flyloop.cli.output;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import org.flyloop.stage.OperatingPoint;
import org.flyloop.stage.model.PoleZero;
import org.flyloop.stage.model.StageTransferFunctions;

/**
 * Operating points with their small-signal summary as JSON: every key of
 * {@link OperatingPointJson}, plus per point the poles and zeros of the control-to-output
 * function, the CCM RHP zero, Ridley's Qp, the slope for Qp = 1 and the model's warnings; and,
 * when files were written, a top-level {@code files} list.
 *
 * <p>Keys added per point: {@code poles} and {@code zeros} (lists of {@code {"hz", "q", "order",
 * "label", "rhp"}}; a complex pair is one entry of order 2), {@code f_rhpz_hz} (null in DCM),
 * {@code qp} and {@code slope_for_qp1} (V/s; both null except in current-mode CCM), and
 * {@code warnings} (a list of text, empty when none). Non-finite numbers are written as null.
 */
public final class StageModelJson {

    private static final ObjectMapper MAPPER = new ObjectMapper();

    private StageModelJson() {
    }

    /**
     * The document on one line, followed by a newline.
     *
     * @param points the operating points
     * @param models the small-signal model of each point, in the same order
     * @param files  one description per file written (path and what it holds), possibly empty
     */
    public static String render(List<OperatingPoint> points, List<StageTransferFunctions> models,
                                List<StageModelFile> files) {
        if (points.size() != models.size()) {
            throw new IllegalArgumentException("one model per point");
        }
        ObjectNode root;
        try {
            // The operating-point keys come from their own renderer so the two never drift apart.
            root = (ObjectNode) MAPPER.readTree(OperatingPointJson.render(points));
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("the operating-point renderer writes valid JSON", e);
        }
        JsonNode list = root.get("points");
        for (int i = 0; i < models.size(); i++) {
            addModel((ObjectNode) list.get(i), models.get(i));
        }
        if (!files.isEmpty()) {
            ArrayNode out = root.putArray("files");
            for (StageModelFile f : files) {
                out.addObject().put("path", f.path()).put("kind", f.kind()).put("description", f.description());
            }
        }
        try {
            return MAPPER.writeValueAsString(root) + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("a tree of numbers and text always serialises", e);
        }
    }

    private static void addModel(ObjectNode o, StageTransferFunctions m) {
        ArrayNode poles = o.putArray("poles");
        ArrayNode zeros = o.putArray("zeros");
        for (PoleZero pz : StageModelTable.sorted(m.features())) {
            ObjectNode e = (pz.kind() == PoleZero.Kind.POLE ? poles : zeros).addObject();
            put(e, "hz", pz.frequencyHz());
            put(e, "q", pz.q());
            e.put("order", pz.order());
            e.put("label", pz.label());
            e.put("rhp", pz.rightHalfPlane());
        }
        put(o, "f_rhpz_hz", m.rhpZeroHz());
        put(o, "qp", m.qp());
        put(o, "slope_for_qp1", m.slopeForUnityQpVPerS());
        ArrayNode warnings = o.putArray("warnings");
        m.warnings().forEach(warnings::add);
    }

    private static void put(ObjectNode o, String key, double v) {
        if (Double.isFinite(v)) {
            o.put(key, v);
        } else {
            o.putNull(key);
        }
    }
}
