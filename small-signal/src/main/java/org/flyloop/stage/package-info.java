/**
 * The flyback power stage at DC: operating points (duty cycles, peak/valley/RMS currents,
 * conduction mode) from volt-second and charge balance, and the refusals when a point cannot be
 * reached.
 *
 * <p>Currents are referred to the primary unless the name says secondary; units are SI. The
 * cycle-by-cycle circuit simulation that checks these closed forms lives in
 * {@code org.flyloop.switching}.
 */
package org.flyloop.stage;
