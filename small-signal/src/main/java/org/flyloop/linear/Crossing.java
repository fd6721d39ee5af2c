package org.flyloop.linear;

/**
 * One frequency at which a response crosses a level: |H| crossing a magnitude (linear, e.g. 1 for
 * 0 dB) or the continuous phase crossing an angle in degrees (the particular branch, e.g. −540°).
 *
 * @param frequencyHz where the crossing happens
 * @param level       the level crossed: linear magnitude, or phase in degrees
 * @param direction   whether the quantity rises or falls through the level with frequency
 */
public record Crossing(double frequencyHz, double level, Direction direction) {

    /** Sense of a crossing as frequency increases. */
    public enum Direction {
        RISING,
        FALLING
    }
}
