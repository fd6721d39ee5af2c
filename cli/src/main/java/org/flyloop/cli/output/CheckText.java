package org.flyloop.cli.output;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import org.flyloop.cli.output.TextTable.Column;
import org.flyloop.design.CornerResult;
import org.flyloop.design.DesignResult;
import org.flyloop.envelope.EnvelopeCheck;
import org.flyloop.envelope.EnvelopeCorner;
import org.flyloop.envelope.LoadSetting;
import org.flyloop.loop.LoopMargins;
import org.flyloop.network.CompensatorNetwork;
import org.flyloop.spec.TargetsSpec;

/**
 * A check as text: the given network, the loop at every envelope corner, the worst margins, the
 * tolerance worst case, a Monte Carlo run if asked for, and the verdict. After {@code --set}
 * changes, the figures before and after stand side by side and {@value EnvelopeText#CROSSED}
 * marks each one that crossed its target.
 */
public final class CheckText {

    private CheckText() {
    }

    /**
     * What the check is compared with after {@code --set} changes.
     *
     * @param settings      the {@code --set} texts
     * @param before        the check of the spec without them; null when that spec is not valid
     * @param beforeProblem why there is no "before" (one line), else null
     */
    public record Comparison(List<String> settings, EnvelopeCheck before, String beforeProblem) {
        public Comparison {
            settings = List.copyOf(settings);
        }
    }

    /**
     * The report.
     *
     * @param after      the check of the spec as given (with its {@code --set} changes)
     * @param comparison the spec without the changes; null when there are none
     * @param style      title, quiet, colour
     */
    public static String render(EnvelopeCheck after, Comparison comparison, DesignText.Style style) {
        StringBuilder s = new StringBuilder();
        if (!style.quiet()) {
            s.append(style.title()).append("\n\n");
        }
        EnvelopeCheck before = comparison == null ? null : comparison.before();
        if (comparison != null) {
            s.append("Changed with --set: ").append(String.join(", ", comparison.settings())).append('\n');
            if (before == null) {
                s.append("Before the changes: not analysed (").append(comparison.beforeProblem()).append(")\n");
            }
            s.append('\n');
        }
        DesignResult shaped = after.asDesignResult();
        s.append(network(shaped)).append('\n');
        s.append(before == null ? parts(after.network()) : parts(before.network(), after.network())).append('\n');
        TargetsSpec targets = after.request().targets();
        String heading = String.format(Locale.ROOT, "(targets: PM ≥ %s°, |GM| ≥ %s dB)",
                NumberText.significant(targets.phaseMarginDeg(), 3), NumberText.significant(targets.gainMarginDb(), 3));
        if (before == null) {
            s.append("Loop at every envelope corner ").append(heading).append(":\n");
            s.append(MarginTable.render(after.nominal(), style.colour()));
        } else {
            s.append("Loop at every envelope corner, before → after ").append(heading).append("; ")
                    .append(EnvelopeText.CROSSED).append(" marks a figure that crossed its target:\n");
            s.append(compare(before, after, targets));
        }
        s.append(boundaryNote(after.envelope())).append('\n');
        if (before != null) {
            s.append("Before:\n").append(DesignText.worst(before.nominal(), targets)).append("After:\n");
        }
        s.append(DesignText.worst(after.nominal(), targets)).append('\n');
        s.append(before == null ? EnvelopeText.section(after.worstCase())
                : EnvelopeText.compare(before.worstCase(), after.worstCase(), targets)).append('\n');
        if (after.monteCarlo() != null) {
            s.append(MonteCarloText.section(after.monteCarlo())).append('\n');
        }
        List<String> physics = new ArrayList<>(after.warnings());
        physics.removeIf(w -> w.startsWith("target missed"));
        if (!physics.isEmpty()) {
            s.append(bullets("Warnings:", physics)).append('\n');
        }
        if (!style.quiet()) {
            s.append(bullets("Rules of thumb used:", shaped.rulesOfThumb())).append('\n');
        }
        s.append(verdict(after));
        if (!style.quiet()) {
            s.append(SafetyNotice.ONE_LINE).append('\n');
        }
        return s.toString();
    }

