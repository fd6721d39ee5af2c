package org.flyloop.network;

import java.util.List;
import org.flyloop.linear.Root;

/**
 * Venable's K factor: where to put a compensator's zeros and poles, symmetrically about the
 * crossover frequency, for a required phase boost.
 *
 * <p>Source: H. D. Venable, "The K factor: a new mathematical tool for stability analysis and
 * synthesis", Proc. Powercon 10, 1983. The boost is the phase the compensator must add at the
 * crossover above its integrator's −90°: Boost = M − P − 90°, with M the required phase margin and
 * P the power stage's phase at crossover (a negative angle, e.g. −120°). Then
 * <ul>
 * <li>type 1 (integrator only): K = 1, no boost;</li>
 * <li>type 2: K = tan(Boost/2 + 45°), zero at fc/K, pole at fc·K;</li>
 * <li>type 3: K = tan²(Boost/4 + 45°), double zero at fc/√K, double pole at fc·√K.</li>
 * </ul>
 * A type 2 boost lies between 0° and 90°, a type 3 boost between 0° and 180° (the limits where K
 * becomes infinite).
 *
 * @param type        1, 2 or 3
 * @param crossoverHz the crossover frequency fc, Hz
 * @param boostDeg    the phase boost wanted at fc, degrees: ≤ 0 for type 1, within (0°, 90°) for
 *                    type 2, within (0°, 180°) for type 3
 */
public record KFactor(int type, double crossoverHz, double boostDeg) {

    public KFactor {
        PartChecks.positive("crossover frequency", crossoverHz);
        switch (type) {
            case 1 -> {
                if (boostDeg > 0) {
                    throw new IllegalArgumentException("type 1 gives no phase boost; " + boostDeg
                            + "° needs type " + lowestTypeFor(boostDeg));
                }
            }
            case 2 -> requireWithin(boostDeg, 90, type);
            case 3 -> requireWithin(boostDeg, 180, type);
            default -> throw new IllegalArgumentException(
                    "the K factor is defined for types 1, 2 and 3, got " + type);
        }
    }

    /** Boost = M − P − 90° (Venable 1983), degrees. */
    public static double requiredBoostDeg(double phaseMarginDeg, double stagePhaseAtCrossoverDeg) {
        return phaseMarginDeg - stagePhaseAtCrossoverDeg - 90;
    }

    /**
     * The lowest type that can give {@code boostDeg}: 1 for no boost (≤ 0°), 2 below 90°, 3 below
     * 180°.
     *
     * @throws IllegalArgumentException for 180° or more
     */
    public static int lowestTypeFor(double boostDeg) {
        if (boostDeg <= 0) {
            return 1;
        }
        if (boostDeg < 90) {
            return 2;
        }
        if (boostDeg < 180) {
            return 3;
        }
        throw new IllegalArgumentException("a phase boost of " + boostDeg + "° is beyond a type 3 network (< 180°)");
    }

    /**
     * The placement for {@code boostDeg} with a network of {@code type}.
     *
     * @throws IllegalArgumentException when the type cannot give that boost (type 1: any positive
     *         boost; type 2: outside (0°, 90°); type 3: outside (0°, 180°))
     */
    public static KFactor forBoost(int type, double crossoverHz, double boostDeg) {
        return new KFactor(type, crossoverHz, boostDeg);
    }

    private static void requireWithin(double boostDeg, double limitDeg, int type) {
        if (!(boostDeg > 0 && boostDeg < limitDeg)) {
            throw new IllegalArgumentException("a type " + type + " network boosts between 0° and "
                    + limitDeg + "°, asked for " + boostDeg + "°");
        }
    }

    /** K: 1 (type 1), tan(B/2 + 45°) (type 2), tan²(B/4 + 45°) (type 3); Venable 1983. */
    public double k() {
        return switch (type) {
            case 2 -> Math.tan(Math.toRadians(boostDeg / 2 + 45));
            case 3 -> {
                double t = Math.tan(Math.toRadians(boostDeg / 4 + 45));
                yield t * t;
            }
            default -> 1;
        };
    }

    /** The boost the placement delivers at fc: B for types 2 and 3, 0 for type 1, degrees. */
    public double deliveredBoostDeg() {
        return type == 1 ? 0 : boostDeg;
    }

    /** Frequency of the (double, for type 3) zero: fc/K (type 2), fc/√K (type 3); NaN for type 1. */
    public double zeroHz() {
        return switch (type) {
            case 2 -> crossoverHz / k();
            case 3 -> crossoverHz / Math.sqrt(k());
            default -> Double.NaN;
        };
    }

    /** Frequency of the (double, for type 3) pole: fc·K (type 2), fc·√K (type 3); NaN for type 1. */
    public double poleHz() {
        return switch (type) {
            case 2 -> crossoverHz * k();
            case 3 -> crossoverHz * Math.sqrt(k());
            default -> Double.NaN;
        };
    }

    /** The zeros as left-half-plane real roots: none, one, or two coincident. */
    public List<Root> zeros() {
        return roots(zeroHz());
    }

    /** The poles besides the integrator: none, one, or two coincident. */
    public List<Root> poles() {
        return roots(poleHz());
    }

    private List<Root> roots(double fHz) {
        return switch (type) {
            case 2 -> List.of(Root.realAtHz(fHz));
            case 3 -> List.of(Root.realAtHz(fHz), Root.realAtHz(fHz));
            default -> List.of();
        };
    }
}
