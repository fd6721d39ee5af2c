package org.flyloop.envelope;

import java.util.SplittableRandom;

/**
 * One independent random stream per Monte Carlo sample, derived from the run's seed and the
 * sample's index alone, so that a sample draws the same values whichever thread computes it and in
 * whatever order.
 *
 * <p>The stream seed is mix64(mix64(seed) + γ·(index + 1)) with the SplitMix64 finaliser and the
 * golden-ratio increment γ of G. L. Steele, D. Lea and C. H. Flood, "Fast splittable pseudorandom
 * number generators", OOPSLA 2014 (the generator behind {@link SplittableRandom}). Hashing
 * matters: {@code new SplittableRandom(s)} and {@code new SplittableRandom(s + γ)} would give the
 * same sequence shifted by one draw.
 */
final class SampleSeeds {

    private static final long GOLDEN_GAMMA = 0x9e3779b97f4a7c15L;

    private SampleSeeds() {
    }

    /** The random stream of sample {@code index} of a run seeded with {@code seed}. */
    static SplittableRandom stream(long seed, long index) {
        return new SplittableRandom(mix64(mix64(seed) + GOLDEN_GAMMA * (index + 1)));
    }

    /** The SplitMix64 finaliser (a bijection of the 64-bit integers). */
    static long mix64(long z) {
        z = (z ^ (z >>> 30)) * 0xbf58476d1ce4e5b9L;
        z = (z ^ (z >>> 27)) * 0x94d049bb133111ebL;
        return z ^ (z >>> 31);
    }
}
