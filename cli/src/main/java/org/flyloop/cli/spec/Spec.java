package org.flyloop.cli.spec;

import org.flyloop.spec.ControlSpec;
import org.flyloop.spec.StageSpec;

/**
 * A whole spec file, read and checked, in SI units.
 *
 * @param title   the free-text title, one line ("" when absent)
 * @param source  the file name as the user gave it, for messages
 * @param stage   the power stage
 * @param control the controller
 */
public record Spec(String title, String source, StageSpec stage, ControlSpec control) {

    /** The title, or the file name when the spec has none. */
    public String displayTitle() {
        return title.isEmpty() ? source : title;
    }
}
