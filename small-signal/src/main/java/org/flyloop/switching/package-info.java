/**
 * Cycle-by-cycle simulation of the flyback's piecewise-linear circuit, independent of the
 * closed-form operating points in {@code org.flyloop.stage}.
 *
 * <p>The state is the magnetizing current, referred to the primary throughout this package, and
 * the output-capacitor voltage. The switch is ideal with on-resistance Rds, the rectifier ideal
 * with forward drop Vf and conducting only while the secondary current is positive, the capacitor
 * has an ESR, and the load is a resistor plus an optional current sink. Each switching interval is
 * integrated with Commons Math's Dormand–Prince 8(5,3) integrator; the comparator trip (peak
 * current control) and the rectifier turn-off are located by its event handlers.
 *
 * <p>Steady state is found by Newton shooting on the one-period map, then confirmed by plain
 * cycles; the map's Jacobian gives the cycle multipliers (stability of the periodic orbit).
 */
package org.flyloop.switching;
