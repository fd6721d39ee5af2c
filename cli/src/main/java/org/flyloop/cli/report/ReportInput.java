package org.flyloop.cli.report;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.List;
import org.flyloop.cli.plot.AgreementData;
import org.flyloop.cli.plot.StepData;
import org.flyloop.design.DesignResult;
import org.flyloop.linear.FrequencyGrid;

/**
 * Everything a report shows: the design, every curve as plain data, and the optional extras a
 * command may add (other models' load steps, line step and start-up, envelope and Monte Carlo
 * summaries, the full result as JSON). Immutable; the {@code with…} methods return copies.
 *
 * @param specName    name of the spec (the report folder is usually named after it)
 * @param design      the design result
 * @param curves      every curve
 * @param loadStepA   the load step of the linear response, A
 * @param envelope    tolerance-envelope summary, or null when not computed
 * @param monteCarlo  Monte Carlo summary, or null when not computed
 * @param resultJson  the full result as the design command writes it, or null (a summary of the
 *                    design is written instead)
 * @param notes       remarks on the report itself (e.g. a curve that could not be computed)
 */
public record ReportInput(String specName, DesignResult design, ReportCurves curves, double loadStepA,
                          EnvelopeSummary envelope, MonteCarloSummary monteCarlo, JsonNode resultJson,
                          List<String> notes) {

    public ReportInput {
        if (specName == null || specName.isBlank()) {
            throw new IllegalArgumentException("a report needs the spec name");
        }
        if (design == null || curves == null) {
            throw new IllegalArgumentException("a report needs the design and its curves");
        }
        notes = List.copyOf(notes);
    }

    /**
     * Builds every curve from the library with the default load step, half of the largest load
     * ({@link LoadStepCurves#DEFAULT_STEP_FRACTION}, common practice, no source).
     */
    public static ReportInput from(DesignResult design, String specName) {
        return from(design, specName, LoadStepCurves.DEFAULT_STEP_FRACTION * design.request().stage().iout().max());
    }

    /**
     * Builds every curve from the library: stage, compensator, loop and closed-loop Bode data at
     * every corner on one grid, the linear load step of {@code loadStepA} at the worst-phase-margin
     * corner, and the analytic-versus-averaged comparison there. If the averaged model finds no
     * equilibrium, the comparison is left out and a note says why.
     */
    public static ReportInput from(DesignResult design, String specName, double loadStepA) {
        FrequencyGrid grid = DesignCurves.grid(design);
        List<String> notes = new ArrayList<>();
        AgreementData agreement = null;
        try {
            agreement = ModelAgreement.of(design, grid.lowHz());
        } catch (RuntimeException e) {
            notes.add("model agreement not shown: the averaged model could not be linearized at the worst corner ("
                    + e.getMessage() + ")");
        }
        ReportCurves curves = new ReportCurves(DesignCurves.stage(design, grid), DesignCurves.compensator(design, grid),
                DesignCurves.loop(design, grid), DesignCurves.closedLoop(design, grid),
                LoadStepCurves.loadStep(design, loadStepA), agreement, null, null);
        return new ReportInput(specName, design, curves, loadStepA, null, null, null, notes);
    }

    /** A copy with the averaged model's closed-loop load step overlaid (deviation from the pre-step output). */
    public ReportInput withAveragedLoadStep(double[] timeS, double[] deviationV) {
        return withLoadStepSeries("averaged model (large signal)", timeS, deviationV);
    }

    /** A copy with any model's load-step deviation overlaid under {@code name}. */
    public ReportInput withLoadStepSeries(String name, double[] timeS, double[] deviationV) {
        return withCurves(curves.withLoadStep(LoadStepCurves.withSeries(curves.loadStep(), name, timeS, deviationV)));
    }

    /** A copy with a line-step figure. */
    public ReportInput withLineStep(StepData lineStep) {
        return withCurves(curves.withLineStep(lineStep));
    }

    /** A copy with a start-up figure. */
    public ReportInput withStartUp(StepData startUp) {
        return withCurves(curves.withStartUp(startUp));
    }

    public ReportInput withCurves(ReportCurves newCurves) {
        return new ReportInput(specName, design, newCurves, loadStepA, envelope, monteCarlo, resultJson, notes);
    }

    public ReportInput withEnvelope(EnvelopeSummary summary) {
        return new ReportInput(specName, design, curves, loadStepA, summary, monteCarlo, resultJson, notes);
    }

    public ReportInput withMonteCarlo(MonteCarloSummary summary) {
        return new ReportInput(specName, design, curves, loadStepA, envelope, summary, resultJson, notes);
    }

    /** A copy carrying the full result JSON for {@code data/result.json}. */
    public ReportInput withResultJson(JsonNode json) {
        return new ReportInput(specName, design, curves, loadStepA, envelope, monteCarlo, json, notes);
    }

    public ReportInput withNote(String note) {
        List<String> n = new ArrayList<>(notes);
        n.add(note);
        return new ReportInput(specName, design, curves, loadStepA, envelope, monteCarlo, resultJson, n);
    }
}
