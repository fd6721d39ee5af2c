package org.flyloop.network;

import java.util.LinkedHashSet;
import java.util.Map;
import java.util.Set;

/**
 * Reads a network's parts from a name→value map, remembering which names were used so that a
 * misspelt or foreign part name is reported instead of silently ignored.
 */
final class PartReader {
    private final String networkName;
    private final Map<String, Double> parts;
    private final Set<String> unused;

    PartReader(String networkName, Map<String, Double> parts) {
        this.networkName = networkName;
        this.parts = parts;
        this.unused = new LinkedHashSet<>(parts.keySet());
    }

    /** A part that must be present. */
    double required(String name) {
        Double v = parts.get(name);
        if (v == null) {
            throw new IllegalArgumentException(networkName + " needs part " + name);
        }
        unused.remove(name);
        return v;
    }

    /** A part that may be absent, then worth {@code fallback}. */
    double optional(String name, double fallback) {
        Double v = parts.get(name);
        unused.remove(name);
        return v == null ? fallback : v;
    }

    /** True when the map names this part. */
    boolean has(String name) {
        return parts.containsKey(name);
    }

    /** Fails when the map held names that no read asked for. */
    void requireAllUsed() {
        if (!unused.isEmpty()) {
            throw new IllegalArgumentException(networkName + " has no part(s) named " + unused);
        }
    }
}
