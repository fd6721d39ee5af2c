package org.flyloop.cli.output;

import java.util.Locale;
import org.apache.commons.math3.complex.Complex;
import org.flyloop.averaged.AveragedInputs;
import org.flyloop.averaged.LinearizedModel;
import org.flyloop.linear.ComplexResponse;
import org.flyloop.linear.TransferFunction;
import org.flyloop.spec.ControlScheme;
import org.flyloop.spec.ControlSpec;
import org.flyloop.stage.model.StageTransferFunctions;

/**
 * The stage transfer functions a Bode file can hold, and where each one sits in the analytic
 * model ({@link StageTransferFunctions}) and in the linearized averaged model
 * ({@link LinearizedModel}, inputs control, vin, istep; output vout).
 *
 * <p>The mapping only picks channels and applies the sign and scale conventions the two models
 * document; it computes no physics.
 */
public enum StageModelQuantity {
    /** v̂o/v̂c: voltage mode Gvd/ramp, current mode from the comparator threshold. */
    CONTROL("control to output vout/vc"),
    /** v̂o/d̂: the power stage with any current loop open (voltage mode only in the averaged model). */
    DUTY("duty to output vout/d"),
    /** v̂o/v̂in. */
    LINE("line to output vout/vin"),
    /** −v̂o/î_load, ohms (magnitude in dB relative to 1 ohm). */
    ZOUT("output impedance -vout/iload, dB ohm");

    private final String description;

    StageModelQuantity(String description) {
        this.description = description;
    }

    /** The option spelling, e.g. {@code zout}. */
    public String word() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** What the transfer function is, for the line printed after a file is written. */
    public String description() {
        return description;
    }

    /** The analytic transfer function. */
    public TransferFunction analytic(StageTransferFunctions model) {
        switch (this) {
            case CONTROL:
                return model.control();
            case DUTY:
                return model.duty();
            case LINE:
                return model.line();
            default:
                return model.outputImpedance();
        }
    }

    /**
     * False for the duty-to-output response in current mode: there the averaged model's control
     * input is the comparator voltage and its current loop is always closed, so it has no duty input.
     */
    public boolean hasAveragedCounterpart(ControlScheme scheme) {
        return !(this == DUTY && scheme == ControlScheme.CURRENT);
    }

    /**
     * The same transfer function from the linearized averaged model. Conventions (see the averaged
     * package): in voltage mode its control input is the duty cycle, so control-to-output is the
     * duty response times 1/V_ramp; the load-step input draws extra load current, so the output
     * impedance is minus that response.
     *
     * @throws IllegalArgumentException when {@link #hasAveragedCounterpart} is false
     */
    public ComplexResponse averaged(LinearizedModel model, ControlSpec control) {
        if (!hasAveragedCounterpart(control.scheme())) {
            throw new IllegalArgumentException("the averaged current-mode model has no duty input");
        }
        boolean voltageMode = control.scheme() == ControlScheme.VOLTAGE;
        switch (this) {
            case CONTROL:
                return channel(model, AveragedInputs.CONTROL, voltageMode ? 1 / control.rampV() : 1);
            case DUTY:
                return channel(model, AveragedInputs.CONTROL, 1);
            case LINE:
                return channel(model, AveragedInputs.VIN, 1);
            default:
                return channel(model, AveragedInputs.ISTEP, -1);
        }
    }

    private static ComplexResponse channel(LinearizedModel model, int input, double scale) {
        int vout = model.outputIndex("vout");
        return (frequencyHz, out) -> {
            Complex h = model.response(vout, input, frequencyHz);
            out[0] = scale * h.getReal();
            out[1] = scale * h.getImaginary();
        };
    }
}
