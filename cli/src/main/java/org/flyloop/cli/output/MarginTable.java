package org.flyloop.cli.output;

import java.util.ArrayList;
import java.util.List;
import org.flyloop.cli.output.TextTable.Column;
import org.flyloop.design.CornerResult;
import org.flyloop.design.LoopEvaluation;
import org.flyloop.loop.LoopMargins;

/**
 * The loop at every corner as one aligned table: line, load (and CTR for an optocoupler network),
 * conduction mode, crossover, phase margin, gain margin, delay margin, peak sensitivity, the
 * Nyquist verdict, and whether the corner meets its targets ({@code ok} or {@code MISS}).
 *
 * <p>A corner whose loop crosses 0 dB more than once gets a {@code *} after its crossover: the
 * crossover shown is the highest, the phase margin the smallest over all of them. A missing
 * phase crossover shows its gain margin as {@code none}.
 */
public final class MarginTable {

    /** ANSI red and reset, used for {@code MISS} only when the caller says colour is wanted. */
    private static final String RED = "\u001B[31m";
    private static final String RESET = "\u001B[0m";
    private static final String MISS = "MISS";

    private MarginTable() {
    }

    /**
     * The table text.
     *
     * @param evaluation the analysed corners
     * @param colour     mark {@code MISS} in red (only for a terminal; never in files or pipes)
     */
    public static String render(LoopEvaluation evaluation, boolean colour) {
        boolean withCtr = evaluation.results().stream().anyMatch(r -> !Double.isNaN(r.corner().ctr()));
        List<Column> columns = new ArrayList<>(List.of(Column.number("vin[V]"), Column.number("iout[A]")));
        if (withCtr) {
            columns.add(Column.number("ctr[%]"));
        }
        columns.addAll(List.of(Column.text("mode"), Column.number("fc[Hz]"), Column.number("PM[°]"),
                Column.number("GM[dB]"), Column.number("delay[µs]"), Column.number("|S|max"), Column.text("verdict"),
                Column.text("targets")));
        TextTable table = new TextTable(columns);
        boolean severalCrossovers = false;
        for (CornerResult r : evaluation.results()) {
            LoopMargins m = r.margins();
            List<String> row = new ArrayList<>();
            row.add(NumberText.significant(r.corner().point().vin(), 4));
            row.add(NumberText.significant(r.corner().point().iout(), 4));
            if (withCtr) {
                row.add(NumberText.significant(100 * r.corner().ctr(), 3));
            }
            row.add(r.corner().point().mode().label());
            String fc = NumberText.significant(m.crossoverHz(), 4);
            if (m.gainCrossovers().size() > 1) {
                fc += "*";
                severalCrossovers = true;
            }
            row.add(fc);
            row.add(oneDecimal(m.phaseMarginDeg()));
            row.add(Double.isInfinite(m.gainMarginDb()) ? "none" : oneDecimal(m.gainMarginDb()));
            row.add(NumberText.significant(m.delayMarginS() * 1e6, 3));
            row.add(String.format(java.util.Locale.ROOT, "%.2f", m.peakSensitivity()));
            row.add(m.verdict().label());
            row.add(r.meetsTargets() ? "ok" : MISS);
            table.add(row);
        }
        String text = table.render();
        if (colour) {
            // Colour after alignment: escape codes have no width on a terminal but do have a length.
            text = text.replaceAll("(?m)" + MISS + "$", RED + MISS + RESET);
        }
        if (severalCrossovers) {
            text += "* several gain crossovers: fc is the highest, PM the smallest over all of them\n";
        }
        return text;
    }

    private static String oneDecimal(double v) {
        return Double.isNaN(v) ? "-" : String.format(java.util.Locale.ROOT, "%.1f", v);
    }
}
