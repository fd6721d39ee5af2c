package org.flyloop.network;

import java.util.List;
import org.flyloop.linear.Root;
import org.flyloop.linear.TransferFunction;

/**
 * How loud a compensator should be, given separately from where its poles and zeros go.
 *
 * <p>Every network here has the form Gc(s) = ωI/s · Π(1 − s/z)/Π(1 − s/p): an integrator of gain
 * ωI times a shape fixed by the poles and zeros. A target fixes ωI once the shape is known.
 */
public sealed interface GainTarget {

    /**
     * The integrator gain ωI (rad/s) that meets this target for the given shape.
     *
     * @param zeros the network's zeros
     * @param poles the network's poles (integrator excluded)
     */
    double integratorRadPerS(List<Root> zeros, List<Root> poles);

    /** |Gc(j2πf)| = gain exactly at {@code frequencyHz}, typically the crossover. */
    static GainTarget atFrequency(double gain, double frequencyHz) {
        return new AtFrequency(gain, frequencyHz);
    }

    /** The integrator asymptote ωI/s crosses unity at {@code frequencyHz}: ωI = 2π·f. */
    static GainTarget integratorUnityAtHz(double frequencyHz) {
        return new IntegratorUnity(frequencyHz);
    }

    /**
     * The flat mid-band asymptote ωI/ωz of a one-zero network equals {@code gain} (between the
     * zero and the pole, for a pole well above the zero).
     */
    static GainTarget midband(double gain) {
        return new Midband(gain);
    }

    /** |Gc| equals {@code gain} at {@code frequencyHz}. */
    record AtFrequency(double gain, double frequencyHz) implements GainTarget {
        public AtFrequency {
            PartChecks.positive("gain", gain);
            PartChecks.positive("frequency", frequencyHz);
        }

        /** ωI = gain / |shape(j2πf)|, with shape = s⁻¹·Π(1 − s/z)/Π(1 − s/p). */
        @Override
        public double integratorRadPerS(List<Root> zeros, List<Root> poles) {
            return gain / TransferFunction.of(1, 1, zeros, poles).magnitude(frequencyHz);
        }
    }

    /** The integrator asymptote crosses unity at {@code frequencyHz}. */
    record IntegratorUnity(double frequencyHz) implements GainTarget {
        public IntegratorUnity {
            PartChecks.positive("frequency", frequencyHz);
        }

        @Override
        public double integratorRadPerS(List<Root> zeros, List<Root> poles) {
            return 2 * Math.PI * frequencyHz;
        }
    }

    /** The mid-band asymptote ωI/ωz of a one-zero network. */
    record Midband(double gain) implements GainTarget {
        public Midband {
            PartChecks.positive("gain", gain);
        }

        /** ωI = gain·|z|; defined only for a shape with a single real zero. */
        @Override
        public double integratorRadPerS(List<Root> zeros, List<Root> poles) {
            if (zeros.size() != 1 || zeros.get(0).isPair()) {
                throw new IllegalArgumentException(
                        "a mid-band gain is defined for one-zero networks only; give the gain at a frequency");
            }
            return gain * zeros.get(0).omega0();
        }
    }
}
