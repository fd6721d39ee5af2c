/**
 * Spec files: safe YAML reading ({@link org.flyloop.cli.spec.SafeYamlReader}), the table of
 * sections and their keys ({@link org.flyloop.cli.spec.SpecLoader}, one reader class per
 * section), command-line {@code --set path=value} overrides applied to the YAML tree before
 * reading ({@link org.flyloop.cli.spec.SpecOverrides}), and one-line located errors
 * ({@link org.flyloop.cli.spec.InputException}). The result is a {@link org.flyloop.cli.spec.Spec}
 * holding the shared {@code org.flyloop.spec} records in SI units.
 */
package org.flyloop.cli.spec;
