package org.flyloop.cli.command;

import java.nio.file.Path;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.apache.commons.math3.complex.Complex;
import org.flyloop.averaged.AveragedFlybackModel;
import org.flyloop.averaged.AveragedInputs;
import org.flyloop.averaged.Equilibrium;
import org.flyloop.averaged.InputProfile;
import org.flyloop.averaged.Scenario;
import org.flyloop.cli.output.NumberText;
import org.flyloop.cli.spec.InputException;
import org.flyloop.spec.ControlScheme;
import org.flyloop.units.QuantityFormatException;
import org.flyloop.units.QuantityParser;
import org.flyloop.units.Unit;
import picocli.CommandLine.Option;

/**
 * {@code --transient STEP [--time T] --csv FILE}: one step of the open-loop averaged model from
 * its steady state at the chosen point.
 *
 * <p>Step forms (nothing else is accepted):
 * <ul>
 *   <li>{@code duty-step:+2%} (voltage mode): the duty cycle steps relatively, d → d·1.02;</li>
 *   <li>{@code control-step:+2%}: the control input steps relatively; in current mode that is
 *       the comparator voltage vc → vc·1.02, in voltage mode it is the duty cycle again (the PWM
 *       control voltage is d·V_ramp, so the relative step is the same);</li>
 *   <li>{@code load-step:50%..100%}: the load current steps between these percentages of the
 *       chosen point's load (so {@code --iout 2} with 50%..100% steps from 1 A to 2 A);</li>
 *   <li>{@code line-step:300..350}: the input voltage steps between these voltages at the chosen
 *       point's load; the chosen point's vin is not used.</li>
 * </ul>
 * The control input is held at the value that regulates the output before the step. The step
 * happens at 10 % of the window, so the steady state shows first. Without {@code --time} the
 * window is {@value #SETTLING_TIME_CONSTANTS} times the slowest time constant of the model
 * (linearized before and after the step), divided by 0.9 for the lead-in.
 */
public final class StageTransientOptions {

    /** Fraction of the window before the step. */
    public static final double STEP_FRACTION = 0.1;
    /**
     * Time constants after the step in the default window: e^−10 ≈ 5e−5 of the step is left, so the
     * end of the record is the new steady state to well within any plotting resolution.
     */
    public static final double SETTLING_TIME_CONSTANTS = 10;

    static final String ACCEPTED = "write duty-step:+2% (voltage mode), control-step:+2%, load-step:50%..100%"
            + " or line-step:300..350";

    private static final Pattern FORM = Pattern.compile("([a-z-]+):(.*)");
    private static final Pattern RELATIVE = Pattern.compile("[+-][0-9.]+(?:[eE][+-]?[0-9]+)?%");
    private static final Pattern PERCENT = Pattern.compile("[0-9.]+(?:[eE][+-]?[0-9]+)?%");

    @Option(names = "--transient", paramLabel = "STEP",
            description = "Open-loop averaged-model step: duty-step:+2%%, control-step:+2%%, load-step:50%%..100%%"
                    + " or line-step:300..350 (needs --csv).")
    private String stepText;

    @Option(names = "--time", paramLabel = "T",
            description = "Length of the --transient record, e.g. 5m (default: 10 slowest time constants after the"
                    + " step).")
    private String timeText;

    @Option(names = "--csv", paramLabel = "FILE.csv", description = "Where --transient writes its time series.")
    private Path csvFile;

    /** The kinds of step. */
    public enum Kind {
        /** Relative duty step, voltage mode. */
        DUTY("duty-step"),
        /** Relative step of the control input. */
        CONTROL("control-step"),
        /** Load current between two fractions of the chosen load. */
        LOAD("load-step"),
        /** Input voltage between two values. */
        LINE("line-step");

        private final String word;

        Kind(String word) {
            this.word = word;
        }

        /** The spelling before the colon. */
        public String word() {
            return word;
        }
    }

    /**
     * A parsed step.
     *
     * @param kind the kind
     * @param from relative change (duty, control), start fraction of the load (load), start voltage (line)
     * @param to   unused (duty, control), end fraction of the load (load), end voltage (line)
     */
    public record Step(Kind kind, double from, double to) {

