package org.flyloop.envelope;

import org.flyloop.spec.ValueRange;
import org.flyloop.stage.OperatingPointSolver;

/**
 * How a corner's load current is chosen: a fixed current from the spec, or a fixed ratio to the
 * CCM/DCM boundary load of the stage being analysed (so that under an inductance tolerance the
 * corner still sits just on its side of the moved boundary).
 */
public sealed interface LoadSetting {

    /**
     * The load current at {@code vinV} for the stage {@code solver} describes, kept inside the spec's
     * load range, A.
     */
    double ioutA(OperatingPointSolver solver, double vinV, ValueRange ioutRange);

    /** A short description, e.g. "2 A" or "1.02×boundary". */
    String describe();

    /** A load current given in the spec. */
    record Fixed(double ioutA) implements LoadSetting {
        @Override
        public double ioutA(OperatingPointSolver solver, double vinV, ValueRange ioutRange) {
            return ioutA;
        }

        @Override
        public String describe() {
            return EnvelopeCorner.significant(ioutA) + " A";
        }
    }

    /**
     * A load at {@code factor} times the boundary load (factor &lt; 1: the DCM side, &gt; 1: the
     * CCM side).
     */
    record Boundary(double factor) implements LoadSetting {
        @Override
        public double ioutA(OperatingPointSolver solver, double vinV, ValueRange ioutRange) {
            double i = factor * solver.boundaryLoad(vinV);
            return Math.max(ioutRange.min(), Math.min(ioutRange.max(), i));
        }

        @Override
        public String describe() {
            return EnvelopeCorner.significant(factor) + "×boundary";
        }
    }
}
