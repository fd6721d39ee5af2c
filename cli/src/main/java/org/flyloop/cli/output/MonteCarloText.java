package org.flyloop.cli.output;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.flyloop.cli.output.TextTable.Column;
import org.flyloop.envelope.CornerDistribution;
import org.flyloop.envelope.Distribution;
import org.flyloop.envelope.LoadSetting;
import org.flyloop.envelope.MonteCarloResult;

/**
 * A Monte Carlo run as text: the per-unit worst figures, the share of units that miss a target
 * somewhere, and a table of percentiles per corner.
 */
public final class MonteCarloText {

    private MonteCarloText() {
    }

    /** The section. */
    public static String section(MonteCarloResult r) {
        StringBuilder s = new StringBuilder(String.format(Locale.ROOT,
                "Monte Carlo: %d samples, seed %d, each quantity uniform within its band (%s):%n", r.samples(),
                r.seed(), String.join(", ", r.parameters())));
        Distribution pm = r.worstPhaseMarginDeg();
        Distribution gm = r.worstGainMarginDb();
        s.append(String.format(Locale.ROOT, "  per unit, worst corner: PM p01 %s°, p50 %s°, p99 %s°, min %s°; "
                        + "|GM| p01 %s dB, p50 %s dB, min %s dB%n", deg(pm.p01()), deg(pm.p50()), deg(pm.p99()),
                deg(pm.min()), db(gm.p01()), db(gm.p50()), db(gm.min())));
        s.append(String.format(Locale.ROOT, "  units missing a target at some corner: %s %%%n",
                NumberText.significant(100 * r.fractionFailing(), 3)));
        boolean withCtr = r.corners().stream().anyMatch(c -> !Double.isNaN(c.corner().ctr()));
        List<Column> columns = new ArrayList<>(List.of(Column.number("  vin[V]"), Column.number("iout[A]")));
        if (withCtr) {
            columns.add(Column.number("ctr[%]"));
        }
        columns.addAll(List.of(Column.number("PM p01[°]"), Column.number("p50"), Column.number("p99"),
                Column.number("|GM| p01[dB]"), Column.number("p50"), Column.number("fc p01[Hz]"),
                Column.number("p50"), Column.number("p99"), Column.number("missing[%]")));
        TextTable table = new TextTable(columns);
        for (CornerDistribution c : r.corners()) {
            List<String> row = new ArrayList<>();
            row.add("  " + NumberText.significant(c.corner().vinV(), 4));
            String iout = NumberText.significant(c.corner().nominalIoutA(), 4);
            row.add(c.corner().load() instanceof LoadSetting.Boundary ? iout + "~" : iout);
            if (withCtr) {
                row.add(NumberText.significant(100 * c.corner().ctr(), 3));
            }
            row.add(deg(c.phaseMarginDeg().p01()));
            row.add(deg(c.phaseMarginDeg().p50()));
            row.add(deg(c.phaseMarginDeg().p99()));
            row.add(db(c.gainMarginDb().p01()));
            row.add(db(c.gainMarginDb().p50()));
            row.add(NumberText.significant(c.crossoverHz().p01(), 4));
            row.add(NumberText.significant(c.crossoverHz().p50(), 4));
            row.add(NumberText.significant(c.crossoverHz().p99(), 4));
            row.add(NumberText.significant(100 * c.fractionFailing(), 3));
            table.add(row);
        }
        s.append(table.render());
        if (r.corners().stream().anyMatch(c -> c.corner().load() instanceof LoadSetting.Boundary)) {
            s.append("  ~ a load beside the CCM/DCM boundary, which follows each sample's inductance\n");
        }
        return s.toString();
    }

    private static String deg(double v) {
        return Double.isNaN(v) ? "-" : v == Double.NEGATIVE_INFINITY ? "none" : String.format(Locale.ROOT, "%.1f", v);
    }

    private static String db(double v) {
        return Double.isNaN(v) ? "-" : Double.isInfinite(v) ? "inf" : String.format(Locale.ROOT, "%.1f", v);
    }
}
