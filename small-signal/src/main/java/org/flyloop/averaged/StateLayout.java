package org.flyloop.averaged;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * The ordered states of an averaged circuit. Components append their states, so a circuit with an
 * input filter or an output post-filter extends the layout instead of renumbering by hand.
 * Immutable.
 */
public final class StateLayout {

    private final List<StateVariable> states;

    private StateLayout(List<StateVariable> states) {
        this.states = Collections.unmodifiableList(new ArrayList<>(states));
        for (int i = 0; i < states.size(); i++) {
            for (int j = i + 1; j < states.size(); j++) {
                if (states.get(i).name().equals(states.get(j).name())) {
                    throw new IllegalArgumentException("duplicate state name " + states.get(i).name());
                }
            }
        }
    }

    /** A layout of the given states in order. */
    public static StateLayout of(List<StateVariable> states) {
        return new StateLayout(states);
    }

    /** This layout followed by {@code more}. */
    public StateLayout followedBy(List<StateVariable> more) {
        List<StateVariable> all = new ArrayList<>(states);
        all.addAll(more);
        return new StateLayout(all);
    }

    public int size() {
        return states.size();
    }

    public List<StateVariable> states() {
        return states;
    }

    public StateVariable get(int index) {
        return states.get(index);
    }

    /** Index of the state called {@code name}; throws when absent. */
    public int indexOf(String name) {
        for (int i = 0; i < states.size(); i++) {
            if (states.get(i).name().equals(name)) {
                return i;
            }
        }
        throw new IllegalArgumentException("no state called " + name);
    }

    /** Per-state magnitude floor: max(|x_i|, typical_i). */
    public double scaleOf(int index, double value) {
        return Math.max(Math.abs(value), states.get(index).typicalMagnitude());
    }

    /** The state names in order. */
    public List<String> names() {
        List<String> out = new ArrayList<>();
        for (StateVariable s : states) {
            out.add(s.name());
        }
        return out;
    }
}
