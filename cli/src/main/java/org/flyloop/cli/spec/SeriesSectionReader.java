package org.flyloop.cli.spec;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.Arrays;
import java.util.List;
import org.flyloop.eseries.ESeries;
import org.flyloop.spec.SeriesSpec;

/** Reads the optional {@code series:} section into a {@link SeriesSpec}. */
final class SeriesSectionReader {

    static final List<String> KEYS = List.of("resistors", "capacitors");

    private static final String ACCEPTED = "write one of "
            + String.join(", ", Arrays.stream(ESeries.values()).map(ESeries::name).toList())
            + " (IEC 60063)";

    private SeriesSectionReader() {
    }

    /** Series names in any case; missing keys take {@link SeriesSpec#defaults()}. */
    static SeriesSpec read(String source, JsonNode value) {
        SpecSection s = new SpecSection(source, "series", value, KEYS);
        SeriesSpec d = SeriesSpec.defaults();
        return new SeriesSpec(series(s, "resistors", d.resistors()), series(s, "capacitors", d.capacitors()));
    }

    /** The canonical name ({@code e12} reads as {@code E12}), so equal choices give equal records. */
    private static String series(SpecSection s, String key, String defaultName) {
        if (!s.has(key)) {
            return defaultName;
        }
        JsonNode v = s.node(key);
        if (!v.isTextual()) {
            throw s.at(key, "expected a series name, got " + SpecSection.describe(v), ACCEPTED);
        }
        try {
            return ESeries.parse(v.asText()).name();
        } catch (IllegalArgumentException e) {
            throw s.at(key, "'" + v.asText().strip() + "' is not a preferred-number series", ACCEPTED);
        }
    }
}
