package org.flyloop.averaged;

/**
 * A large-signal simulation case: where it starts, the load resistor, and how the inputs move.
 *
 * @param name              short label for reports
 * @param fromSteadyState   true: start in the equilibrium at the inputs just before time 0 (so a
 *                          step at time 0 acts on the steady state);
 *                          false: start with every state at zero (start-up)
 * @param loadResistanceOhm load resistor, Ω
 * @param inputs            the input profile
 */
public record Scenario(String name, boolean fromSteadyState, double loadResistanceOhm, InputProfile inputs) {

    public Scenario {
        if (!(loadResistanceOhm > 0)) {
            throw new IllegalArgumentException("load resistance must be positive");
        }
    }

    /** Start-up from all states at zero with constant inputs. */
    public static Scenario startUp(AveragedInputs u, double loadResistanceOhm) {
        return new Scenario("start-up", false, loadResistanceOhm, InputProfile.constant(u));
    }

    /** From steady state at {@code u}, the control input steps to {@code newControl} at {@code atS}. */
    public static Scenario controlStep(AveragedInputs u, double loadResistanceOhm, double newControl, double atS) {
        return new Scenario("control step", true, loadResistanceOhm,
                InputProfile.constant(u).step(AveragedInputs.CONTROL, atS, newControl));
    }

    /** From steady state at {@code u}, the input voltage steps to {@code newVinV} at {@code atS}. */
    public static Scenario lineStep(AveragedInputs u, double loadResistanceOhm, double newVinV, double atS) {
        return new Scenario("line step", true, loadResistanceOhm,
                InputProfile.constant(u).step(AveragedInputs.VIN, atS, newVinV));
    }

    /** From steady state at {@code u}, the load-step source steps to {@code newIStepA} at {@code atS}. */
    public static Scenario loadStep(AveragedInputs u, double loadResistanceOhm, double newIStepA, double atS) {
        return new Scenario("load step", true, loadResistanceOhm,
                InputProfile.constant(u).step(AveragedInputs.ISTEP, atS, newIStepA));
    }

    /** From steady state at {@code u}, the load-step source ramps to {@code endIStepA} over [startS, endS]. */
    public static Scenario loadRamp(AveragedInputs u, double loadResistanceOhm, double endIStepA,
                                    double startS, double endS) {
        return new Scenario("load ramp", true, loadResistanceOhm,
                InputProfile.constant(u).ramp(AveragedInputs.ISTEP, startS, endS, endIStepA));
    }
}
