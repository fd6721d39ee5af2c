package org.flyloop.envelope;

import java.util.HashMap;
import java.util.Map;
import org.flyloop.design.Corner;
import org.flyloop.network.CompensatorNetwork;
import org.flyloop.network.PartNames;
import org.flyloop.spec.ControlSpec;
import org.flyloop.spec.StageSpec;
import org.flyloop.stage.InfeasibleOperatingPointException;
import org.flyloop.stage.OperatingPointSolver;

/**
 * Evaluates the loop at envelope corners for points of the tolerance box, splitting the work the
 * way it repeats: a stage side (operating point, small-signal model and its sampled response at
 * every corner) depends only on the stage quantities, a network side (the compensator's sampled
 * response per CTR value) only on the parts and the CTR, and any pair combines in one pass over
 * the grid ({@link GridMarginScanner}). Both sides are refilled in place.
 *
 * <p>One engine per thread.
 */
final class LoopEngine {

    private final EnvelopeSetup setup;
    private final GridMarginScanner scanner;
    private final double[] scratch = new double[2];
    private long loopsScanned;

    LoopEngine(EnvelopeSetup setup) {
        this.setup = setup;
        this.scanner = new GridMarginScanner(setup.grid());
    }

    EnvelopeSetup setup() {
        return setup;
    }

    /** The stage at every corner for one point of the box. */
    static final class StageSide {
        final Corner[] corners;
        final ResponseBuffer[] responses;
        final String[] infeasible;
        int lastIndex;

        StageSide(int cornerCount, int gridSize) {
            corners = new Corner[cornerCount];
            responses = new ResponseBuffer[cornerCount];
            infeasible = new String[cornerCount];
            for (int c = 0; c < cornerCount; c++) {
                responses[c] = new ResponseBuffer(gridSize);
            }
        }
    }

    /** The compensator per CTR slot for one point of the box. */
    static final class NetworkSide {
        final CompensatorNetwork[] networks;
        final ResponseBuffer[] responses;

        NetworkSide(int slots, int gridSize) {
            networks = new CompensatorNetwork[slots];
            responses = new ResponseBuffer[slots];
            for (int s = 0; s < slots; s++) {
                responses[s] = new ResponseBuffer(gridSize);
            }
        }
    }

    StageSide newStageSide() {
        return new StageSide(setup.corners().size(), setup.grid().size());
    }

    NetworkSide newNetworkSide() {
        return new NetworkSide(setup.ctrSlots().length, setup.grid().size());
    }

    /**
     * Fills {@code side} with the stage at point {@code u} (only the stage quantities are read) for
     * every corner, or for corner {@code only} alone when it is not negative.
     */
    StageSide fillStage(StageSide side, double[] u, int only) {
        StageSpec stage = setup.box().stageAt(setup.request().stage(), u);
        ControlSpec control = setup.request().control();
        OperatingPointSolver solver = new OperatingPointSolver(stage, control);
        side.lastIndex = setup.grid().lastIndexAtOrBelow(stage.fswHz() / 2);
        for (int c = 0; c < side.corners.length; c++) {
            if (only >= 0 && c != only) {
                continue;
            }
            try {
                Corner corner = EnvelopeCorners.resolve(setup.corners().get(c), stage, control, solver);
                side.corners[c] = corner;
                side.infeasible[c] = null;
                side.responses[c].fill(corner.stage().control(), setup.grid(), side.lastIndex, scratch);
            } catch (InfeasibleOperatingPointException e) {
                side.corners[c] = null;
                side.infeasible[c] = e.getMessage();
            }
        }
        return side;
    }

    /** Fills {@code side} with the compensator at point {@code u} for every CTR slot. */
    NetworkSide fillNetwork(NetworkSide side, double[] u) {
        Map<String, Double> parts = new HashMap<>(setup.box().partsAt(setup.network(), u));
        double sampledCtr = setup.box().ctrAt(u);
        double[] slots = setup.ctrSlots();
        int last = setup.grid().size() - 1;
        for (int s = 0; s < slots.length; s++) {
            double ctr = Double.isNaN(slots[s]) ? sampledCtr : slots[s];
            if (!Double.isNaN(ctr)) {
                parts.put(PartNames.CTR, ctr);
            }
            CompensatorNetwork n = parts.isEmpty() ? setup.network() : setup.network().withParts(parts);
            side.networks[s] = n;
            side.responses[s].fill(n.transferFunction(), setup.grid(), last, scratch);
        }
        return side;
    }

    /** The figures at corner {@code c}; null when the stage cannot run there. */
    LoopFigures figures(StageSide stage, NetworkSide network, int c) {
        if (stage.corners[c] == null) {
            return null;
        }
        loopsScanned++;
        return scanner.scan(stage.responses[c], network.responses[setup.slotOf(c)],
                setup.request().control().fbGain(), stage.lastIndex);
    }

    /** Loops scanned so far by this engine. */
    long loopsScanned() {
        return loopsScanned;
    }
}
