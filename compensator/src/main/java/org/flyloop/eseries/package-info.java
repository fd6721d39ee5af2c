/**
 * IEC 60063 preferred-number series (E3 … E192) and rounding of computed part values to them.
 *
 * <p>Rounding is logarithmic: a computed 9.9 kΩ becomes 10 kΩ in E96 because the series is a
 * (nearly) geometric progression, so the relative error, not the absolute one, is what matters.
 */
package org.flyloop.eseries;
