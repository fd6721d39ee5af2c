package org.flyloop.cli.report;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.flyloop.envelope.Distribution;
import org.flyloop.envelope.EnvelopeCheck;
import org.flyloop.envelope.EnvelopeFigure;
import org.flyloop.envelope.MonteCarloResult;
import org.flyloop.envelope.WorstCase;
import org.flyloop.envelope.WorstFigure;

/**
 * The report of a recheck: the given parts analysed like a design (every curve, the averaged
 * closed-loop load step), plus the tolerance worst case and the Monte Carlo spread as summaries.
 */
public final class CheckReport {

    private CheckReport() {
    }

    /** Writes the report of {@code check} into {@code dir}; returns the directory. */
    public static Path write(EnvelopeCheck check, String specName, JsonNode resultJson, Path dir) throws IOException {
        var design = check.asDesignResult();
        ReportInput input = ReportInput.from(design, specName).withResultJson(resultJson);
        input = DesignReport.withAveragedLoadStep(input, design);
        if (check.worstCase() != null) {
            input = input.withEnvelope(envelope(check));
        }
        if (check.monteCarlo() != null) {
            input = input.withMonteCarlo(monteCarlo(check));
        }
        return ReportWriter.write(input, dir);
    }

    static EnvelopeSummary envelope(EnvelopeCheck check) {
        WorstCase w = check.worstCase();
        List<EnvelopeSummary.WorstCase> rows = new ArrayList<>();
        for (EnvelopeFigure f : EnvelopeFigure.values()) {
            WorstFigure figure = w.of(f);
            if (figure.isPresent()) {
                rows.add(new EnvelopeSummary.WorstCase(f == EnvelopeFigure.PHASE_MARGIN ? "phase margin"
                        : f == EnvelopeFigure.GAIN_MARGIN ? "gain margin"
                        : f == EnvelopeFigure.LOWEST_CROSSOVER ? "lowest crossover" : "highest crossover",
                        figure.value(), unit(f), condition(figure)));
            }
        }
        List<String> notes = new ArrayList<>(w.infeasible());
        notes.add("toleranced: " + String.join(", ", w.parameters()));
        return new EnvelopeSummary(w.method(), (int) Math.min(Integer.MAX_VALUE, w.loopsAnalysed()),
                w.meets(check.request().targets()), rows, notes);
    }

    private static String unit(EnvelopeFigure f) {
        return switch (f) {
            case PHASE_MARGIN -> "°";
            case GAIN_MARGIN -> "dB";
            default -> "Hz";
        };
    }

    private static String condition(WorstFigure f) {
        StringBuilder s = new StringBuilder(f.corner().label());
        for (Map.Entry<String, Double> e : f.deviations().entrySet()) {
            if (e.getValue() != 0) {
                s.append(String.format(Locale.ROOT, ", %s %+.1f %%", e.getKey(), 100 * e.getValue()));
            }
        }
        return s.toString();
    }

    static MonteCarloSummary monteCarlo(EnvelopeCheck check) {
        MonteCarloResult mc = check.monteCarlo();
        int meeting = (int) Math.round(mc.samples() * (1 - mc.fractionFailing()));
        List<MonteCarloSummary.Distribution> rows = List.of(
                row("worst phase margin", "°", mc.worstPhaseMarginDeg()),
                row("worst gain margin", "dB", mc.worstGainMarginDb()));
        return new MonteCarloSummary(mc.samples(), mc.seed(), meeting, rows,
                List.of("uniform within each tolerance, toleranced: " + String.join(", ", mc.parameters())));
    }

    private static MonteCarloSummary.Distribution row(String name, String unit, Distribution d) {
        return new MonteCarloSummary.Distribution(name, unit, d.min(), d.p01(), d.p50(), d.p99(), d.max());
    }
}
