package org.flyloop.cli.spec;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.List;
import org.flyloop.cli.spec.SpecSection.Sign;
import org.flyloop.spec.StageSpec;
import org.flyloop.units.Unit;

/** Reads the {@code stage:} section into a {@link StageSpec}. */
final class StageSectionReader {

    static final List<String> KEYS = List.of("vin", "vout", "iout", "fsw", "lm", "turns", "cout", "esr",
            "rectifier_drop", "switch_resistance");

    private StageSectionReader() {
    }

    /**
     * Every value positive except the three parasitics (ESR, rectifier drop, switch resistance),
     * where zero means "ideal" and is the default for the last two.
     */
    static StageSpec read(String source, JsonNode value) {
        SpecSection s = new SpecSection(source, "stage", value, KEYS);
        return new StageSpec(
                s.range("vin", Unit.VOLT, Sign.POSITIVE),
                s.quantity("vout", Unit.VOLT, Sign.POSITIVE),
                s.range("iout", Unit.AMPERE, Sign.POSITIVE),
                s.quantity("fsw", Unit.HERTZ, Sign.POSITIVE),
                s.quantity("lm", Unit.HENRY, Sign.POSITIVE),
                s.quantity("turns", Unit.DIMENSIONLESS, Sign.POSITIVE),
                s.quantity("cout", Unit.FARAD, Sign.POSITIVE),
                s.quantity("esr", Unit.OHM, Sign.ZERO_OR_POSITIVE),
                s.quantity("rectifier_drop", Unit.VOLT, Sign.ZERO_OR_POSITIVE, 0),
                s.quantity("switch_resistance", Unit.OHM, Sign.ZERO_OR_POSITIVE, 0));
    }
}
