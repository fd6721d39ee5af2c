package org.flyloop.cli.report;

import org.flyloop.cli.plot.SiText;
import org.flyloop.design.Corner;
import org.flyloop.stage.OperatingPoint;

/** Short names for corners, as legends and table rows show them ("36 V / 4 A / CTR 50 %"). */
public final class CornerNames {

    private CornerNames() {
    }

    /** Input voltage and load of an operating point. */
    public static String point(OperatingPoint p) {
        return SiText.format(p.vin(), "V", 4) + " / " + SiText.format(p.iout(), "A", 4);
    }

    /** The point plus the CTR where the corner has one. */
    public static String corner(Corner c) {
        String s = point(c.point());
        return Double.isNaN(c.ctr()) ? s : s + " / " + ctr(c.ctr());
    }

    /** A CTR ratio as a percentage. */
    public static String ctr(double ratio) {
        return "CTR " + SiText.plain(100 * ratio, 3) + " %";
    }
}
