/**
 * Analytic small-signal models of the flyback power stage: control-to-output, duty-to-output,
 * line-to-output and output impedance in CCM and DCM under voltage-mode and peak-current-mode
 * control, each with its labelled poles and zeros. Entry point: {@link
 * org.flyloop.stage.model.AnalyticStageModel#at}.
 */
package org.flyloop.stage.model;
