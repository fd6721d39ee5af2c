package org.flyloop.cli.output;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;

/**
 * Compares a design's JSON with a committed expected copy, within tolerances that separate
 * numerical noise from a change of the model:
 * <ul>
 *   <li>strings, booleans, nulls, integers, object keys and array lengths: exact;</li>
 *   <li>keys ending in {@code _deg}: 0.1° absolute; keys ending in {@code _db}: 0.1 dB absolute;</li>
 *   <li>every other number (frequencies, parts, times, voltages, currents, ratios): 0.1 %
 *       relative.</li>
 * </ul>
 * A number inside an array takes the tolerance of the array's key ({@code zeros_hz}). Every
 * difference is reported with its JSON path, so one run lists all of them.
 */
final class GoldenJson {

    static final double RELATIVE = 1e-3;
    static final double DEGREES = 0.1;
    static final double DECIBELS = 0.1;

    private GoldenJson() {
    }

    /** The differences between {@code expected} and {@code actual}, one line each; empty when they agree. */
    static List<String> differences(JsonNode expected, JsonNode actual) {
        List<String> out = new ArrayList<>();
        compare("$", "", expected, actual, out);
        return out;
    }

    private static void compare(String path, String key, JsonNode e, JsonNode a, List<String> out) {
        if (e.getNodeType() != a.getNodeType()) {
            out.add(path + ": expected " + e.getNodeType() + " " + e + ", got " + a.getNodeType() + " " + a);
            return;
        }
        if (e.isObject()) {
            Set<String> ek = names(e.fieldNames());
            Set<String> ak = names(a.fieldNames());
            if (!ek.equals(ak)) {
                out.add(path + ": keys " + ek + " expected, got " + ak);
                return;
            }
            for (String k : ek) {
                compare(path + "." + k, k, e.get(k), a.get(k), out);
            }
        } else if (e.isArray()) {
            if (e.size() != a.size()) {
                out.add(path + ": " + e.size() + " elements expected, got " + a.size());
                return;
            }
            for (int i = 0; i < e.size(); i++) {
                compare(path + "[" + i + "]", key, e.get(i), a.get(i), out);
            }
        } else if (e.isIntegralNumber()) {
            if (e.longValue() != a.longValue()) {
                out.add(path + ": expected " + e + ", got " + a);
            }
        } else if (e.isNumber()) {
            double x = e.doubleValue();
            double y = a.doubleValue();
            if (key.endsWith("_deg") && Math.abs(x - y) > DEGREES) {
                out.add(path + ": expected " + x + "°, got " + y + "° (tolerance " + DEGREES + "°)");
            } else if (key.endsWith("_db") && Math.abs(x - y) > DECIBELS) {
                out.add(path + ": expected " + x + " dB, got " + y + " dB (tolerance " + DECIBELS + " dB)");
            } else if (!key.endsWith("_deg") && !key.endsWith("_db")
                    && Math.abs(x - y) > RELATIVE * Math.max(Math.abs(x), Math.abs(y))) {
                out.add(path + ": expected " + x + ", got " + y + " (tolerance " + 100 * RELATIVE + " %)");
            }
        } else if (!e.equals(a)) {
            out.add(path + ": expected " + e + ", got " + a);
        }
    }

    private static Set<String> names(Iterator<String> it) {
        Set<String> s = new TreeSet<>();
        it.forEachRemaining(s::add);
        return s;
    }
}
