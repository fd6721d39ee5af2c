/**
 * Large-signal verification of a designed loop: the nonlinear averaged flyback with the
 * compensator's dynamics as extra states ({@link org.flyloop.verify.ClosedLoopAveragedSimulation}),
 * and its load-step response set beside the linear closed-loop prediction
 * ({@link org.flyloop.verify.LoadStepComparison}).
 */
package org.flyloop.verify;
