package org.flyloop.switching;

/** Which linear sub-circuit is active. */
enum Topology {
    /** Switch on, rectifier reverse-biased: Vin drives the magnetizing inductance. */
    SWITCH_ON,
    /** Switch off, rectifier conducting: the reflected output demagnetizes the core. */
    RECTIFYING,
    /** Both off (DCM): the magnetizing current rests at zero, the capacitor feeds the load. */
    IDLE
}
