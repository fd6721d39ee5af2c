package org.flyloop.cli.report;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.nio.file.Path;
import java.util.Locale;
import org.flyloop.design.CornerResult;
import org.flyloop.design.DesignResult;
import org.flyloop.loop.LoadStepResponse;
import org.flyloop.verify.ClosedLoopAveragedSimulation;
import org.flyloop.verify.ClosedLoopTransient;

/**
 * Assembles and writes the report of a design: every curve from {@link ReportInput#from}, the
 * result JSON, and the averaged switch model simulated with the built compensator closing the loop
 * through the same load step as the linear prediction, overlaid on it.
 */
public final class DesignReport {

    private DesignReport() {
    }

    /** Writes the report of {@code result} into {@code dir}; returns the path of report.html. */
    public static Path write(DesignResult result, String specName, JsonNode resultJson, Path dir) throws IOException {
        ReportInput input = ReportInput.from(result, specName).withResultJson(resultJson);
        input = withAveragedLoadStep(input, result);
        return ReportWriter.write(input, dir);
    }

    /**
     * The averaged closed-loop simulation of the report's load step at the load-step corner (full
     * load, worst phase margin there), stepping up to that corner's load, sampled at the linear
     * response's times. A simulation that fails is left out with a
     * note rather than failing the report.
     */
    static ReportInput withAveragedLoadStep(ReportInput input, DesignResult result) {
        CornerResult worst = result.roundedLoop().loadStepCorner();
        if (!worst.margins().isStable()) {
            return input.withNote("averaged-model load step not simulated: the loop is unstable at "
                    + worst.corner().describe());
        }
        double step = input.loadStepA();
        double iout = worst.corner().point().iout();
        double from = iout > step ? iout - step : iout / 2;
        double to = iout > step ? iout : iout / 2 + step;
        try {
            LoadStepResponse linear = LoadStepCurves.linearResponse(result, step);
            ClosedLoopTransient run = ClosedLoopAveragedSimulation.atCorner(result, worst.corner())
                    .loadStep(worst.corner().point().vin(), from, to, linear.timesS());
            return input.withAveragedLoadStep(run.timeS(), run.voutDeviationV())
                    .withNote(String.format(Locale.ROOT, "averaged switch model with the built compensator in the "
                            + "loop: load step %.3g A → %.3g A at vin = %.4g V", from, to, worst.corner().point().vin()));
        } catch (RuntimeException e) {
            return input.withNote("averaged-model load step not simulated: " + e.getMessage());
        }
    }
}
