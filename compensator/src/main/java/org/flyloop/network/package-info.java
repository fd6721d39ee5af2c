/**
 * Compensator networks: their parts, their transfer functions, and their design from requested
 * poles, zeros and gain; Venable's K factor; the shunt-opto bias limits.
 *
 * <p><b>Sign convention.</b> Every network's {@code transferFunction()} is
 * Gc(s) = −v_c(s)/v_out(s), where v_c is the amplifier or control output (for the shunt-opto
 * network, the controller's feedback-pin voltage). The error amplifier inverts: a rising output
 * lowers v_c. That inversion is the loop's negative feedback and is removed here once, so that the
 * loop gain is simply Gc·Gvc with Gvc the stage's control-to-output response, and a compensator's
 * gain is positive. Nothing downstream should negate it again.
 *
 * <p><b>Models.</b> Small-signal, linear: ideal op-amps (virtual earth; r_lower then has no AC
 * effect) unless a gain-bandwidth {@code gbw} is given, in which case the single-pole op-amp
 * response is exact (no dominant-pole shortcut); ideal OTA; ideal shunt regulator (its reference
 * is a virtual earth); optocoupler as a constant CTR plus an equivalent pin capacitance; LED as a
 * fixed drop with an optional dynamic resistance. Each formula is checked in the tests against an
 * independent modified-nodal analysis of the actual circuit.
 *
 * <p><b>Part names</b> ({@link org.flyloop.network.PartNames}) are a public contract shared with
 * the spec and JSON output. Values are SI.
 */
package org.flyloop.network;
