package org.flyloop.envelope;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.flyloop.spec.TargetsSpec;

/**
 * The result of the worst-case analysis.
 *
 * @param phaseMargin      the smallest phase margin
 * @param gainMargin       the gain margin of smallest magnitude
 * @param lowestCrossover  the lowest crossover
 * @param highestCrossover the highest crossover
 * @param method           how the tolerance box was searched, one line
 * @param parameters       the toleranced quantities that were varied, by name
 * @param loopsAnalysed    loops evaluated (corners × tolerance sets, refinement included)
 * @param infeasible       corners and tolerance sets where the stage cannot run, one line each
 */
public record WorstCase(WorstFigure phaseMargin, WorstFigure gainMargin, WorstFigure lowestCrossover,
                        WorstFigure highestCrossover, String method, List<String> parameters, long loopsAnalysed,
                        List<String> infeasible) {

    public WorstCase {
        parameters = List.copyOf(parameters);
        infeasible = List.copyOf(infeasible);
    }

    /** The worst of {@code figure}. */
    public WorstFigure of(EnvelopeFigure figure) {
        return switch (figure) {
            case PHASE_MARGIN -> phaseMargin;
            case GAIN_MARGIN -> gainMargin;
            case LOWEST_CROSSOVER -> lowestCrossover;
            case HIGHEST_CROSSOVER -> highestCrossover;
        };
    }

    /**
     * The targets the worst case misses, one line each ("at &lt;corner&gt;: phase margin 41.2° below
     * the 45° target"); empty when every one is met.
     */
    public List<String> misses(TargetsSpec targets) {
        List<String> out = new ArrayList<>();
        for (String s : infeasible) {
            out.add("at " + s);
        }
        if (phaseMargin.isPresent()) {
            String at = "at " + phaseMargin.corner().label() + ": ";
            if (phaseMargin.value() == Double.NEGATIVE_INFINITY) {
                out.add(at + "no gain crossover: |T| stays on one side of 0 dB up to fsw/2");
            } else if (phaseMargin.value() < targets.phaseMarginDeg()) {
                out.add(at + String.format(Locale.ROOT, "phase margin %.1f° below the %.1f° target",
                        phaseMargin.value(), targets.phaseMarginDeg()));
            }
        }
        if (gainMargin.isPresent() && Math.abs(gainMargin.value()) < targets.gainMarginDb()) {
            out.add("at " + gainMargin.corner().label() + ": " + String.format(Locale.ROOT,
                    "gain margin %.1f dB inside the ±%.1f dB target", gainMargin.value(), targets.gainMarginDb()));
        }
        return out;
    }

    /** True when no target is missed. */
    public boolean meets(TargetsSpec targets) {
        return misses(targets).isEmpty();
    }
}
