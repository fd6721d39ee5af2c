package org.flyloop.network;

/**
 * Thrown when requested poles, zeros and gain cannot be built with the chosen network and fixed
 * parts (a pole below its zero, a capacitance that would have to be negative, a gain under the
 * shunt-opto fast-lane floor). The message is one line fit for an engineer and says what to change.
 */
public final class UnrealisablePlacementException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    public UnrealisablePlacementException(String message) {
        super(message);
    }
}
