/**
 * The designer: corners, crossover bounds, pole-zero placement (Venable's K factor and direct
 * placement), part synthesis, rounding to IEC 60063 series and the analysis of every corner.
 * Entry point: {@link org.flyloop.design.Designer#design}.
 */
package org.flyloop.design;
