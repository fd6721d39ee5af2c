/**
 * JMH benchmarks of the loop-gain evaluation, the envelope worst case and Monte Carlo; built and
 * run only in the {@code bench} profile of the compensator module (see DEVELOPERS.md,
 * "Benchmarks").
 */
package org.flyloop.bench;
