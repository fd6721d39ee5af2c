package org.flyloop.cli.output;

import java.util.List;
import java.util.Map;
import org.flyloop.cli.output.TextTable.Column;
import org.flyloop.network.CompensatorNetwork;

/**
 * The parts of a designed network, one row per part: its name, the exact value the placement
 * asked for, the value to build (on its preferred series) and their ratio, so a reader sees at a
 * glance which part rounding moved most.
 */
public final class PartsTable {

    /** Ideal values keep four digits: enough to see what rounding changed. */
    private static final int IDEAL_DIGITS = 4;
    /** Built values are on an E-series, which has at most three significant digits. */
    private static final int BUILT_DIGITS = 3;

    private static final List<Column> COLUMNS = List.of(Column.text("part"), Column.number("ideal"),
            Column.number("built"), Column.number("built/ideal"));

    private PartsTable() {
    }

    /**
     * The table text, in the built network's part order. Parts never rounded (CTR, gm, GBW, the
     * optocoupler's capacitance) show a ratio of 1.
     */
    public static String render(CompensatorNetwork ideal, CompensatorNetwork built) {
        TextTable table = new TextTable(COLUMNS);
        Map<String, Double> idealParts = ideal.parts();
        for (Map.Entry<String, Double> e : built.parts().entrySet()) {
            String name = e.getKey();
            double b = e.getValue();
            double i = idealParts.getOrDefault(name, Double.NaN);
            table.add(List.of(name, PartsNotation.part(name, i, IDEAL_DIGITS), PartsNotation.part(name, b, BUILT_DIGITS),
                    i > 0 ? String.format(java.util.Locale.ROOT, "%.3f", b / i) : "-"));
        }
        return table.render();
    }
}
