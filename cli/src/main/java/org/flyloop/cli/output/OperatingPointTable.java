package org.flyloop.cli.output;

import java.util.ArrayList;
import java.util.List;
import org.flyloop.cli.output.TextTable.Column;
import org.flyloop.stage.ConductionMode;
import org.flyloop.stage.OperatingPoint;

/** Operating points as a compact aligned table, one row per point, units in the header. */
public final class OperatingPointTable {

    private static final int DIGITS = 4;

    private static final List<Column> COLUMNS = List.of(
            Column.number("vin[V]"), Column.number("iout[A]"), Column.text("mode"),
            Column.number("D"), Column.number("D2"), Column.number("Ipk[A]"), Column.number("Ivalley[A]"),
            Column.number("Isec,pk[A]"), Column.number("Isw,rms[A]"), Column.number("Irect,rms[A]"),
            Column.number("Iin,avg[A]"), Column.number("Iout,bnd[A]"), Column.number("Vsw,max[V]"));

    private OperatingPointTable() {
    }

    /**
     * The table text. D2 is shown as {@code -} in CCM, where it is not an independent interval
     * (it equals 1 − D).
     */
    public static String render(List<OperatingPoint> points) {
        TextTable table = new TextTable(COLUMNS);
        for (OperatingPoint p : points) {
            List<String> row = new ArrayList<>();
            row.add(n(p.vin()));
            row.add(n(p.iout()));
            row.add(p.mode().label());
            row.add(n(p.duty()));
            row.add(p.mode() == ConductionMode.CCM ? "-" : n(p.duty2()));
            row.add(n(p.ipk()));
            row.add(n(p.ivalley()));
            row.add(n(p.isecPk()));
            row.add(n(p.iswRms()));
            row.add(n(p.irectRms()));
            row.add(n(p.iinAvg()));
            row.add(n(p.ioutBoundary()));
            row.add(n(p.vswMax()));
            table.add(row);
        }
        return table.render();
    }

    private static String n(double v) {
        return NumberText.significant(v, DIGITS);
    }
}
