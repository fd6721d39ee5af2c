package org.flyloop.envelope;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashSet;
import java.util.Set;
import org.junit.jupiter.api.Test;

class SampleSeedsTest {

    @Test
    void aSampleStreamDependsOnSeedAndIndexOnly() {
        assertEquals(SampleSeeds.stream(5, 17).nextLong(), SampleSeeds.stream(5, 17).nextLong());
        Set<Long> first = new HashSet<>();
        for (long i = 0; i < 10_000; i++) {
            first.add(SampleSeeds.stream(5, i).nextLong());
        }
        assertEquals(10_000, first.size());
    }

    /**
     * Neighbouring streams must not be shifted copies of each other, which is what seeding
     * {@code SplittableRandom} with seed + index·γ would give.
     */
    @Test
    void neighbouringStreamsAreNotShiftedCopies() {
        var a = SampleSeeds.stream(1, 0);
        long[] drawsA = new long[8];
        for (int i = 0; i < 8; i++) {
            drawsA[i] = a.nextLong();
        }
        var b = SampleSeeds.stream(1, 1);
        for (int i = 0; i < 8; i++) {
            long x = b.nextLong();
            for (long y : drawsA) {
                assertTrue(x != y);
            }
        }
    }
}
