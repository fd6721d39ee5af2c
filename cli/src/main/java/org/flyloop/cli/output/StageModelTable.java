package org.flyloop.cli.output;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import org.flyloop.cli.output.TextTable.Column;
import org.flyloop.stage.OperatingPoint;
import org.flyloop.stage.model.PoleZero;
import org.flyloop.stage.model.StageTransferFunctions;

/**
 * The small-signal summary of each operating point as a compact table: the poles and zeros of
 * the control-to-output function Gvc = v̂o/v̂c (Hz, with Q for complex pairs), the CCM RHP zero,
 * Ridley's Qp, and Gvc at fsw/10; the models' warnings follow the table, one line each.
 */
public final class StageModelTable {

    private static final List<Column> COLUMNS = List.of(
            Column.number("vin[V]"), Column.number("iout[A]"), Column.text("mode"), Column.text("poles[Hz]"),
            Column.text("zeros[Hz]"), Column.number("fRHPz[Hz]"), Column.number("Qp"),
            Column.number("Gvc@fsw/10[dB]"), Column.number("phase@fsw/10[deg]"));

    private StageModelTable() {
    }

    /**
     * The caption line, the table and the warnings.
     *
     * @param models the model of each point, in table order
     * @param fswHz  the switching frequency
     */
    public static String render(List<StageTransferFunctions> models, double fswHz) {
        double probeHz = fswHz / 10;
        TextTable table = new TextTable(COLUMNS);
        List<String> warnings = new ArrayList<>();
        for (StageTransferFunctions m : models) {
            OperatingPoint p = m.point();
            List<String> row = new ArrayList<>();
            row.add(NumberText.significant(p.vin(), 4));
            row.add(NumberText.significant(p.iout(), 4));
            row.add(p.mode().label());
            row.add(features(m, PoleZero.Kind.POLE));
            row.add(features(m, PoleZero.Kind.ZERO));
            row.add(hertz(m.rhpZeroHz()));
            row.add(NumberText.significant(m.qp(), 3));
            row.add(String.format(Locale.ROOT, "%.1f", m.control().magnitudeDb(probeHz)));
            row.add(String.format(Locale.ROOT, "%.1f", m.control().phaseDeg(probeHz)));
            table.add(row);
            for (String w : m.warnings()) {
                warnings.add("warning: vin " + NumberText.significant(p.vin(), 4) + " V, iout "
                        + NumberText.significant(p.iout(), 4) + " A: " + w + "\n");
            }
        }
        return "Control to output Gvc = vout/vc (Q of complex pairs; fsw/10 = " + hertz(probeHz) + "Hz):\n"
                + table.render() + String.join("", warnings);
    }

    /** Poles or zeros in ascending frequency. */
    static List<PoleZero> sorted(List<PoleZero> features) {
        List<PoleZero> out = new ArrayList<>(features);
        out.sort(Comparator.comparingDouble(PoleZero::frequencyHz));
        return out;
    }

    /**
     * One cell: "12.3, 32.5k Q1.31" for a real pole and a pair; right-half-plane zeros are marked
     * "rhp", except the CCM one, which has its own column.
     */
    private static String features(StageTransferFunctions m, PoleZero.Kind kind) {
        List<String> parts = new ArrayList<>();
        for (PoleZero pz : sorted(m.features())) {
            if (pz.kind() != kind) {
                continue;
            }
            boolean ownColumn = pz.rightHalfPlane() && pz.order() == 1 && pz.frequencyHz() == m.rhpZeroHz();
            if (ownColumn) {
                continue;
            }
            String text = hertz(pz.frequencyHz());
            if (pz.order() == 2) {
                text += " Q" + NumberText.significant(pz.q(), 3);
            }
            if (pz.rightHalfPlane()) {
                text += " rhp";
            }
            parts.add(text);
        }
        return parts.isEmpty() ? "-" : String.join(", ", parts);
    }

    /** Hertz in three significant digits with the spec's own suffixes; "-" when undefined. */
    static String hertz(double hz) {
        return engineering(hz);
    }

    /**
     * Three significant digits with the spec's own engineering suffixes (n, u, m, k, meg), so that
     * "32.5k" reads back as the same number; "-" for NaN.
     */
    public static String engineering(double value) {
        if (!Double.isFinite(value)) {
            return Double.isNaN(value) ? "-" : NumberText.significant(value, 3);
        }
        double a = Math.abs(value);
        String[] suffixes = {"n", "u", "m", "", "k", "meg"};
        double[] factors = {1e-9, 1e-6, 1e-3, 1, 1e3, 1e6};
        int k = 3;
        if (a > 0) {
            k = 0;
            // the largest factor that leaves at least 1 after rounding to three digits
            for (int i = factors.length - 1; i >= 0; i--) {
                if (a >= 0.9995 * factors[i]) {
                    k = i;
                    break;
                }
            }
        }
        return NumberText.significant(value / factors[k], 3) + suffixes[k];
    }
}
