package org.flyloop.spec;

/** How the controller turns the error signal into a duty cycle. */
public enum ControlScheme {
    /** Duty-cycle control: the error voltage is compared with a fixed PWM ramp. */
    VOLTAGE,
    /** Peak-current-mode control: the error voltage sets the peak primary current. */
    CURRENT;

    /** The spec-file word for this scheme. */
    public String specName() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }
}
