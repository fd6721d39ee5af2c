package org.flyloop.stage.model;

import java.util.List;
import org.flyloop.linear.TransferFunction;
import org.flyloop.stage.OperatingPoint;

/**
 * The small-signal behaviour of the flyback stage at one operating point.
 *
 * @param point               the operating point the model is linearized at
 * @param control             control-to-output v̂o/v̂c: for voltage mode Gvd/ramp; for current mode
 *                            from the comparator threshold vc = Ri·i_pk + Se·d·Ts, before any
 *                            feedback-pin divider
 * @param controlAveraged     the same without the current loop's sampling effect (current mode,
 *                            CCM: the averaged model's own current-loop pole instead of Ridley's
 *                            sampling pair); equal to {@code control} otherwise. This is what an
 *                            averaged switch model can be compared with.
 * @param duty                duty-to-output v̂o/d̂ (the power stage with the current loop open)
 * @param line                line-to-output v̂o/v̂in (with the current loop closed in current mode)
 * @param outputImpedance     open-voltage-loop output impedance −v̂o/î_load, Ω
 * @param features            poles and zeros of {@code control}, labelled
 * @param rhpZeroHz           the CCM right-half-plane zero of {@code control}, Hz, NaN in DCM
 * @param qp                  Ridley's sampling Q (current mode, CCM), NaN otherwise
 * @param slopeForUnityQpVPerS compensation slope at the comparator that gives Qp = 1, V/s
 *                            (current mode, CCM), NaN otherwise
 * @param warnings            physics warnings (subharmonic risk), empty when none
 */
public record StageTransferFunctions(OperatingPoint point, TransferFunction control,
                                     TransferFunction controlAveraged, TransferFunction duty, TransferFunction line,
                                     TransferFunction outputImpedance, List<PoleZero> features,
                                     double rhpZeroHz, double qp, double slopeForUnityQpVPerS,
                                     List<String> warnings) {

    public StageTransferFunctions {
        features = List.copyOf(features);
        warnings = List.copyOf(warnings);
    }
}
