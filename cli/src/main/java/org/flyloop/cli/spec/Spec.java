package org.flyloop.cli.spec;

import org.flyloop.spec.ControlSpec;
import org.flyloop.spec.FeedbackSpec;
import org.flyloop.spec.SeriesSpec;
import org.flyloop.spec.StageSpec;
import org.flyloop.spec.TargetsSpec;
import org.flyloop.spec.TolerancesSpec;

/**
 * A whole spec file, read and checked, in SI units.
 *
 * @param title      the free-text title, one line ("" when absent)
 * @param source     the file name as the user gave it, for messages
 * @param stage      the power stage
 * @param control    the controller
 * @param feedback   the error amplifier and its network, or null when the spec has no feedback
 *                   section
 * @param targets    loop targets ({@link TargetsSpec#defaults()} when the section is absent)
 * @param series     preferred-number series ({@link SeriesSpec#defaults()} when absent)
 * @param tolerances component tolerances ({@link TolerancesSpec#none()} when absent)
 */
public record Spec(String title, String source, StageSpec stage, ControlSpec control, FeedbackSpec feedback,
                   TargetsSpec targets, SeriesSpec series, TolerancesSpec tolerances) {

    public Spec {
        if (stage == null || control == null || targets == null || series == null || tolerances == null) {
            throw new IllegalArgumentException("a spec needs stage, control, targets, series and tolerances");
        }
    }

    /** A spec with the stage and controller only: no feedback section, default targets and series, no tolerances. */
    public Spec(String title, String source, StageSpec stage, ControlSpec control) {
        this(title, source, stage, control, null, TargetsSpec.defaults(), SeriesSpec.defaults(),
                TolerancesSpec.none());
    }

    /** The title, or the file name when the spec has none. */
    public String displayTitle() {
        return title.isEmpty() ? source : title;
    }

    /** True when the spec has a feedback section. */
    public boolean hasFeedback() {
        return feedback != null;
    }
}
