package org.flyloop.spec;

/**
 * Preferred-number series (IEC 60063) the designer rounds parts to.
 *
 * @param resistors  series name for resistors, e.g. "E96"
 * @param capacitors series name for capacitors, e.g. "E12"
 */
public record SeriesSpec(String resistors, String capacitors) {

    /** E96 resistors, E12 capacitors. */
    public static SeriesSpec defaults() {
        return new SeriesSpec("E96", "E12");
    }
}
