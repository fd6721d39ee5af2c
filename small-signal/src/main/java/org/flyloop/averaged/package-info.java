/**
 * The nonlinear averaged flyback model: one set of averaged-switch equations that moves between
 * CCM and DCM by itself (full-order DCM model of Sun, Mitchell, Greuel, Krein and Bass, IEEE TPEL
 * 16(4), 2001), voltage-mode or peak-current-mode control (averaged peak relation after Erickson
 * and Maksimović, Fundamentals of Power Electronics, 2nd ed., 2001, §12.3).
 *
 * <p>Referral: everything is referred to the secondary — magnetizing current iL (state "il"),
 * Ls = Lm/N², Vg′ = Vin/N, Rds′ = Rds/N². Reports give the primary-referred magnetizing current
 * iL/N where the name says primary. The output network (capacitor with ESR, load resistor and a
 * load-step current source) holds the state "vc".
 *
 * <p>What it offers, all through {@link org.flyloop.averaged.AveragedFlybackModel}:
 * <ul>
 *   <li>equilibria (Newton with line search, simulation fallback), also regulated to the spec's
 *       output voltage;</li>
 *   <li>central-difference linearization into a {@link org.flyloop.averaged.LinearizedModel}
 *       (inputs control, vin, istep; outputs vout, il) that converts to the core's
 *       {@code StateSpace};</li>
 *   <li>large-signal simulation of {@link org.flyloop.averaged.Scenario}s with an adaptive
 *       Dormand–Prince integrator and located mode changes;</li>
 *   <li>a SPICE netlist of the same equations for ngspice
 *       ({@link org.flyloop.averaged.SpiceNetlistWriter}).</li>
 * </ul>
 * More states (an input filter, an output post-filter) are added by a new
 * {@link org.flyloop.averaged.OutputNetwork} or circuit behind the
 * {@link org.flyloop.averaged.AveragedCircuit} interface; the solver, linearizer and simulator
 * only see that interface.
 */
package org.flyloop.averaged;
