package org.flyloop.design;

import java.util.ArrayList;
import java.util.List;
import org.flyloop.linear.Root;
import org.flyloop.linear.TransferFunction;
import org.flyloop.network.KFactor;

/**
 * Two ways to place a compensator's zeros and poles for a crossover fc:
 * <ul>
 *   <li><b>K factor</b> (H. D. Venable, "The K factor: a new mathematical tool for stability
 *       analysis and synthesis", Proc. Powercon 10, 1983): the boost B = PM − P − 90° needed at fc
 *       sets K, and the zeros and poles sit symmetrically about fc. When the pole must stay below a
 *       ceiling (the optocoupler's own pole), the pole goes to the ceiling and the zero moves down
 *       until the pair still gives B: atan(fc/fz) − atan(fc/fp) = B.</li>
 *   <li><b>Direct placement</b>: zeros at the stage's double pole (voltage-mode CCM) or output
 *       pole, poles at the ESR zero and at the RHP zero or fsw/2, whichever are lower (common
 *       practice, no source).</li>
 * </ul>
 * The boost is bounded to what the type can give with parts of sensible spread: 80° for type 2,
 * 160° for type 3 (common practice, no source), and at least 10° so that a type 2 or 3 network keeps
 * its zero below its pole.
 */
public final class PlacementPlanner {

    public static final double MAX_BOOST_TYPE2_DEG = 80;
    public static final double MAX_BOOST_TYPE3_DEG = 160;
    public static final double MIN_BOOST_DEG = 10;

    private PlacementPlanner() {
    }

    /** The largest boost a type can give here, degrees. */
    public static double maxBoostDeg(int type) {
        return switch (type) {
            case 1 -> 0;
            case 2 -> MAX_BOOST_TYPE2_DEG;
            default -> MAX_BOOST_TYPE3_DEG;
        };
    }

    /** The boost needed at fc over all corners: max of PM − ∠(k·Gvc) − 90°, degrees. */
    public static double requiredBoostDeg(List<Corner> corners, double fcHz, double phaseMarginDeg) {
        double b = Double.NEGATIVE_INFINITY;
        for (Corner c : corners) {
            b = Math.max(b, KFactor.requiredBoostDeg(phaseMarginDeg, c.stage().control().phaseDeg(fcHz)));
        }
        return b;
    }

    /** The corner whose stage phase at fc lags the most. */
    public static Corner mostLaggingCorner(List<Corner> corners, double fcHz) {
        Corner worst = corners.get(0);
        for (Corner c : corners) {
            if (c.stage().control().phaseDeg(fcHz) < worst.stage().control().phaseDeg(fcHz)) {
                worst = c;
            }
        }
        return worst;
    }

    /** Venable's placement for {@code boostDeg} (clamped to what the type gives), pole ≤ ceiling. */
    public static Placement kFactor(int type, double fcHz, double boostDeg, double poleCeilingHz) {
        if (type == 1) {
            return new Placement("k-factor", 1, fcHz, 0, List.of(), List.of());
        }
        double b = Math.max(MIN_BOOST_DEG, Math.min(boostDeg, maxBoostDeg(type)));
        KFactor k = KFactor.forBoost(type, fcHz, b);
        if (type == 2 && k.poleHz() > poleCeilingHz) {
            double fp = poleCeilingHz;
            double zeroAngle = Math.min(Math.toRadians(85), Math.toRadians(b) + Math.atan(fcHz / fp));
            double fz = fcHz / Math.tan(zeroAngle);
            return new Placement("k-factor", 2, fcHz, b, List.of(fz), List.of(fp));
        }
        List<Double> zeros = new ArrayList<>();
        List<Double> poles = new ArrayList<>();
        for (int i = 0; i < type - 1; i++) {
            zeros.add(k.zeroHz());
            poles.add(Math.min(k.poleHz(), poleCeilingHz));
        }
        return new Placement("k-factor", type, fcHz, b, zeros, poles);
    }

    /**
     * Direct placement from the stage's features at {@code corner}: zeros at its double pole (or
     * output pole), poles at its ESR zero and RHP zero or fsw/2, each kept on its side of fc.
     */
    public static Placement polesZeros(int type, double fcHz, Corner corner, double fswHz, double poleCeilingHz) {
        if (type == 1) {
            return new Placement("poles-zeros", 1, fcHz, 0, List.of(), List.of());
        }
        TransferFunction g = corner.stage().control();
        double lowPole = Double.POSITIVE_INFINITY;
        for (Root p : g.poles()) {
            lowPole = Math.min(lowPole, p.frequencyHz());
        }
        double esr = Double.POSITIVE_INFINITY;
        double rhp = Double.POSITIVE_INFINITY;
        for (Root z : g.zeros()) {
            if (z.isRightHalfPlane()) {
                rhp = Math.min(rhp, z.frequencyHz());
            } else {
                esr = Math.min(esr, z.frequencyHz());
            }
        }
        double half = fswHz / 2;
        double zero = Math.min(lowPole, fcHz / 3);
        double pHigh = Math.min(Math.min(rhp, half), poleCeilingHz);
        double pLow = Math.min(Math.min(esr, pHigh), poleCeilingHz);
        pLow = Math.max(pLow, Math.min(3 * fcHz, poleCeilingHz));
        pHigh = Math.max(pHigh, pLow);
        double boost = phaseOf(zero, fcHz) - phaseOf(pLow, fcHz);
        if (type == 2) {
            return new Placement("poles-zeros", 2, fcHz, boost, List.of(zero), List.of(pLow));
        }
        boost = 2 * phaseOf(zero, fcHz) - phaseOf(pLow, fcHz) - phaseOf(pHigh, fcHz);
        return new Placement("poles-zeros", 3, fcHz, boost, List.of(zero, zero), List.of(pLow, pHigh));
    }

    private static double phaseOf(double cornerHz, double fHz) {
        return Math.toDegrees(Math.atan(fHz / cornerHz));
    }
}
