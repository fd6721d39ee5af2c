package org.flyloop.network;

import org.flyloop.linear.Polynomial;
import org.flyloop.linear.Root;

/**
 * The impedance Z = (r_zero + 1/(s·c_zero)) ‖ 1/(s·c_pole) shared by the op-amp type 2/3
 * feedback path and the OTA output:
 * <pre>
 *   Z(s) = (1 + s·Rz·Cz) / ( s·(Cz + Cp) · (1 + s·Rz·Cz·Cp/(Cz + Cp)) )
 * </pre>
 * an integrator 1/(s·(Cz + Cp)), a zero at 1/(Rz·Cz) and a pole at (Cz + Cp)/(Rz·Cz·Cp) rad/s,
 * always above the zero. Obtained by writing the series branch as (1 + sRzCz)/(sCz) and adding
 * the admittance sCp; checked in the tests against a nodal solve.
 */
record ZeroPoleBranch(double rZero, double cZero, double cPole) {

    ZeroPoleBranch {
        PartChecks.positive(PartNames.R_ZERO, rZero);
        PartChecks.positive(PartNames.C_ZERO, cZero);
        PartChecks.positive(PartNames.C_POLE, cPole);
    }

    /**
     * The branch with total capacitance Cz + Cp = {@code totalCapacitance} and the requested zero
     * and pole: Cp = Ct·ωz/ωp, Cz = Ct − Cp, Rz = 1/(ωz·Cz) (solving the three expressions above).
     *
     * @throws UnrealisablePlacementException unless the pole lies above the zero
     */
    static ZeroPoleBranch design(double totalCapacitance, double zeroHz, double poleHz, String what) {
        if (!(poleHz > zeroHz)) {
            throw new UnrealisablePlacementException(what + ": the pole (" + poleHz
                    + " Hz) must lie above the zero (" + zeroHz + " Hz)");
        }
        double wz = 2 * Math.PI * zeroHz;
        double cPole = totalCapacitance * zeroHz / poleHz;
        double cZero = totalCapacitance - cPole;
        return new ZeroPoleBranch(1 / (wz * cZero), cZero, cPole);
    }

    double totalCapacitance() {
        return cZero + cPole;
    }

    /** The zero s = −1/(Rz·Cz). */
    Root zero() {
        return Root.real(-1 / (rZero * cZero));
    }

    /** The pole s = −(Cz + Cp)/(Rz·Cz·Cp). */
    Root pole() {
        return Root.real(-(cZero + cPole) / (rZero * cZero * cPole));
    }

    /** Numerator of Z: 1 + s·Rz·Cz. */
    Polynomial numerator() {
        return Polynomial.ofAscending(1, rZero * cZero);
    }

    /** Denominator of Z: s·(Cz + Cp) + s²·Rz·Cz·Cp. */
    Polynomial denominator() {
        return Polynomial.ofAscending(0, cZero + cPole, rZero * cZero * cPole);
    }
}
