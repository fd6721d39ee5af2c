package org.flyloop.stage;

/** Conduction mode of the flyback's magnetizing inductance at an operating point. */
public enum ConductionMode {
    /** Continuous: the magnetizing current never reaches zero. */
    CCM,
    /** Discontinuous: the magnetizing current rests at zero for part of each period. */
    DCM,
    /** Within 1 % of the boundary load: both models apply. */
    BOUNDARY;

    /** The word used in reports and JSON. */
    public String label() {
        return this == BOUNDARY ? "boundary" : name();
    }
}
