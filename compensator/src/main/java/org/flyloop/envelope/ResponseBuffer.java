package org.flyloop.envelope;

import org.flyloop.linear.TransferFunction;

/**
 * A transfer function sampled on a {@link SweepGrid}: real and imaginary parts per grid point,
 * together with the function itself for exact evaluation between points. A scratch buffer of the
 * hot loops: it is refilled in place (no allocation per frequency or per sample) and is not shared
 * between threads.
 */
final class ResponseBuffer {

    final double[] re;
    final double[] im;
    private TransferFunction function;
    private int last = -1;

    ResponseBuffer(int size) {
        re = new double[size];
        im = new double[size];
    }

    /** Samples {@code tf} at grid points 0…{@code lastIndex} with the allocation-free evaluation. */
    ResponseBuffer fill(TransferFunction tf, SweepGrid grid, int lastIndex, double[] scratch) {
        for (int i = 0; i <= lastIndex; i++) {
            tf.evaluateInto(grid.frequencyHz(i), scratch);
            re[i] = scratch[0];
            im[i] = scratch[1];
        }
        function = tf;
        last = lastIndex;
        return this;
    }

    TransferFunction function() {
        return function;
    }

    /** The last grid index that holds a sample. */
    int lastIndex() {
        return last;
    }
}
