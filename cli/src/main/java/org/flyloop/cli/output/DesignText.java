package org.flyloop.cli.output;

import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.flyloop.cli.output.TextTable.Column;
import org.flyloop.design.Corner;
import org.flyloop.design.CornerResult;
import org.flyloop.design.CrossoverLimit;
import org.flyloop.design.DesignResult;
import org.flyloop.design.LoopEvaluation;
import org.flyloop.design.Placement;
import org.flyloop.loop.ClosedLoop;
import org.flyloop.spec.TargetsSpec;

/**
 * A design as a human-readable report: network and crossover with the bounds that limited it,
 * the parts table, the per-corner margins table, the worst margins, a linear load-step figure,
 * warnings, the rules of thumb used, a one-line result and the safety caution. Each section is
 * also available on its own for other reports (a recheck shows the corner table without the
 * design sections).
 */
public final class DesignText {

    private DesignText() {
    }

    /**
     * How to print.
     *
     * @param title  the first line (the spec's title); not printed when quiet
     * @param quiet  results only: no title, no rules of thumb, no caution
     * @param colour mark misses in red (only for a terminal)
     */
    public record Style(String title, boolean quiet, boolean colour) {
    }

    /** Appends the whole report to {@code out}. */
    public static void print(PendingOutput out, DesignResult result, Style style) {
        out.print(render(result, style));
    }

    /** The whole report. */
    public static String render(DesignResult result, Style style) {
        StringBuilder s = new StringBuilder();
        if (!style.quiet()) {
            s.append(style.title()).append("\n\n");
        }
        s.append(network(result)).append('\n');
        s.append(crossover(result)).append('\n');
        s.append(parts(result)).append('\n');
        s.append(corners(result.roundedLoop(), result.request().targets(), style.colour())).append('\n');
        s.append(worst(result.roundedLoop(), result.request().targets()));
        s.append(loadStep(DesignLoadStep.atLoadStepCorner(result), result.request().stage().vout())).append('\n');
        List<String> warnings = DesignWarnings.of(result);
        if (!warnings.isEmpty()) {
            s.append(bullets("Warnings:", warnings)).append('\n');
        }
        if (!style.quiet()) {
            s.append(bullets("Rules of thumb used:", result.rulesOfThumb())).append('\n');
        }
        s.append(verdict(result.roundedLoop()));
        if (!style.quiet()) {
            s.append(SafetyNotice.ONE_LINE).append('\n');
        }
        return s.toString();
    }

    /** Amplifier, network type and kind, placement method, boost, zeros and poles. */
    public static String network(DesignResult result) {
        Placement p = result.placement();
        StringBuilder s = new StringBuilder();
        s.append(String.format(Locale.ROOT, "Network: %s, type %d (%s), %s placement", result.request().feedback()
                .amplifier().specName(), DesignJson.networkType(result.rounded()), result.rounded().kind().specName(),
                p.method()));
        if (p.type() > 1) {
            s.append(String.format(Locale.ROOT, ", %.0f° boost at the design crossover", p.boostDeg()));
        }
        s.append('\n');
        if (!p.zerosHz().isEmpty()) {
            s.append("  zeros ").append(frequencies(p.zerosHz())).append("; poles ").append(frequencies(p.polesHz()))
                    .append('\n');
        }
        return s.toString();
    }

    /** The design crossover, where it came from, and every bound with its basis. */
    public static String crossover(DesignResult result) {
        double fc = result.placement().crossoverHz();
        TargetsSpec t = result.request().targets();
        double lowest = Double.POSITIVE_INFINITY;
        for (CrossoverLimit l : result.limits()) {
            lowest = Math.min(lowest, l.frequencyHz());
        }
        StringBuilder s = new StringBuilder("Design crossover: " + hz(fc));
        if (!t.autoCrossover()) {
            s.append(" (targets.crossover)");
        } else if (fc >= 0.999 * lowest) {
            s.append(" (the lowest bound below)");
        } else {
            s.append(String.format(Locale.ROOT, " (lowered from the lowest bound, %s, until the margins were met)",
                    hz(lowest)));
        }
        s.append('\n');
        TextTable table = new TextTable(List.of(Column.text("  bound"), Column.number("at most"), Column.text("basis")));
        for (CrossoverLimit l : result.limits()) {
            table.add(List.of("  " + l.name(), hz(l.frequencyHz()), l.basis()));
        }
        return s.append(table.render()).toString();
    }

    /** The parts table under a heading naming the series. */
    public static String parts(DesignResult result) {
        return String.format(Locale.ROOT, "Parts (resistors %s, capacitors %s; build the \"built\" column):\n",
                result.request().series().resistors(), result.request().series().capacitors())
                + PartsTable.render(result.ideal(), result.rounded());
    }