        /** False for a line step, which brings its own input voltages. */
        public boolean usesChosenVin() {
            return kind != Kind.LINE;
        }
    }

    /** True when {@code --transient} was given. */
    public boolean requested() {
        return stepText != null;
    }

    /** The CSV file to write, or null. */
    public Path csvFile() {
        return csvFile;
    }

    /**
     * Parses everything and refuses {@code --time}/{@code --csv} without {@code --transient} and
     * {@code --transient} without {@code --csv}.
     */
    public void check(ControlScheme scheme) {
        if (stepText == null) {
            if (timeText != null) {
                throw new InputException("--time", "applies to --transient only", "add --transient STEP --csv FILE.csv");
            }
            if (csvFile != null) {
                throw new InputException("--csv", "applies to --transient only", "add --transient STEP");
            }
            return;
        }
        step(scheme);
        windowS();
        if (csvFile == null) {
            throw new InputException("--transient", "needs --csv FILE.csv for the time series", null);
        }
    }

    /** The parsed step; a duty step is refused in current mode. */
    public Step step(ControlScheme scheme) {
        String text = stepText.strip();
        Matcher m = FORM.matcher(text);
        if (!m.matches()) {
            throw bad(text);
        }
        String body = m.group(2);
        switch (m.group(1)) {
            case "duty-step":
                if (scheme == ControlScheme.CURRENT) {
                    throw new InputException("--transient", "duty-step needs voltage mode; in current mode the"
                            + " control input is the comparator voltage", "write control-step:" + body);
                }
                return new Step(Kind.DUTY, relative(text, body), Double.NaN);
            case "control-step":
                return new Step(Kind.CONTROL, relative(text, body), Double.NaN);
            case "load-step": {
                String[] ends = ends(text, body);
                double a = percent(text, ends[0]);
                double b = percent(text, ends[1]);
                if (a == b) {
                    throw new InputException("--transient", "'" + text + "' does not step", ACCEPTED);
                }
                return new Step(Kind.LOAD, a, b);
            }
            case "line-step": {
                String[] ends = ends(text, body);
                double a = volts(text, ends[0]);
                double b = volts(text, ends[1]);
                if (a == b) {
                    throw new InputException("--transient", "'" + text + "' does not step", ACCEPTED);
                }
                return new Step(Kind.LINE, a, b);
            }
            default:
                throw bad(text);
        }
    }

    /** The window given with {@code --time}, s, or NaN for the default. */
    public double windowS() {
        if (timeText == null) {
            return Double.NaN;
        }
        double t;
        try {
            t = QuantityParser.parse(timeText, Unit.SECOND);
        } catch (QuantityFormatException e) {
            throw new InputException("--time", e.problem(), e.accepted());
        }
        if (!(t > 0)) {
            throw new InputException("--time", "must be positive, got " + timeText.strip(), Unit.SECOND.hint("5m"));
        }
        return t;
    }

    /**
     * The scenario at the chosen point with its step at {@code atS}.
     *
     * @throws org.flyloop.stage.InfeasibleOperatingPointException when the averaged model cannot
     *                                                              regulate before the step
     */
    public static Scenario scenario(Step step, AveragedFlybackModel model, double vinV, double ioutA, double atS) {
        switch (step.kind()) {
            case DUTY:
            case CONTROL: {
                Equilibrium from = model.regulatedEquilibrium(vinV, ioutA);
                return model.controlStep(from, from.inputs().control() * (1 + step.from()), atS);
            }
            case LOAD:
                return model.loadStep(vinV, step.from() * ioutA, step.to() * ioutA, atS);
            default:
                return model.lineStep(step.from(), step.to(), ioutA, atS);
        }
    }

    /**
     * The same scenario with its step moved to {@code atS}: the inputs just before and at the old
     * step time become a step at the new one. Saves solving the regulated equilibrium twice.
     */
    public static Scenario retimed(Scenario s, double oldStepS, double atS) {
        AveragedInputs before = s.inputs().before(oldStepS);
        AveragedInputs after = s.inputs().at(oldStepS);
        InputProfile profile = InputProfile.constant(before);
        for (int k = 0; k < AveragedInputs.NAMES.size(); k++) {
            if (after.get(k) != before.get(k)) {
                profile = profile.step(k, atS, after.get(k));
            }
        }
        return new Scenario(s.name(), s.fromSteadyState(), s.loadResistanceOhm(), profile);
    }

