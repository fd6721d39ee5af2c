package org.flyloop.averaged;

/**
 * One state of an averaged circuit.
 *
 * @param name             short identifier, unique within a {@link StateLayout}
 * @param unit             SI unit symbol ("A", "V")
 * @param typicalMagnitude a magnitude the state commonly reaches (same unit), used to scale
 *                         finite-difference steps and convergence tests where the state itself is
 *                         near zero; must be positive
 */
public record StateVariable(String name, String unit, double typicalMagnitude) {

    public StateVariable {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("a state needs a name");
        }
        if (!(typicalMagnitude > 0) || !Double.isFinite(typicalMagnitude)) {
            throw new IllegalArgumentException("typical magnitude of " + name + " must be positive");
        }
    }
}
