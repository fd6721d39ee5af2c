package org.flyloop.cli.report;

import java.util.ArrayList;
import java.util.List;
import org.flyloop.cli.plot.SiText;
import org.flyloop.design.DesignRequest;
import org.flyloop.spec.AmplifierKind;
import org.flyloop.spec.ControlScheme;
import org.flyloop.spec.ControlSpec;
import org.flyloop.spec.FeedbackSpec;
import org.flyloop.spec.StageSpec;
import org.flyloop.spec.TargetsSpec;
import org.flyloop.spec.ValueRange;

/** The spec as the program understood it: one row per value, with units. */
final class SpecRows {

    private SpecRows() {
    }

    /** Rows of {section, quantity, value}. */
    static List<List<String>> of(DesignRequest request, int chosenType, double plannedCrossoverHz) {
        List<List<String>> rows = new ArrayList<>();
        StageSpec s = request.stage();
        add(rows, "stage", "input voltage", range(s.vin(), "V"));
        add(rows, "stage", "output voltage", SiText.format(s.vout(), "V", 4));
        add(rows, "stage", "load current", range(s.iout(), "A"));
        add(rows, "stage", "switching frequency", SiText.format(s.fswHz(), "Hz", 4));
        add(rows, "stage", "magnetizing inductance", SiText.format(s.lm(), "H", 4));
        add(rows, "stage", "turns ratio Np/Ns", SiText.plain(s.turns(), 4));
        add(rows, "stage", "output capacitance", SiText.format(s.cout(), "F", 4));
        add(rows, "stage", "output capacitor ESR", SiText.format(s.esr(), "Ω", 4));
        add(rows, "stage", "rectifier forward drop", SiText.format(s.rectifierDrop(), "V", 4));
        add(rows, "stage", "switch on-resistance", SiText.format(s.switchResistance(), "Ω", 4));
        ControlSpec c = request.control();
        add(rows, "control", "scheme", c.scheme().specName());
        if (c.scheme() == ControlScheme.VOLTAGE) {
            add(rows, "control", "PWM ramp, peak to peak", SiText.format(c.rampV(), "V", 4));
        } else {
            add(rows, "control", "current sense gain", SiText.format(c.senseVPerA(), "V/A", 4));
            add(rows, "control", "compensation ramp slope", SiText.format(c.slopeVPerS(), "V/s", 4));
        }
        add(rows, "control", "largest duty cycle", SiText.plain(c.dutyMax(), 4));
        add(rows, "control", "feedback pin to comparator gain", SiText.plain(c.fbGain(), 4) + " V/V");
        feedback(rows, request.feedback(), chosenType);
        TargetsSpec t = request.targets();
        add(rows, "targets", "crossover", t.autoCrossover()
                ? "automatic (designed for " + SiText.format(plannedCrossoverHz, "Hz", 3) + ")"
                : SiText.format(t.crossoverHz(), "Hz", 4));
        add(rows, "targets", "phase margin, at least", SiText.plain(t.phaseMarginDeg(), 4) + "°");
        add(rows, "targets", "gain margin, at least", SiText.plain(t.gainMarginDb(), 4) + " dB");
        add(rows, "targets", "crossover limit, fraction of the lowest RHP zero", SiText.plain(t.rhpZeroFraction(), 3));
        add(rows, "series", "resistors", request.series().resistors());
        add(rows, "series", "capacitors", request.series().capacitors());
        return rows;
    }

    private static void feedback(List<List<String>> rows, FeedbackSpec f, int chosenType) {
        add(rows, "feedback", "amplifier", f.amplifier().specName());
        add(rows, "feedback", "type", f.autoType() ? "automatic (type " + chosenType + " chosen)"
                : Integer.toString(f.type()));
        add(rows, "feedback", "placement method", f.placement().specName());
        add(rows, "feedback", "reference voltage", SiText.format(f.referenceV(), "V", 4));
        optional(rows, "divider lower resistor", f.rLower(), "Ω");
        optional(rows, "divider upper resistor", f.rUpper(), "Ω");
        optional(rows, "op-amp gain-bandwidth", f.gbwHz(), "Hz");
        optional(rows, "OTA transconductance", f.gmS(), "S");
        if (f.amplifier() == AmplifierKind.SHUNT_OPTO) {
            ValueRange ctr = f.ctr();
            add(rows, "feedback", "optocoupler CTR", ctr.isSingle() ? SiText.plain(100 * ctr.min(), 3) + " %"
                    : SiText.plain(100 * ctr.min(), 3) + " % … " + SiText.plain(100 * ctr.max(), 3) + " %");
            optional(rows, "pull-up resistor", f.rPullup(), "Ω");
            optional(rows, "pull-up supply", f.pullupSupplyV(), "V");
            optional(rows, "feedback pin voltage at minimum output", f.fbMinV(), "V");
            optional(rows, "optocoupler pole", f.optoPoleHz(), "Hz");
            optional(rows, "optocoupler equivalent capacitance", f.cOpto(), "F");
            optional(rows, "LED series resistor", f.rLed(), "Ω");
            optional(rows, "LED forward drop", f.ledDropV(), "V");
            optional(rows, "shunt regulator minimum cathode voltage", f.shuntMinVoltageV(), "V");
            optional(rows, "shunt regulator minimum cathode current", f.shuntMinCurrentA(), "A");
        }
        add(rows, "feedback", "capacitor tolerance", SiText.plain(100 * f.capTolerance(), 3) + " %");
        f.parts().forEach((name, value) -> add(rows, "feedback", "given part " + name, PartText.value(name, value)));
    }

    private static void optional(List<List<String>> rows, String quantity, double value, String unit) {
        if (!Double.isNaN(value)) {
            add(rows, "feedback", quantity, SiText.format(value, unit, 4));
        }
    }

    private static void add(List<List<String>> rows, String section, String quantity, String value) {
        rows.add(List.of(section, quantity, value));
    }

    /** "36 V … 75 V" or "36 V … 75 V (nominal 48 V)" or a single value. */
    static String range(ValueRange r, String unit) {
        if (r.isSingle()) {
            return SiText.format(r.min(), unit, 4);
        }
        String s = SiText.format(r.min(), unit, 4) + " … " + SiText.format(r.max(), unit, 4);
        return r.hasNominal() ? s + " (nominal " + SiText.format(r.nominal(), unit, 4) + ")" : s;
    }
}
