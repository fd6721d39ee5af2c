package org.flyloop.verify;

import org.flyloop.linear.TransferFunction;
import org.flyloop.stage.model.StageTransferFunctions;

/** Which control-to-output model the linear prediction of a comparison uses. */
public enum LinearStageModel {
    /**
     * {@link StageTransferFunctions#control()}: what the designer's loop gain uses, with Ridley's
     * sampling pair in place of the current loop's pole in current-mode CCM.
     */
    AS_DESIGNED,
    /**
     * {@link StageTransferFunctions#controlAveraged()}: the averaged current loop without sampling,
     * the same physics as the averaged simulation. Equal to {@link #AS_DESIGNED} except in
     * current-mode CCM.
     */
    AVERAGED;

    /** The control-to-output response this choice names. */
    public TransferFunction of(StageTransferFunctions stage) {
        return this == AS_DESIGNED ? stage.control() : stage.controlAveraged();
    }
}
