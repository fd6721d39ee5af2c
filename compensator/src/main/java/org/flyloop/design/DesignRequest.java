package org.flyloop.design;

import org.flyloop.spec.ControlSpec;
import org.flyloop.spec.FeedbackSpec;
import org.flyloop.spec.SeriesSpec;
import org.flyloop.spec.StageSpec;
import org.flyloop.spec.TargetsSpec;

/**
 * Everything the designer and the loop analyses need from a spec.
 *
 * @param stage    power stage
 * @param control  controller
 * @param feedback feedback network choices and given parts
 * @param targets  crossover, phase and gain margin targets
 * @param series   preferred-number series for rounding
 */
public record DesignRequest(StageSpec stage, ControlSpec control, FeedbackSpec feedback,
                            TargetsSpec targets, SeriesSpec series) {

    public DesignRequest {
        if (stage == null || control == null || feedback == null || targets == null || series == null) {
            throw new IllegalArgumentException("a design needs stage, control, feedback, targets and series");
        }
    }

    /** A copy with another stage (tolerance and recheck analyses). */
    public DesignRequest withStage(StageSpec newStage) {
        return new DesignRequest(newStage, control, feedback, targets, series);
    }

    /** A copy with another feedback section. */
    public DesignRequest withFeedback(FeedbackSpec newFeedback) {
        return new DesignRequest(stage, control, newFeedback, targets, series);
    }
}
