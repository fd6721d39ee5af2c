package org.flyloop.cli.spec;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.List;
import org.flyloop.cli.spec.SpecSection.Sign;
import org.flyloop.spec.TargetsSpec;
import org.flyloop.units.Unit;

/** Reads the optional {@code targets:} section into a {@link TargetsSpec}. */
final class TargetsSectionReader {

    static final List<String> KEYS = List.of("crossover", "phase_margin", "gain_margin", "rhp_zero_fraction");

    private static final String PHASE_HINT = "write degrees above 0 and below 180, e.g. 55 or 55deg";
    private static final String GAIN_HINT = "write decibels, zero or more, e.g. 10 or 10dB";

    private TargetsSectionReader() {
    }

    /**
     * Missing keys take the defaults of {@link TargetsSpec#defaults()}. The phase margin lies in
     * (0°, 180°): at 180° or more the loop phase would have to lead 0° at crossover. The gain
     * margin is zero or more (0 dB asks for no margin). The RHP-zero fraction lies in (0, 1].
     */
    static TargetsSpec read(String source, JsonNode value) {
        SpecSection s = new SpecSection(source, "targets", value, KEYS);
        TargetsSpec d = TargetsSpec.defaults();
        double crossover = d.crossoverHz();
        if (s.has("crossover") && !isAuto(s.node("crossover"))) {
            try {
                crossover = s.quantity("crossover", Unit.HERTZ, Sign.POSITIVE);
            } catch (InputException e) {
                throw new InputException(e.where(), e.problem(), e.accepted() + ", or auto");
            }
        }
        double phaseMargin = s.has("phase_margin")
                ? s.labelledNumber("phase_margin", List.of("degrees", "deg", "\u00b0"), Sign.POSITIVE, PHASE_HINT)
                : d.phaseMarginDeg();
        if (!(phaseMargin < 180)) {
            throw s.at("phase_margin", "must lie below 180 degrees, got " + s.node("phase_margin").asText().strip(),
                    PHASE_HINT);
        }
        double gainMargin = s.has("gain_margin")
                ? s.labelledNumber("gain_margin", List.of("dB"), Sign.ZERO_OR_POSITIVE, GAIN_HINT)
                : d.gainMarginDb();
        double fraction = s.quantity("rhp_zero_fraction", Unit.DIMENSIONLESS, Sign.POSITIVE, d.rhpZeroFraction());
        if (!(fraction <= 1)) {
            throw s.at("rhp_zero_fraction", "must lie in (0, 1], got " + s.node("rhp_zero_fraction").asText().strip(),
                    "write a fraction of the lowest RHP-zero frequency, e.g. 0.25 or 25%");
        }
        return new TargetsSpec(crossover, phaseMargin, gainMargin, fraction);
    }

    private static boolean isAuto(JsonNode v) {
        return v.isTextual() && v.asText().strip().equalsIgnoreCase("auto");
    }
}