    /**
     * The default window for a scenario whose step is at {@code stepS}: the slowest time constant
     * 1/|Re λ| of the model linearized at the equilibria before and after the step, times
     * {@value #SETTLING_TIME_CONSTANTS}, over 1 − {@value #STEP_FRACTION}.
     */
    public static double defaultWindowS(AveragedFlybackModel model, Scenario s, double stepS) {
        double slowest = 0;
        for (AveragedInputs u : List.of(s.inputs().before(stepS), s.inputs().at(stepS))) {
            Equilibrium eq = model.equilibrium(u, s.loadResistanceOhm());
            for (Complex pole : model.linearize(eq).poles()) {
                if (pole.getReal() < 0) {
                    slowest = Math.max(slowest, -1 / pole.getReal());
                }
            }
        }
        if (!(slowest > 0)) {
            throw new IllegalStateException("the averaged model has no decaying mode at this point");
        }
        return SETTLING_TIME_CONSTANTS * slowest / (1 - STEP_FRACTION);
    }

    /** What the step does, in words with numbers, for the line printed after the file is written. */
    public static String describe(Step step, ControlScheme scheme, double ioutA) {
        switch (step.kind()) {
            case DUTY:
                return "duty step " + signedPercent(step.from());
            case CONTROL:
                return (scheme == ControlScheme.CURRENT ? "comparator-voltage step " : "control (duty) step ")
                        + signedPercent(step.from());
            case LOAD:
                return "load step " + NumberText.significant(step.from() * ioutA, 4) + " A to "
                        + NumberText.significant(step.to() * ioutA, 4) + " A";
            default:
                return "line step " + NumberText.significant(step.from(), 4) + " V to "
                        + NumberText.significant(step.to(), 4) + " V (iout " + NumberText.significant(ioutA, 4)
                        + " A)";
        }
    }

    private static String signedPercent(double fraction) {
        return (fraction > 0 ? "+" : "") + NumberText.significant(100 * fraction, 4) + "%";
    }

    private static String[] ends(String text, String body) {
        String[] ends = body.split("\\.\\.", -1);
        if (ends.length != 2) {
            throw bad(text);
        }
        return ends;
    }

    /** A signed percentage, e.g. +2% → 0.02; not zero, and above −100 %. */
    private static double relative(String text, String body) {
        if (PERCENT.matcher(body).matches()) {
            throw new InputException("--transient", "'" + text + "' needs a signed change", "write e.g. "
                    + text.substring(0, text.indexOf(':') + 1) + "+" + body + " or -" + body);
        }
        if (!RELATIVE.matcher(body).matches()) {
            throw bad(text);
        }
        double v = number(text, body);
        if (v == 0 || v <= -1) {
            throw new InputException("--transient", "'" + text + "' needs a change other than 0 and above -100%",
                    ACCEPTED);
        }
        return v;
    }

    /** A positive percentage, e.g. 50% → 0.5. */
    private static double percent(String text, String body) {
        if (!PERCENT.matcher(body).matches()) {
            throw bad(text);
        }
        double v = number(text, body);
        if (!(v > 0)) {
            throw new InputException("--transient", "'" + text + "': load percentages must be above 0", ACCEPTED);
        }
        return v;
    }

    private static double number(String text, String body) {
        try {
            return QuantityParser.parse(body, Unit.DIMENSIONLESS);
        } catch (QuantityFormatException e) {
            throw bad(text);
        }
    }

    private static double volts(String text, String body) {
        double v;
        try {
            v = QuantityParser.parse(body, Unit.VOLT);
        } catch (QuantityFormatException e) {
            throw new InputException("--transient", "'" + text + "': " + e.problem(), ACCEPTED);
        }
        if (!(v > 0)) {
            throw new InputException("--transient", "'" + text + "': input voltages must be above 0", ACCEPTED);
        }
        return v;
    }

    private static InputException bad(String text) {
        return new InputException("--transient", "'" + text + "' is not a step", ACCEPTED);
    }
}
