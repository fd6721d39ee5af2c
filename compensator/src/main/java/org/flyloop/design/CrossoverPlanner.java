package org.flyloop.design;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.flyloop.spec.AmplifierKind;
import org.flyloop.spec.ControlScheme;

/**
 * Upper bounds on the crossover frequency. Each is a rule of thumb in common use; none has a single
 * published source, and the report names them as common practice.
 */
public final class CrossoverPlanner {

    /** fc ≤ fsw/10 under voltage-mode control (common practice, no source). */
    public static final double VOLTAGE_MODE_FSW_FRACTION = 0.1;
    /** fc ≤ fsw/6 under peak-current-mode control (common practice, no source). */
    public static final double CURRENT_MODE_FSW_FRACTION = 1.0 / 6;
    /** fc ≤ f_opto/3: keep the optocoupler's own pole well above crossover (common practice, no source). */
    public static final double OPTO_POLE_FRACTION = 1.0 / 3;

    private CrossoverPlanner() {
    }

    /** Every bound that applies to this request at these corners. */
    public static List<CrossoverLimit> limits(DesignRequest request, List<Corner> corners) {
        List<CrossoverLimit> out = new ArrayList<>();
        double fraction = request.targets().rhpZeroFraction();
        double lowestRhpz = Double.POSITIVE_INFINITY;
        for (Corner c : corners) {
            if (!Double.isNaN(c.stage().rhpZeroHz())) {
                lowestRhpz = Math.min(lowestRhpz, c.stage().rhpZeroHz());
            }
        }
        if (Double.isFinite(lowestRhpz)) {
            out.add(new CrossoverLimit("RHP zero", fraction * lowestRhpz, String.format(Locale.ROOT,
                    "%.3g × the lowest CCM RHP zero (%.4g Hz) over the corners (common practice, no source; "
                            + "1/3 to 1/5 are in use)", fraction, lowestRhpz)));
        }
        boolean current = request.control().scheme() == ControlScheme.CURRENT;
        double fsw = request.stage().fswHz();
        out.add(current
                ? new CrossoverLimit("switching frequency", fsw * CURRENT_MODE_FSW_FRACTION,
                        "fsw/6 under peak current mode (common practice, no source)")
                : new CrossoverLimit("switching frequency", fsw * VOLTAGE_MODE_FSW_FRACTION,
                        "fsw/10 under voltage mode (common practice, no source)"));
        if (request.feedback().amplifier() == AmplifierKind.SHUNT_OPTO) {
            double optoPole = optoPoleHz(request);
            if (Double.isFinite(optoPole)) {
                out.add(new CrossoverLimit("optocoupler pole", optoPole * OPTO_POLE_FRACTION, String.format(
                        Locale.ROOT, "f_opto/3 with the optocoupler pole at %.4g Hz (common practice, no source)",
                        optoPole)));
            }
        }
        return out;
    }

    /** The optocoupler's own pole at the spec's pull-up, Hz; +∞ when none is given. */
    static double optoPoleHz(DesignRequest request) {
        double c = request.feedback().optoCapacitance();
        double r = request.feedback().rPullup();
        return c > 0 && r > 0 ? 1 / (2 * Math.PI * r * c) : Double.POSITIVE_INFINITY;
    }

    /** The lowest of the bounds, Hz. */
    public static double lowest(List<CrossoverLimit> limits) {
        double f = Double.POSITIVE_INFINITY;
        for (CrossoverLimit l : limits) {
            f = Math.min(f, l.frequencyHz());
        }
        return f;
    }
}
