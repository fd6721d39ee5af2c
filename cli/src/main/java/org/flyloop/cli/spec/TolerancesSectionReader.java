package org.flyloop.cli.spec;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.List;
import org.flyloop.spec.AmplifierKind;
import org.flyloop.spec.FeedbackSpec;
import org.flyloop.spec.Tolerance;
import org.flyloop.spec.TolerancesSpec;
import org.flyloop.units.Unit;

/** Reads the optional {@code tolerances:} section into a {@link TolerancesSpec}. */
final class TolerancesSectionReader {

    static final List<String> KEYS = List.of("lm", "cout", "esr", "fsw", "ctr", "parts");

    /** The one accepted value of {@code ctr}: the spread is the range already given in the feedback section. */
    static final String CTR_FROM_FEEDBACK = "from feedback.ctr";

    private static final String BAND_HINT = "write a symmetric band such as 10% or [low, high] such as [-20%, +50%], "
            + "with low above -100%";

    private TolerancesSectionReader() {
    }

    /**
     * A missing key means no tolerance on that quantity. Compensator capacitors take
     * {@code feedback.cap_tolerance} (its 10 % default when the spec has no feedback section), so
     * that the value the designer sizes parts with and the one the analyses spread are the same.
     *
     * @param feedback the feedback section, or null when the spec has none
     */
    static TolerancesSpec read(String source, JsonNode value, FeedbackSpec feedback) {
        SpecSection s = new SpecSection(source, "tolerances", value, KEYS);
        boolean ctrFromFeedback = false;
        if (s.has("ctr")) {
            JsonNode v = s.node("ctr");
            String written = v.isTextual() ? v.asText().strip().replaceAll("\\s+", " ") : null;
            if (written == null || !written.equalsIgnoreCase(CTR_FROM_FEEDBACK)) {
                throw s.at("ctr", written == null ? "expected text, got " + SpecSection.describe(v)
                        : "'" + written + "' is not accepted",
                        "write ctr: " + CTR_FROM_FEEDBACK + " (the CTR spread is the range given there)");
            }
            if (feedback == null || feedback.amplifier() != AmplifierKind.SHUNT_OPTO) {
                throw s.at("ctr", "there is no feedback.ctr: "
                        + (feedback == null ? "the spec has no feedback section" : "the amplifier is "
                        + feedback.amplifier().specName()), "remove it, or use amplifier: shunt-opto with a ctr range");
            }
            ctrFromFeedback = true;
        }
        double capTolerance = feedback == null ? FeedbackSectionReader.DEFAULT_CAP_TOLERANCE : feedback.capTolerance();
        return new TolerancesSpec(band(s, "lm"), band(s, "cout"), band(s, "esr"), band(s, "fsw"), ctrFromFeedback,
                band(s, "parts"), Tolerance.symmetric(capTolerance));
    }

    /**
     * One value x gives the symmetric band [−x, +x] (0 ≤ x &lt; 1); a list [low, high] an
     * asymmetric one (−1 &lt; low ≤ 0 ≤ high). Percentages and plain fractions are both accepted.
     */
    static Tolerance band(SpecSection s, String key) {
        if (!s.has(key)) {
            return Tolerance.NONE;
        }
        JsonNode v = s.node(key);
        if (v.isArray()) {
            if (v.size() != 2) {
                throw s.at(key, "a list of " + v.size() + " value" + (v.size() == 1 ? "" : "s"), BAND_HINT);
            }
            double low = s.item(key + "[0]", v.get(0), Unit.DIMENSIONLESS);
            double high = s.item(key + "[1]", v.get(1), Unit.DIMENSIONLESS);
            if (!(low > -1 && low <= 0)) {
                throw s.at(key + "[0]", "the low end must lie above -100 % and at or below 0, got "
                        + v.get(0).asText().strip(), BAND_HINT);
            }
            if (!(high >= 0)) {
                throw s.at(key + "[1]", "the high end must be zero or more, got " + v.get(1).asText().strip(), BAND_HINT);
            }
            return new Tolerance(low, high);
        }
        double size = s.item(key, v, Unit.DIMENSIONLESS);
        if (!(size >= 0)) {
            throw s.at(key, "a symmetric band needs a size of zero or more, got " + v.asText().strip(), BAND_HINT);
        }
        if (!(size < 1)) {
            throw s.at(key, "a symmetric band of " + v.asText().strip() + " reaches -100 %", BAND_HINT);
        }
        return Tolerance.symmetric(size);
    }
}
