/**
 * The design report: {@link org.flyloop.cli.report.ReportWriter#write} turns a
 * {@link org.flyloop.cli.report.ReportInput} into a folder with a self-contained
 * {@code report.html} (inline SVG, no scripts, no external references), a {@code report.md} with
 * PNG pictures beside it, and {@code data/} holding every curve as CSV and the result as JSON.
 *
 * <p>{@link org.flyloop.cli.report.ReportInput#from} builds every curve from the library
 * ({@link org.flyloop.cli.report.DesignCurves}, {@link org.flyloop.cli.report.LoadStepCurves},
 * {@link org.flyloop.cli.report.ModelAgreement}); commands add what they computed elsewhere (other
 * models' load steps, envelope and Monte Carlo summaries, the full JSON result). The content is
 * laid out once ({@link org.flyloop.cli.report.ReportOutline}) and rendered to both page formats,
 * so they never disagree. No physics here: every number shown comes from the library.
 */
package org.flyloop.cli.report;
