package org.flyloop.averaged;

import java.util.List;

/**
 * The three inputs of the averaged flyback, in SI units.
 *
 * @param control  voltage mode: the duty cycle d (0..1, the PWM ramp gain is not included);
 *                 peak current mode: the comparator control voltage vc in volts
 * @param vinV     input voltage at the primary, V
 * @param iStepA   extra load current drawn by a current source in parallel with the load
 *                 resistor, A (the load-step input)
 */
public record AveragedInputs(double control, double vinV, double iStepA) {

    /** Input names in the column order of linearized B and D matrices. */
    public static final List<String> NAMES = List.of("control", "vin", "istep");
    /** Column of the control input. */
    public static final int CONTROL = 0;
    /** Column of the input voltage. */
    public static final int VIN = 1;
    /** Column of the load-current step. */
    public static final int ISTEP = 2;

    public AveragedInputs {
        if (!Double.isFinite(control) || !Double.isFinite(vinV) || !Double.isFinite(iStepA)) {
            throw new IllegalArgumentException("inputs must be finite: " + control + ", " + vinV + ", " + iStepA);
        }
    }

    /** Input {@code index} in {@link #NAMES} order. */
    public double get(int index) {
        switch (index) {
            case CONTROL:
                return control;
            case VIN:
                return vinV;
            case ISTEP:
                return iStepA;
            default:
                throw new IndexOutOfBoundsException("input index " + index);
        }
    }

    /** A copy with input {@code index} replaced by {@code value}. */
    public AveragedInputs with(int index, double value) {
        switch (index) {
            case CONTROL:
                return new AveragedInputs(value, vinV, iStepA);
            case VIN:
                return new AveragedInputs(control, value, iStepA);
            case ISTEP:
                return new AveragedInputs(control, vinV, value);
            default:
                throw new IndexOutOfBoundsException("input index " + index);
        }
    }

    public AveragedInputs withControl(double value) {
        return with(CONTROL, value);
    }
}
