package org.flyloop.cli.output;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.flyloop.envelope.EnvelopeFigure;
import org.flyloop.envelope.WorstCase;
import org.flyloop.envelope.WorstFigure;
import org.flyloop.spec.TargetsSpec;

/**
 * The tolerance worst case as text: each figure with its value, its corner and the tolerance set
 * that produced it; or before and after a change side by side, with {@value #CROSSED} after a
 * figure that crossed its target.
 */
public final class EnvelopeText {

    /** Marks a figure that is on the other side of its target after the change. */
    public static final String CROSSED = "!";

    private EnvelopeText() {
    }

    /** The section for one worst case, or a line saying why there is none. */
    public static String section(WorstCase w) {
        if (w == null) {
            return "Tolerance worst case: not run; no toleranced quantity moves the loop (add a tolerances section).\n";
        }
        StringBuilder s = new StringBuilder("Tolerance worst case (" + w.method() + "):\n");
        for (EnvelopeFigure f : EnvelopeFigure.values()) {
            WorstFigure x = w.of(f);
            s.append(String.format(Locale.ROOT, "  %-18s %s", f.label(), value(x)));
            if (x.isPresent()) {
                s.append(" at ").append(x.corner().label()).append('\n');
                s.append("      with ").append(deviations(x.deviations())).append('\n');
            } else {
                s.append('\n');
            }
        }
        return s.toString();
    }

    /** Before and after side by side; either may be null (no tolerances on that side). */
    public static String compare(WorstCase before, WorstCase after, TargetsSpec targets) {
        if (before == null && after == null) {
            return section(null);
        }
        StringBuilder s = new StringBuilder("Tolerance worst case, before → after (" + CROSSED
                + " marks a figure that crossed its target):\n");
        for (EnvelopeFigure f : EnvelopeFigure.values()) {
            WorstFigure b = before == null ? null : before.of(f);
            WorstFigure a = after == null ? null : after.of(f);
            boolean crossed = b != null && a != null && passes(f, b, targets) != passes(f, a, targets);
            s.append(String.format(Locale.ROOT, "  %-18s %s → %s%s", f.label(), b == null ? "-" : value(b),
                    a == null ? "-" : value(a), crossed ? " " + CROSSED : ""));
            if (a != null && a.isPresent()) {
                s.append(" at ").append(a.corner().label());
            }
            s.append('\n');
        }
        return s.toString();
    }

    /** Whether a worst figure meets its target; crossovers have none and always pass. */
    static boolean passes(EnvelopeFigure f, WorstFigure x, TargetsSpec targets) {
        return switch (f) {
            case PHASE_MARGIN -> x.value() >= targets.phaseMarginDeg();
            case GAIN_MARGIN -> Math.abs(x.value()) >= targets.gainMarginDb();
            default -> true;
        };
    }

    /** "43.2°", "8.1 dB", "1.25 kHz", "none" (no crossover), "unlimited" (no phase crossover). */
    static String value(WorstFigure x) {
        double v = x.value();
        return switch (x.figure()) {
            case PHASE_MARGIN -> Double.isNaN(v) || v == Double.NEGATIVE_INFINITY ? "none (no gain crossover)"
                    : String.format(Locale.ROOT, "%.1f°", v);
            case GAIN_MARGIN -> Double.isInfinite(v) ? "unlimited (no phase crossover)"
                    : String.format(Locale.ROOT, "%.1f dB", v);
            default -> Double.isNaN(v) ? "none" : PartsNotation.engineering(v, "Hz", 3);
        };
    }

    /** "stage.lm +20 %, parts.c_zero -10 %", or "nominal values" for an empty set. */
    static String deviations(Map<String, Double> d) {
        if (d.isEmpty()) {
            return "nominal values";
        }
        List<String> parts = new ArrayList<>();
        for (Map.Entry<String, Double> e : d.entrySet()) {
            double pct = 100 * e.getValue();
            String n = NumberText.significant(pct, 3);
            parts.add(e.getKey() + " " + (pct > 0 ? "+" : "") + n + " %");
        }
        return String.join(", ", parts);
    }
}
