package org.flyloop.eseries;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;

/**
 * Checks the transcribed tables against what IEC 60063:2015 says about them: the member counts,
 * the nesting of the series (each one is every other member of the next finer one), the rule that
 * E48–E192 are the geometric values 10^(i/n) rounded to three significant figures with one listed
 * exception (9.20 in E192), and the historical values of E3–E24 that depart from that rounding.
 */
class ESeriesTableTest {

    @Test
    void eachSeriesHasItsNominalCountPerDecade() {
        assertEquals(3, ESeries.E3.membersPerDecade());
        assertEquals(6, ESeries.E6.membersPerDecade());
        assertEquals(12, ESeries.E12.membersPerDecade());
        assertEquals(24, ESeries.E24.membersPerDecade());
        assertEquals(48, ESeries.E48.membersPerDecade());
        assertEquals(96, ESeries.E96.membersPerDecade());
        assertEquals(192, ESeries.E192.membersPerDecade());
        for (ESeries s : ESeries.values()) {
            assertEquals(s.membersPerDecade(), s.decade().size(), s.name());
        }
    }

    @Test
    void decadesAreStrictlyAscendingWithinOneToTen() {
        for (ESeries s : ESeries.values()) {
            List<Double> d = s.decade();
            assertEquals(1.0, d.get(0), 0.0, s.name());
            for (int i = 1; i < d.size(); i++) {
                assertTrue(d.get(i) > d.get(i - 1), s.name() + " at " + i);
            }
            assertTrue(d.get(d.size() - 1) < 10, s.name());
        }
    }

    @Test
    void coarserSeriesAreEveryOtherMemberOfTheFinerOne() {
        assertEveryOther(ESeries.E3, ESeries.E6);
        assertEveryOther(ESeries.E6, ESeries.E12);
        assertEveryOther(ESeries.E12, ESeries.E24);
        assertEveryOther(ESeries.E48, ESeries.E96);
        assertEveryOther(ESeries.E96, ESeries.E192);
    }

    private static void assertEveryOther(ESeries coarse, ESeries fine) {
        List<Double> f = fine.decade();
        List<Double> expected = new ArrayList<>();
        for (int i = 0; i < f.size(); i += 2) {
            expected.add(f.get(i));
        }
        assertEquals(expected, coarse.decade(), coarse + " vs " + fine);
    }

    @Test
    void historicalValuesOfE24AreListed() {
        // IEC 60063 E24 values that are not the rounded geometric sequence.
        for (double v : new double[] {2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7, 8.2}) {
            assertTrue(ESeries.E24.contains(v), "E24 lacks " + v);
        }
        for (double v : new double[] {2.6, 2.9, 3.2, 3.5, 3.8, 4.2, 4.6, 8.3}) {
            assertFalse(ESeries.E24.contains(v), "E24 must not contain " + v);
        }
        assertTrue(ESeries.E3.contains(4.7));
        assertTrue(ESeries.E12.contains(8.2));
    }

    @Test
    void e192Has920NotTheRounded919() {
        assertTrue(ESeries.E192.contains(9.20));
        assertFalse(ESeries.E192.contains(9.19));
        assertTrue(ESeries.E96.contains(4.99));
        assertTrue(ESeries.E192.contains(4.99));
        assertFalse(ESeries.E48.contains(4.99));
    }

    /**
     * Independent construction: round(10^(i/n)) to the series' significant figures. The only
     * departures must be exactly the ones IEC 60063 documents.
     */
    @Test
    void departuresFromGeometricRoundingAreExactlyTheDocumentedOnes() {
        Map<ESeries, Map<Integer, Integer>> documented = Map.of(
                ESeries.E3, Map.of(47, 46),
                ESeries.E6, Map.of(33, 32, 47, 46),
                ESeries.E12, Map.of(27, 26, 33, 32, 39, 38, 47, 46, 82, 83),
                ESeries.E24, Map.of(27, 26, 30, 29, 33, 32, 36, 35, 39, 38, 43, 42, 47, 46, 82, 83),
                ESeries.E48, Map.of(),
                ESeries.E96, Map.of(),
                ESeries.E192, Map.of(920, 919));
        for (ESeries s : ESeries.values()) {
            int n = s.membersPerDecade();
            int digitsScale = n <= 24 ? 10 : 100;
            Map<Integer, Integer> found = new TreeMap<>();
            List<Double> d = s.decade();
            for (int i = 0; i < n; i++) {
                int listed = (int) Math.round(d.get(i) * digitsScale);
                int geometric = (int) Math.round(Math.pow(10, (double) i / n) * digitsScale);
                if (listed != geometric) {
                    found.put(listed, geometric);
                }
            }
            assertEquals(new TreeMap<>(documented.get(s)), found, s.name());
        }
    }

    @Test
    void parsesNamesIgnoringCaseAndBlanks() {
        assertEquals(ESeries.E12, ESeries.parse("E12"));
        assertEquals(ESeries.E96, ESeries.parse(" e96 "));
        assertEquals(ESeries.E192, ESeries.parse("E192"));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> ESeries.parse("E100"));
        assertTrue(e.getMessage().contains("E96"));
        assertThrows(IllegalArgumentException.class, () -> ESeries.parse(null));
    }
}
