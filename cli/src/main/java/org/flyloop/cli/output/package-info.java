/**
 * Output formats: aligned text tables, JSON documents, the design report and the safety notice.
 * Formatting only; every number shown was computed elsewhere. The design report's pieces
 * ({@link org.flyloop.cli.output.DesignJson}, {@link org.flyloop.cli.output.MarginJson},
 * {@link org.flyloop.cli.output.DesignText} and its sections, {@link org.flyloop.cli.output.MarginTable},
 * {@link org.flyloop.cli.output.PartsTable}) are public so that other commands and reports reuse
 * them instead of formatting a design twice.
 */
package org.flyloop.cli.output;
