package org.flyloop.cli.report;

import org.flyloop.cli.plot.AgreementData;
import org.flyloop.cli.plot.BodeData;
import org.flyloop.cli.plot.StepData;

/**
 * Every curve a report shows, as plain data.
 *
 * @param stage        power stage control-to-output per operating point
 * @param compensator  compensator, standard and exact parts
 * @param loop         loop gain per corner with crossovers and margins
 * @param closedLoop   reference-to-output per corner
 * @param loadStep     load step, linear model and any overlaid models
 * @param agreement    analytic versus averaged model, or null when not computed
 * @param lineStep     line step, or null when not given
 * @param startUp      start-up, or null when not given
 */
public record ReportCurves(BodeData stage, BodeData compensator, BodeData loop, BodeData closedLoop,
                           StepData loadStep, AgreementData agreement, StepData lineStep, StepData startUp) {

    public ReportCurves withLoadStep(StepData d) {
        return new ReportCurves(stage, compensator, loop, closedLoop, d, agreement, lineStep, startUp);
    }

    public ReportCurves withLineStep(StepData d) {
        return new ReportCurves(stage, compensator, loop, closedLoop, loadStep, agreement, d, startUp);
    }

    public ReportCurves withStartUp(StepData d) {
        return new ReportCurves(stage, compensator, loop, closedLoop, loadStep, agreement, lineStep, d);
    }

    public ReportCurves withAgreement(AgreementData d) {
        return new ReportCurves(stage, compensator, loop, closedLoop, loadStep, d, lineStep, startUp);
    }
}
