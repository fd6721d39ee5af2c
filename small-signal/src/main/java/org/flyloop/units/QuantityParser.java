package org.flyloop.units;

import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Reads an engineering number with an optional suffix and unit, returning the value in SI units.
 *
 * <p>Grammar: {@code number [spaces] [suffix] [unit]}.
 * <ul>
 *   <li>number: an optionally signed decimal with an optional exponent, {@code 12}, {@code -0.5},
 *       {@code .47}, {@code 2.5e-6}. The sign is the caller's business: {@code -3} parses.</li>
 *   <li>spaces: any whitespace between the number and the rest, so {@code 10 kHz} and {@code 10 k}
 *       read like {@code 10kHz}; none is allowed between suffix and unit.</li>
 *   <li>suffix (case-sensitive except where noted): {@code f}=1e-15, {@code p}=1e-12,
 *       {@code n}=1e-9, {@code u}/{@code µ}=1e-6, {@code m}=1e-3, {@code k}/{@code K}=1e3,
 *       {@code meg} in any case = 1e6, {@code g}/{@code G}=1e9.</li>
 *   <li>unit: {@code V A Hz H F ohm Ω s W S V/A V/s %}, plus {@code V/us} and {@code V/µs}
 *       (converted to V/s). Single-letter symbols are case-sensitive as in SI ({@code s} second,
 *       {@code S} siemens, {@code F} farad versus suffix {@code f}); {@code Hz} and {@code ohm} are
 *       accepted in any case. {@code %} is the dimensionless factor 0.01.</li>
 * </ul>
 *
 * <p>The {@code M} rule: an upper-case {@code M} is refused everywhere except as part of
 * {@code meg}, because engineers read it as mega while SPICE reads it as milli; {@code 1M},
 * {@code 2.2MHz} and {@code 1MΩ} are errors whose hint says to write {@code meg} or {@code e6}
 * (or {@code m} for milli).
 *
 * <p>A written unit must fit the expected one: {@code 2.2uH} for a capacitance is an error
 * naming the expected unit. A value without a unit is taken in the expected unit.
 */
public final class QuantityParser {

    private static final Pattern NUMBER =
            Pattern.compile("^([+-]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][+-]?\\d+)?)\\s*(.*)$", Pattern.DOTALL);

    /** Suffix letter(s) and their factors; {@code meg} is matched separately (any case). */
    private static final List<Prefix> PREFIXES = List.of(
            new Prefix("f", 1e-15), new Prefix("p", 1e-12), new Prefix("n", 1e-9),
            new Prefix("u", 1e-6), new Prefix("\u00b5", 1e-6), new Prefix("\u03bc", 1e-6),
            new Prefix("m", 1e-3), new Prefix("k", 1e3), new Prefix("K", 1e3),
            new Prefix("g", 1e9), new Prefix("G", 1e9));

    private static final List<Spelling> SPELLINGS = List.of(
            new Spelling("V", Unit.VOLT, 1, false),
            new Spelling("A", Unit.AMPERE, 1, false),
            new Spelling("Hz", Unit.HERTZ, 1, true),
            new Spelling("H", Unit.HENRY, 1, false),
            new Spelling("F", Unit.FARAD, 1, false),
            new Spelling("ohm", Unit.OHM, 1, true),
            new Spelling("\u03a9", Unit.OHM, 1, false),
            new Spelling("\u2126", Unit.OHM, 1, false),
            new Spelling("s", Unit.SECOND, 1, false),
            new Spelling("W", Unit.WATT, 1, false),
            new Spelling("S", Unit.SIEMENS, 1, false),
            new Spelling("V/A", Unit.VOLT_PER_AMPERE, 1, false),
            new Spelling("V/s", Unit.VOLT_PER_SECOND, 1, false),
            new Spelling("V/us", Unit.VOLT_PER_SECOND, 1e6, false),
            new Spelling("V/\u00b5s", Unit.VOLT_PER_SECOND, 1e6, false),
            new Spelling("V/\u03bcs", Unit.VOLT_PER_SECOND, 1e6, false),
            new Spelling("%", Unit.DIMENSIONLESS, 0.01, false));

