package org.flyloop.cli.spec;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.List;
import org.flyloop.cli.spec.SpecSection.Sign;
import org.flyloop.spec.ControlScheme;
import org.flyloop.spec.ControlSpec;
import org.flyloop.units.Unit;

/** Reads the {@code control:} section into a {@link ControlSpec}. */
final class ControlSectionReader {

    static final List<String> KEYS = List.of("scheme", "ramp", "sense", "slope", "duty_max", "fb_gain");

    /**
     * Duty limit when the spec gives none. Flyback controllers commonly clamp somewhere between
     * 0.5 and 0.8; 0.75 is a middle value (common practice, no source).
     */
    static final double DEFAULT_DUTY_MAX = 0.75;

    private ControlSectionReader() {
    }

    /**
     * Voltage mode requires {@code ramp} and refuses {@code sense} and {@code slope}; current
     * mode requires {@code sense}, takes an optional {@code slope} and refuses {@code ramp}. A key
     * from the other scheme is refused rather than ignored, so that switching schemes never leaves
     * a silently unused value behind.
     */
    static ControlSpec read(String source, JsonNode value) {
        SpecSection s = new SpecSection(source, "control", value, KEYS);
        ControlScheme scheme = ControlScheme.valueOf(
                s.word("scheme", List.of("voltage", "current")).toUpperCase(java.util.Locale.ROOT));
        double dutyMax = s.quantity("duty_max", Unit.DIMENSIONLESS, Sign.POSITIVE, DEFAULT_DUTY_MAX);
        if (!(dutyMax < 1)) {
            throw s.at("duty_max", "must be below 1, got " + dutyMax, "write a fraction such as 0.75 or 75%");
        }
        double fbGain = s.quantity("fb_gain", Unit.DIMENSIONLESS, Sign.POSITIVE, 1);
        if (scheme == ControlScheme.VOLTAGE) {
            s.refuse("sense", "applies to current mode only", "remove it or write scheme: current");
            s.refuse("slope", "applies to current mode only", "remove it or write scheme: current");
            double ramp = s.quantity("ramp", Unit.VOLT, Sign.POSITIVE);
            return new ControlSpec(scheme, ramp, Double.NaN, 0, dutyMax, fbGain);
        }
        s.refuse("ramp", "applies to voltage mode only", "remove it or write scheme: voltage");
        double sense = s.quantity("sense", Unit.VOLT_PER_AMPERE, Sign.POSITIVE);
        double slope = s.quantity("slope", Unit.VOLT_PER_SECOND, Sign.ZERO_OR_POSITIVE, 0);
        return new ControlSpec(scheme, Double.NaN, sense, slope, dutyMax, fbGain);
    }
}
