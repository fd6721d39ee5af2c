package org.flyloop.averaged;

import org.ejml.data.DMatrixRMaj;

/**
 * Linearizes an averaged circuit at an equilibrium by central differences (see {@link Jacobians}
 * for the step rule h = ε·max(|v|, typical)).
 */
final class NumericalLinearizer {

    private final double relativeStep;
    private final double[] inputScales;

    /**
     * @param inputScales typical magnitudes of control, vin and i_step (step floors)
     */
    NumericalLinearizer(double relativeStep, double[] inputScales) {
        this.relativeStep = relativeStep;
        this.inputScales = inputScales.clone();
    }

    LinearizedModel linearize(AveragedCircuit circuit, Equilibrium op) {
        double[] x = op.state();
        AveragedInputs u = op.inputs();
        DMatrixRMaj a = Jacobians.stateJacobian(circuit, x, u, relativeStep);
        DMatrixRMaj b = Jacobians.inputJacobian(circuit, x, u, inputScales, relativeStep);
        DMatrixRMaj c = Jacobians.outputStateJacobian(circuit, x, u, relativeStep);
        DMatrixRMaj d = Jacobians.outputInputJacobian(circuit, x, u, inputScales, relativeStep);
        return new LinearizedModel(a, b, c, d, circuit.layout().names(), circuit.outputNames(), op);
    }
}