    /** The network's kind and type, and the boost its zeros and poles give at the highest crossover. */
    private static String network(DesignResult shaped) {
        var p = shaped.placement();
        StringBuilder s = new StringBuilder(String.format(Locale.ROOT, "Network: %s, type %d (%s), parts as given in "
                        + "feedback.parts", shaped.request().feedback().amplifier().specName(), p.type(),
                shaped.rounded().kind().specName()));
        if (!Double.isNaN(p.crossoverHz()) && !(p.zerosHz().isEmpty() && p.polesHz().isEmpty())) {
            s.append(String.format(Locale.ROOT, "; %.0f° of boost at the highest crossover, %s", p.boostDeg(),
                    PartsNotation.engineering(p.crossoverHz(), "Hz", 3)));
        }
        s.append('\n');
        if (!p.zerosHz().isEmpty() || !p.polesHz().isEmpty()) {
            s.append("  zeros ").append(frequencies(p.zerosHz())).append("; poles ").append(frequencies(p.polesHz()))
                    .append(" (besides the integrator)\n");
        }
        return s.toString();
    }

    private static String frequencies(List<Double> hz) {
        return hz.isEmpty() ? "none" : String.join(", ", hz.stream().map(f -> PartsNotation.engineering(f, "Hz", 3))
                .toList());
    }

    /** One line when every target is met, else every miss naming its corner. */
    static String verdict(EnvelopeCheck check) {
        if (check.meetsTargets()) {
            return check.worstCase() == null ? "Result: every target met at every corner.\n"
                    : "Result: every target met at every corner and in the tolerance worst case.\n";
        }
        return bullets("Result: targets missed (exit code 3):", check.misses());
    }

    private static String parts(CompensatorNetwork n) {
        TextTable t = new TextTable(List.of(Column.text("part"), Column.number("value")));
        n.parts().forEach((name, v) -> t.add(List.of(name, PartsNotation.part(name, v, 4))));
        return "Parts checked:\n" + t.render();
    }

    private static String parts(CompensatorNetwork before, CompensatorNetwork after) {
        if (before.parts().equals(after.parts())) {
            return parts(after);
        }
        Set<String> names = new TreeSet<>(before.parts().keySet());
        names.addAll(after.parts().keySet());
        TextTable t = new TextTable(List.of(Column.text("part"), Column.number("before"), Column.number("after")));
        for (String name : after.parts().keySet()) {
            t.add(List.of(name, value(before, name), value(after, name)));
        }
        for (String name : names) {
            if (!after.parts().containsKey(name)) {
                t.add(List.of(name, value(before, name), "-"));
            }
        }
        return "Parts checked, before → after:\n" + t.render();
    }

    private static String value(CompensatorNetwork n, String name) {
        Double v = n.parts().get(name);
        return v == null ? "-" : PartsNotation.part(name, v, 4);
    }

