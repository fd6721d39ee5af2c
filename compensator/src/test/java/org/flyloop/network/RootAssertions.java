package org.flyloop.network;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.util.Arrays;
import java.util.List;
import org.flyloop.linear.Root;

/** Assertions on the corner frequencies of real left-half-plane roots. */
final class RootAssertions {
    private RootAssertions() {
    }

    /** The roots are real, in the left half-plane, at these frequencies (any order), within 1e-9 relative. */
    static void assertRealRootsAtHz(List<Root> roots, double... expectedHz) {
        assertEquals(expectedHz.length, roots.size(), "root count in " + roots);
        double[] got = new double[roots.size()];
        for (int i = 0; i < got.length; i++) {
            Root r = roots.get(i);
            assertFalse(r.isPair() || r.isRightHalfPlane(), "not a real LHP root: " + r);
            got[i] = r.frequencyHz();
        }
        double[] want = expectedHz.clone();
        Arrays.sort(got);
        Arrays.sort(want);
        for (int i = 0; i < want.length; i++) {
            assertEquals(want[i], got[i], 1e-9 * want[i], "root " + i + " of " + roots);
        }
    }
}
