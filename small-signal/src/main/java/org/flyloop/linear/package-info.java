/**
 * Linear-systems core: factored transfer functions ({@link org.flyloop.linear.TransferFunction},
 * {@link org.flyloop.linear.Root}), polynomials in ascending powers of s
 * ({@link org.flyloop.linear.Polynomial}), state-space models on EJML
 * ({@link org.flyloop.linear.StateSpace}), analysis frequency grids
 * ({@link org.flyloop.linear.FrequencyGrid}), sampled responses with continuous phase
 * ({@link org.flyloop.linear.FrequencyResponse}) and level crossings for margins
 * ({@link org.flyloop.linear.Crossings}).
 *
 * <p>Conventions: frequencies in public APIs are in hertz and named so ({@code frequencyHz});
 * roots and complex s are in rad/s; phases are in degrees and continuous (never wrapped to ±180°);
 * a negative gain contributes −180°. Polynomial coefficients are always in ascending powers of s.
 */
package org.flyloop.linear;
