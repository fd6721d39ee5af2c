package org.flyloop.cli.spec;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;

class KeySuggesterTest {

    /**
     * Reference distances: "kitten"/"sitting" = 3 (V. I. Levenshtein, "Binary codes capable of
     * correcting deletions, insertions and reversals", 1966; the standard worked example);
     * "ca"/"abc" = 3 under optimal string alignment, the textbook case where it differs from the
     * unrestricted Damerau–Levenshtein distance (2); one adjacent transposition costs 1
     * (F. J. Damerau, Comm. ACM 7(3), 1964).
     */
    @Test
    void distancesMatchPublishedExamples() {
        assertEquals(3, KeySuggester.distance("kitten", "sitting"));
        assertEquals(3, KeySuggester.distance("ca", "abc"));
        assertEquals(1, KeySuggester.distance("esr", "ers"));
        assertEquals(0, KeySuggester.distance("", ""));
        assertEquals(4, KeySuggester.distance("", "turn"));
    }

    @Test
    void suggestsTheNearestKnownKey() {
        List<String> keys = List.of("vin", "vout", "iout", "fsw", "lm", "turns", "cout", "esr", "rectifier_drop");
        assertEquals(Optional.of("fsw"), KeySuggester.closest("fws", keys));
        assertEquals(Optional.of("esr"), KeySuggester.closest("ESR", keys));
        assertEquals(Optional.of("rectifier_drop"), KeySuggester.closest("rectifier-drop", keys));
        assertEquals(Optional.of("rectifier_drop"), KeySuggester.closest("rectifer_drop", keys));
        assertEquals(Optional.of("turns"), KeySuggester.closest("turn", keys));
        assertEquals(Optional.empty(), KeySuggester.closest("frequency", keys));
        assertEquals(Optional.empty(), KeySuggester.closest("xy", keys));
    }
}