    /** The per-corner table under a heading naming the targets. */
    public static String corners(LoopEvaluation evaluation, TargetsSpec targets, boolean colour) {
        return String.format(Locale.ROOT, "Loop at every corner, built parts (targets: PM ≥ %s°, |GM| ≥ %s dB):\n",
                NumberText.significant(targets.phaseMarginDeg(), 3), NumberText.significant(targets.gainMarginDb(), 3))
                + MarginTable.render(evaluation, colour);
    }

    /** The smallest phase margin and the gain margin of smallest magnitude, each with its corner. */
    public static String worst(LoopEvaluation evaluation, TargetsSpec targets) {
        CornerResult pm = evaluation.worstPhaseMargin();
        CornerResult gm = evaluation.worstGainMargin();
        double gmDb = gm.margins().gainMarginDb();
        String pmText = Double.isNaN(pm.margins().phaseMarginDeg())
                ? "none: no gain crossover at " + where(pm.corner())
                : String.format(Locale.ROOT, "%.1f° at %s", pm.margins().phaseMarginDeg(), where(pm.corner()));
        // The worst gain margin is infinite only when no corner has a phase crossover at all.
        String gmText = Double.isInfinite(gmDb) ? "unlimited: no phase crossover at any corner"
                : String.format(Locale.ROOT, "%.1f dB at %s", gmDb, where(gm.corner()));
        return String.format(Locale.ROOT, "Worst phase margin: %s (target %s°)\n", pmText,
                NumberText.significant(targets.phaseMarginDeg(), 3))
                + String.format(Locale.ROOT, "Worst gain margin:  %s (target %s dB)\n", gmText,
                NumberText.significant(targets.gainMarginDb(), 3));
    }

    /** The load-step figure, labelled as coming from the linear model. */
    public static String loadStep(Optional<DesignLoadStep> step, double voutV) {
        if (step.isEmpty()) {
            return "Load step: not computed; at the worst-phase-margin corner the closed loop or the stage's output "
                    + "impedance model has a right-half-plane pole.\n";
        }
        DesignLoadStep r = step.get();
        String band = "±" + PartsNotation.engineering(r.settlingBandV(), "V", 3) + " ("
                + NumberText.significant(100 * ClosedLoop.SETTLING_BAND_FRACTION, 2) + " % of Vout)";
        String settle;
        if (Double.isNaN(r.settlingTimeS())) {
            settle = "not settled to " + band + " within the simulated window";
        } else if (r.settlingTimeS() == 0) {
            settle = "never leaves " + band;
        } else {
            settle = "settles to " + band + " after " + PartsNotation.engineering(r.settlingTimeS(), "s", 3);
        }
        return String.format(Locale.ROOT, "Load step, linear model: +%s (%s %% of %s) up to %s (full load, worst PM there)\n"
                        + "  peak deviation %s at %s; %s\n",
                PartsNotation.engineering(r.stepA(), "A", 3),
                NumberText.significant(100 * DesignLoadStep.STEP_FRACTION_OF_MAX_LOAD, 2),
                PartsNotation.engineering(r.stepA() / DesignLoadStep.STEP_FRACTION_OF_MAX_LOAD, "A", 3),
                where(r.corner().corner()), PartsNotation.engineering(r.peakDeviationV(), "V", 3),
                PartsNotation.engineering(r.peakTimeS(), "s", 3), settle);
    }

    /** One line: all targets met, or how many corners miss. */
    public static String verdict(LoopEvaluation evaluation) {
        long missed = evaluation.results().stream().filter(r -> !r.meetsTargets()).count();
        return missed == 0 ? "Result: every target met at every corner.\n"
                : String.format(Locale.ROOT, "Result: targets missed at %d of %d corners (exit code 3).\n", missed,
                evaluation.results().size());
    }

    /** "vin=36 V, iout=4 A" (and "ctr=50 %" where the corner has one), shortest exact digits. */
    public static String where(Corner c) {
        String s = "vin=" + NumberText.significant(c.point().vin(), 4) + " V, iout="
                + NumberText.significant(c.point().iout(), 4) + " A";
        return Double.isNaN(c.ctr()) ? s : s + ", ctr=" + NumberText.significant(100 * c.ctr(), 3) + " %";
    }

    private static String bullets(String heading, List<String> lines) {
        StringBuilder s = new StringBuilder(heading).append('\n');
        for (String l : lines) {
            s.append("  - ").append(l).append('\n');
        }
        return s.toString();
    }

    private static String frequencies(List<Double> hz) {
        return String.join(", ", hz.stream().map(DesignText::hz).toList());
    }

    private static String hz(double f) {
        return PartsNotation.engineering(f, "Hz", 3);
    }
}
