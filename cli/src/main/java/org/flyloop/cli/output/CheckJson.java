package org.flyloop.cli.output;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.flyloop.envelope.EnvelopeCheck;
import org.flyloop.envelope.EnvelopeCorner;
import org.flyloop.envelope.LoadSetting;

/**
 * A check as one JSON document: the shape of {@code design --json} ({@link DesignJson}) for the
 * given network at every envelope corner, with
 * <ul>
 *   <li>{@code network.placement} "given", its zeros and poles those of the given network, and
 *       {@code parts} = {@code ideal_parts} = the parts checked;</li>
 *   <li>{@code boundary_factor} on the points placed beside the CCM/DCM boundary;</li>
 *   <li>{@code targets_met} true only when every corner and the tolerance worst case meet every
 *       target, and {@code warnings} the stage's warnings and every miss;</li>
 *   <li>{@code worst_case}: the tolerance worst case ({@link EnvelopeJson}), null without
 *       tolerances;</li>
 *   <li>{@code monte_carlo} ({@link MonteCarloJson}) when a run was asked for;</li>
 *   <li>{@code before}: the same document for the spec without its {@code --set} changes, when
 *       there are any.</li>
 * </ul>
 */
public final class CheckJson {

    private static final ObjectMapper MAPPER = new ObjectMapper();

    private CheckJson() {
    }

    /** The document of one check. */
    public static ObjectNode of(EnvelopeCheck check) {
        ObjectNode root = DesignJson.of(check.asDesignResult());
        JsonNode points = root.get("points");
        for (int i = 0; i < points.size(); i++) {
            EnvelopeCorner c = check.envelope().get(i);
            if (c.load() instanceof LoadSetting.Boundary b) {
                MarginJson.put((ObjectNode) points.get(i), "boundary_factor", b.factor());
            }
        }
        root.put("targets_met", check.meetsTargets());
        ArrayNode warnings = root.putArray("warnings");
        check.warnings().forEach(warnings::add);
        if (check.worstCase() == null) {
            root.putNull("worst_case");
        } else {
            root.set("worst_case", EnvelopeJson.worstCase(check.worstCase(), check.request().targets()));
        }
        if (check.monteCarlo() != null) {
            root.set("monte_carlo", MonteCarloJson.of(check.monteCarlo()));
        }
        return root;
    }

    /** The document on one line, with {@code before} when {@code before} is not null. */
    public static String render(EnvelopeCheck after, EnvelopeCheck before) {
        ObjectNode root = of(after);
        if (before != null) {
            root.set("before", of(before));
        }
        try {
            return MAPPER.writeValueAsString(root) + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("a tree of numbers and text always serialises", e);
        }
    }
}
