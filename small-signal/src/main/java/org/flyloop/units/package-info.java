/**
 * Engineering numbers with units, as engineers type them in a spec file or on the command line.
 *
 * <p>{@link org.flyloop.units.QuantityParser} turns text such as {@code 4.7uF}, {@code 65kHz},
 * {@code 40mΩ} or {@code 2.5e-6} into an SI {@code double}, checking that a written unit fits the
 * quantity the caller expects ({@link org.flyloop.units.Unit}). Everything here is a pure function
 * of its arguments: no file formats, no I/O, no state.
 */
package org.flyloop.units;
