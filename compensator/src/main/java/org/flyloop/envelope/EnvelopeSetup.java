package org.flyloop.envelope;

import java.util.ArrayList;
import java.util.List;
import org.flyloop.design.DesignRequest;
import org.flyloop.design.LoopEvaluation;
import org.flyloop.network.CompensatorNetwork;
import org.flyloop.spec.TolerancesSpec;

/**
 * What an envelope analysis works on: the request (stage, controller, feedback choices, targets),
 * the compensator, the corners, the tolerance box and the frequency grid.
 *
 * <p>The grid runs from {@link LoopEvaluation#LOWEST_HZ} to half the highest switching frequency
 * the tolerances allow; each stage variant is analysed up to its own fsw/2, as the designer's
 * corner check is.
 */
public final class EnvelopeSetup {

    /** Grid points when none are asked for. */
    public static final int DEFAULT_POINTS = 400;

    private final DesignRequest request;
    private final CompensatorNetwork network;
    private final TolerancesSpec tolerances;
    private final List<EnvelopeCorner> corners;
    private final ToleranceBox box;
    private final SweepGrid grid;
    private final double[] ctrSlots;
    private final int[] cornerSlot;

    private EnvelopeSetup(DesignRequest request, CompensatorNetwork network, TolerancesSpec tolerances,
                          List<EnvelopeCorner> corners, ToleranceBox box, SweepGrid grid) {
        this.request = request;
        this.network = network;
        this.tolerances = tolerances;
        this.corners = List.copyOf(corners);
        this.box = box;
        this.grid = grid;
        List<Double> slots = new ArrayList<>();
        cornerSlot = new int[corners.size()];
        for (int c = 0; c < corners.size(); c++) {
            double ctr = corners.get(c).ctr();
            int found = -1;
            for (int s = 0; s < slots.size(); s++) {
                if (Double.compare(slots.get(s), ctr) == 0) {
                    found = s;
                }
            }
            if (found < 0) {
                slots.add(ctr);
                found = slots.size() - 1;
            }
            cornerSlot[c] = found;
        }
        ctrSlots = slots.stream().mapToDouble(Double::doubleValue).toArray();
    }

    /**
     * The setup of the worst-case analysis: every envelope corner (CTR extremes as corners) and the
     * stage and part tolerances.
     */
    public static EnvelopeSetup forWorstCase(DesignRequest request, CompensatorNetwork network,
                                             TolerancesSpec tolerances, int points) {
        return of(request, network, tolerances, points, false);
    }

    /**
     * The setup of the Monte Carlo analysis: as {@link #forWorstCase}, except that with
     * {@code ctr: from feedback.ctr} the CTR is drawn per sample across feedback.ctr and the corners
     * are the operating conditions without a CTR of their own.
     */
    public static EnvelopeSetup forMonteCarlo(DesignRequest request, CompensatorNetwork network,
                                              TolerancesSpec tolerances, int points) {
        return of(request, network, tolerances, points, tolerances.ctrFromFeedback());
    }

    private static EnvelopeSetup of(DesignRequest request, CompensatorNetwork network, TolerancesSpec tolerances,
                                    int points, boolean sampleCtr) {
        List<EnvelopeCorner> corners = EnvelopeCorners.of(request.stage(), request.control(), request.feedback());
        if (sampleCtr) {
            corners = EnvelopeCorners.withoutCtr(corners);
        }
        double fswHigh = tolerances.fsw().highest(request.stage().fswHz());
        SweepGrid grid = SweepGrid.logarithmic(LoopEvaluation.LOWEST_HZ, fswHigh / 2, points);
        ToleranceBox box = ToleranceBox.of(request.stage(), network, tolerances, request.feedback(), grid, sampleCtr);
        return new EnvelopeSetup(request, network, tolerances, corners, box, grid);
    }

    /** The same analysis for another compensator of the same kind (the robust designer's candidates). */
    public EnvelopeSetup withNetwork(CompensatorNetwork other) {
        return new EnvelopeSetup(request, other, tolerances, corners, box, grid);
    }

    /** This setup with box quantity {@code j} alone toleranced. */
    EnvelopeSetup keepOnly(int j) {
        return new EnvelopeSetup(request, network, tolerances, corners, box.keepOnly(j), grid);
    }

    public DesignRequest request() {
        return request;
    }

    public CompensatorNetwork network() {
        return network;
    }

    public TolerancesSpec tolerances() {
        return tolerances;
    }

    public List<EnvelopeCorner> corners() {
        return corners;
    }

    public ToleranceBox box() {
        return box;
    }

    public SweepGrid grid() {
        return grid;
    }

    /** The distinct CTR values the corners carry (NaN: the network's own or the sampled one). */
    double[] ctrSlots() {
        return ctrSlots;
    }

    /** Index into {@link #ctrSlots()} of a corner. */
    int slotOf(int corner) {
        return cornerSlot[corner];
    }
}
