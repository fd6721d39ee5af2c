package org.flyloop.envelope;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.flyloop.linear.TransferFunction;
import org.flyloop.network.CompensatorNetwork;
import org.flyloop.network.PartNames;
import org.flyloop.network.PartRole;
import org.flyloop.spec.FeedbackSpec;
import org.flyloop.spec.StageSpec;
import org.flyloop.spec.Tolerance;
import org.flyloop.spec.TolerancesSpec;
import org.flyloop.spec.ValueRange;

/**
 * The toleranced quantities of one analysis, in a fixed order (stage quantities first, then
 * compensator parts, then the CTR), and the map from a point u ∈ [0, 1]^k of the tolerance box to
 * a stage, a set of part values and a CTR.
 *
 * <p>Only quantities that can move the loop are kept: a band of zero width, an ESR of zero, and a
 * part whose band leaves the compensator's response unchanged at every grid frequency (r_lower of
 * an ideal op-amp network, r_bias beside an ideal LED) are left out, so that vertex enumeration
 * does not spend 2× per quantity that cannot matter.
 */
public final class ToleranceBox {

    /** Relative response change under which a part counts as having no effect on the loop. */
    static final double NO_EFFECT = 1e-9;

    private final List<ToleranceParameter> parameters;
    private final double ctrTypical;

    private ToleranceBox(List<ToleranceParameter> parameters, double ctrTypical) {
        this.parameters = List.copyOf(parameters);
        this.ctrTypical = ctrTypical;
    }

    /**
     * The box for a stage, a network and the spec's tolerances.
     *
     * @param sampleCtr true to make the CTR a toleranced quantity across {@code feedback.ctr}
     *                  (when the tolerances say {@code ctr: from feedback.ctr}); the corners then
     *                  carry no CTR of their own
     */
    public static ToleranceBox of(StageSpec stage, CompensatorNetwork network, TolerancesSpec tolerances,
                                  FeedbackSpec feedback, SweepGrid grid, boolean sampleCtr) {
        List<ToleranceParameter> out = new ArrayList<>();
        addIf(out, ToleranceParameter.Quantity.LM, tolerances.lm(), stage.lm());
        addIf(out, ToleranceParameter.Quantity.COUT, tolerances.cout(), stage.cout());
        addIf(out, ToleranceParameter.Quantity.ESR, tolerances.esr(), stage.esr());
        addIf(out, ToleranceParameter.Quantity.FSW, tolerances.fsw(), stage.fswHz());
        for (Map.Entry<String, Double> e : network.parts().entrySet()) {
            String name = e.getKey();
            PartRole role = PartNames.role(name);
            Tolerance band = role == PartRole.RESISTOR ? tolerances.resistors()
                    : role == PartRole.CAPACITOR && !name.equals(PartNames.C_OPTO) ? tolerances.capacitors() : null;
            if (band != null && !band.isNone() && e.getValue() != 0 && movesLoop(network, name, band, grid)) {
                out.add(new ToleranceParameter(ToleranceParameter.Quantity.PART, name, band));
            }
        }
        double typical = Double.NaN;
        if (sampleCtr) {
            ValueRange ctr = feedback.ctr();
            typical = ctr.typical();
            if (!ctr.isSingle()) {
                out.add(new ToleranceParameter(ToleranceParameter.Quantity.CTR, null,
                        new Tolerance(ctr.min() / typical - 1, ctr.max() / typical - 1)));
            }
        }
        return new ToleranceBox(out, typical);
    }

    private static void addIf(List<ToleranceParameter> out, ToleranceParameter.Quantity q, Tolerance band,
                              double nominal) {
        if (!band.isNone() && nominal != 0) {
            out.add(new ToleranceParameter(q, null, band));
        }
    }

    /** True when moving {@code part} to the top of its band changes the response somewhere on the grid. */
    private static boolean movesLoop(CompensatorNetwork network, String part, Tolerance band, SweepGrid grid) {
        TransferFunction nominal = network.transferFunction();
        TransferFunction moved = network.withParts(Map.of(part, band.highest(network.parts().get(part))))
                .transferFunction();
        double[] a = new double[2];
        double[] b = new double[2];
        for (int i = 0; i < grid.size(); i++) {
            nominal.evaluateInto(grid.frequencyHz(i), a);
            moved.evaluateInto(grid.frequencyHz(i), b);
            double size = Math.hypot(a[0], a[1]);
            if (Math.hypot(a[0] - b[0], a[1] - b[1]) > NO_EFFECT * size) {
                return true;
            }
        }
        return false;
    }

    /** This box with quantity {@code j} alone (the others stay at nominal). */
    ToleranceBox keepOnly(int j) {
        return new ToleranceBox(List.of(parameters.get(j)), ctrTypical);
    }

    /** The quantities, stage first. */
    public List<ToleranceParameter> parameters() {
        return parameters;
    }

    public int size() {
        return parameters.size();
    }

    /** Number of stage quantities (they come first). */
    public int stageCount() {
        int n = 0;
        for (ToleranceParameter p : parameters) {
            if (p.isStage()) {
                n++;
            }
        }
        return n;
    }

    /** True when the CTR is one of the quantities. */
    public boolean samplesCtr() {
        return parameters.stream().anyMatch(p -> p.quantity() == ToleranceParameter.Quantity.CTR)
                || !Double.isNaN(ctrTypical);
    }

    /** The stage at point {@code u}. */
    public StageSpec stageAt(StageSpec nominal, double[] u) {
        StageSpec s = nominal;
        for (int j = 0; j < parameters.size(); j++) {
            ToleranceParameter p = parameters.get(j);
            switch (p.quantity()) {
                case LM -> s = s.withLm(p.valueAt(nominal.lm(), u[j]));
                case COUT -> s = s.withCout(p.valueAt(nominal.cout(), u[j]));
                case ESR -> s = s.withEsr(p.valueAt(nominal.esr(), u[j]));
                case FSW -> s = s.withFsw(p.valueAt(nominal.fswHz(), u[j]));
                default -> {
                }
            }
        }
        return s;
    }

    /** The part values that differ from {@code nominal} at point {@code u}, by name. */
    public Map<String, Double> partsAt(CompensatorNetwork nominal, double[] u) {
        Map<String, Double> out = new LinkedHashMap<>();
        Map<String, Double> parts = nominal.parts();
        for (int j = 0; j < parameters.size(); j++) {
            ToleranceParameter p = parameters.get(j);
            if (p.quantity() == ToleranceParameter.Quantity.PART) {
                out.put(p.partName(), p.valueAt(parts.get(p.partName()), u[j]));
            }
        }
        return out;
    }

    /** The CTR at point {@code u} when it is sampled, else NaN. */
    public double ctrAt(double[] u) {
        for (int j = 0; j < parameters.size(); j++) {
            ToleranceParameter p = parameters.get(j);
            if (p.quantity() == ToleranceParameter.Quantity.CTR) {
                return p.valueAt(ctrTypical, u[j]);
            }
        }
        return ctrTypical;
    }

    /** The relative deviation of every quantity at point {@code u}, by name, in box order. */
    public Map<String, Double> deviations(double[] u) {
        Map<String, Double> out = new LinkedHashMap<>();
        for (int j = 0; j < parameters.size(); j++) {
            out.put(parameters.get(j).name(), parameters.get(j).deviationAt(u[j]));
        }
        return Collections.unmodifiableMap(out);
    }
}