    /** Corners matched by line, load setting and CTR; a corner on one side only shows "-" on the other. */
    private static String compare(EnvelopeCheck before, EnvelopeCheck after, TargetsSpec targets) {
        Map<String, CornerResult> old = new HashMap<>();
        for (int i = 0; i < before.envelope().size(); i++) {
            old.put(key(before.envelope().get(i)), before.nominal().results().get(i));
        }
        boolean withCtr = after.envelope().stream().anyMatch(c -> !Double.isNaN(c.ctr()));
        List<Column> columns = new ArrayList<>(List.of(Column.number("vin[V]"), Column.number("iout[A]")));
        if (withCtr) {
            columns.add(Column.number("ctr[%]"));
        }
        columns.addAll(List.of(Column.text("mode"), Column.number("fc[Hz]"), Column.number("PM[°]"),
                Column.number("GM[dB]"), Column.text("targets")));
        TextTable table = new TextTable(columns);
        for (int i = 0; i < after.envelope().size(); i++) {
            EnvelopeCorner c = after.envelope().get(i);
            CornerResult a = after.nominal().results().get(i);
            CornerResult b = old.get(key(c));
            List<String> row = new ArrayList<>();
            row.add(NumberText.significant(c.vinV(), 4));
            row.add(NumberText.significant(a.corner().point().iout(), 4));
            if (withCtr) {
                row.add(NumberText.significant(100 * c.ctr(), 3));
            }
            row.add(a.corner().point().mode().label());
            row.add(pair(b == null ? null : NumberText.significant(b.margins().crossoverHz(), 4),
                    NumberText.significant(a.margins().crossoverHz(), 4), false));
            row.add(pair(b == null ? null : pm(b.margins()), pm(a.margins()),
                    b != null && pmPasses(b.margins(), targets) != pmPasses(a.margins(), targets)));
            row.add(pair(b == null ? null : gm(b.margins()), gm(a.margins()),
                    b != null && gmPasses(b.margins(), targets) != gmPasses(a.margins(), targets)));
            row.add(pair(b == null ? null : verdictWord(b), verdictWord(a), false));
            table.add(row);
        }
        return table.render();
    }

    private static String key(EnvelopeCorner c) {
        return c.vinV() + "|" + c.load().describe() + "|" + c.ctr();
    }

    private static String pair(String before, String after, boolean crossed) {
        return (before == null ? "-" : before) + " → " + after + (crossed ? " " + EnvelopeText.CROSSED : "");
    }

    private static String pm(LoopMargins m) {
        return Double.isNaN(m.phaseMarginDeg()) ? "-" : String.format(Locale.ROOT, "%.1f", m.phaseMarginDeg());
    }

    private static String gm(LoopMargins m) {
        return Double.isInfinite(m.gainMarginDb()) ? "none" : String.format(Locale.ROOT, "%.1f", m.gainMarginDb());
    }

    private static boolean pmPasses(LoopMargins m, TargetsSpec t) {
        return !m.hasNoCrossover() && m.phaseMarginDeg() >= t.phaseMarginDeg();
    }

    private static boolean gmPasses(LoopMargins m, TargetsSpec t) {
        return Math.abs(m.gainMarginDb()) >= t.gainMarginDb();
    }

    private static String verdictWord(CornerResult r) {
        return r.meetsTargets() ? "ok" : "MISS";
    }

    /**
     * Names the loads placed beside the CCM/DCM boundary, which are not spec values: one line per
     * input voltage, e.g. "36 V: 1.407 A (0.98×), 1.464 A (1.02×)".
     */
    private static String boundaryNote(List<EnvelopeCorner> corners) {
        Map<Double, List<String>> byVin = new java.util.LinkedHashMap<>();
        for (EnvelopeCorner c : corners) {
            if (c.load() instanceof LoadSetting.Boundary b) {
                String entry = NumberText.significant(c.nominalIoutA(), 4) + " A (" + NumberText.significant(
                        b.factor(), 3) + "×)";
                List<String> list = byVin.computeIfAbsent(c.vinV(), v -> new ArrayList<>());
                if (!list.contains(entry)) {
                    list.add(entry);
                }
            }
        }
        if (byVin.isEmpty()) {
            return "";
        }
        List<String> lines = new ArrayList<>();
        byVin.forEach((vin, loads) -> lines.add(NumberText.significant(vin, 4) + " V: " + String.join(", ", loads)));
        return bullets("Loads beside the CCM/DCM boundary (× the boundary load):", lines);
    }

    private static String bullets(String heading, List<String> lines) {
        StringBuilder s = new StringBuilder(heading).append('\n');
        for (String l : lines) {
            s.append("  - ").append(l).append('\n');
        }
        return s.toString();
    }
}
