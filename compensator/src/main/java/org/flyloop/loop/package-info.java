/**
 * Loop analysis: the loop gain of stage, modulator and compensator; every gain and phase crossover
 * with its margin; delay margin; peak sensitivity; the Nyquist stability verdict; closed-loop
 * responses and the linear load-step response.
 */
package org.flyloop.loop;