    private static final String SUFFIXES = "suffixes f p n u m k meg g";

    private QuantityParser() {
    }

    /**
     * Parses {@code text} as a quantity of kind {@code expected} and returns it in SI units.
     *
     * @throws QuantityFormatException with a one-line problem and hint when the text is not a
     *                                 number, has an unknown or ambiguous suffix, or a unit that
     *                                 does not fit {@code expected}
     */
    public static double parse(String text, Unit expected) {
        String trimmed = text == null ? "" : text.strip();
        if (trimmed.isEmpty()) {
            throw new QuantityFormatException("no value", expected.hint(null));
        }
        Matcher m = NUMBER.matcher(trimmed);
        if (!m.matches()) {
            throw new QuantityFormatException("'" + shown(trimmed) + "' is not a number", expected.hint(null));
        }
        String numberText = m.group(1);
        String rest = m.group(2);
        double number = Double.parseDouble(numberText);
        if (!Double.isFinite(number)) {
            throw new QuantityFormatException("'" + shown(trimmed) + "' is too large", expected.hint(null));
        }
        Scaled scaled = readRest(rest, numberText, trimmed, expected);
        if (scaled.unit != expected) {
            throw new QuantityFormatException("unit " + shown(rest) + " does not fit a " + expected.dimension(),
                    expected.hint(numberText + scaled.prefixText));
        }
        double value = number * scaled.factor;
        if (!Double.isFinite(value)) {
            throw new QuantityFormatException("'" + shown(trimmed) + "' is too large", expected.hint(null));
        }
        return value;
    }

    /** Splits the text after the number into suffix and unit. */
    private static Scaled readRest(String rest, String numberText, String whole, Unit expected) {
        if (rest.isEmpty()) {
            return new Scaled(expected, 1, "");
        }
        String prefixText = "";
        double prefixFactor = 1;
        String unitText = rest;
        if (rest.regionMatches(true, 0, "meg", 0, 3)) {
            prefixText = rest.substring(0, 3);
            prefixFactor = 1e6;
            unitText = rest.substring(3);
        } else if (rest.startsWith("M")) {
            String unit = shown(rest.substring(1));
            throw new QuantityFormatException("'" + shown(whole) + "': M is ambiguous (milli or mega?)",
                    "write " + numberText + "meg" + unit + " or " + numberText + "e6" + unit + " for mega, "
                            + numberText + "m" + unit + " for milli");
        } else {
            Spelling direct = spelling(rest);
            if (direct != null) {
                return new Scaled(direct.unit, direct.factor, "");
            }
            for (Prefix p : PREFIXES) {
                if (rest.startsWith(p.text)) {
                    prefixText = p.text;
                    prefixFactor = p.factor;
                    unitText = rest.substring(p.text.length());
                    break;
                }
            }
        }
        if (unitText.isEmpty() && !prefixText.isEmpty()) {
            return new Scaled(expected, prefixFactor, prefixText);
        }
        Spelling s = prefixText.isEmpty() ? null : spelling(unitText);
        if (s == null) {
            throw new QuantityFormatException("'" + shown(whole) + "' has an unknown suffix or unit '"
                    + shown(rest) + "'", expected.hint(numberText) + " (" + SUFFIXES + ")");
        }
        return new Scaled(s.unit, prefixFactor * s.factor, prefixText);
    }

    private static Spelling spelling(String unitText) {
        for (Spelling s : SPELLINGS) {
            if (s.caseInsensitive ? s.text.equalsIgnoreCase(unitText) : s.text.equals(unitText)) {
                return s;
            }
        }
        return null;
    }

    /** The text as it may appear inside a one-line message: line breaks and tabs become spaces. */
    private static String shown(String s) {
        String oneLine = s.replaceAll("\\s+", " ");
        return oneLine.length() > 40 ? oneLine.substring(0, 37) + "..." : oneLine;
    }

    private record Prefix(String text, double factor) {
    }

    private record Spelling(String text, Unit unit, double factor, boolean caseInsensitive) {
    }

    private record Scaled(Unit unit, double factor, String prefixText) {
    }
}
