package org.flyloop.cli.output;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Engineering notation of part values. The prefixes and their powers of 1000 are those of the SI
 * (BIPM, "The International System of Units", 9th edition, 2019, table 7).
 */
class PartsNotationTest {

    @ParameterizedTest
    @CsvSource({
        "38300,     Ω,  3, 38.3 kΩ",
        "1e-8,      F,  3, 10 nF",
        "4.7e-12,   F,  3, 4.7 pF",
        "2.2e-6,    F,  2, 2.2 µF",
        "1e-3,      S,  3, 1 mS",
        "1e7,       Hz, 3, 10 MHz",
        "88.7,      Ω,  3, 88.7 Ω",
        "1.2e9,     Hz, 2, 1.2 GHz",
        // rounding carries into the next prefix instead of printing 1000 Ω
        "999.96,    Ω,  3, 1 kΩ",
        "-0.0923,   V,  3, -92.3 mV",
        "3.3e-16,   F,  2, 0.33 fF",
    })
    void valueWithPrefixAndUnit(double value, String unit, int digits, String expected) {
        assertEquals(expected, PartsNotation.engineering(value, unit, digits));
    }

    @Test
    void zeroAndMissing() {
        assertEquals("0 Ω", PartsNotation.engineering(0, "Ω", 3));
        assertEquals("-", PartsNotation.engineering(Double.NaN, "Ω", 3));
    }

    @Test
    void partsTakeTheUnitOfTheirRole() {
        assertEquals("38.3 kΩ", PartsNotation.part("r_upper", 38.3e3, 3));
        assertEquals("10 nF", PartsNotation.part("c_zero", 10e-9, 3));
        assertEquals("1 mS", PartsNotation.part("gm", 1e-3, 3));
        assertEquals("10 MHz", PartsNotation.part("gbw", 10e6, 3));
        assertEquals("1.77 nF", PartsNotation.part("c_opto", 1.772e-9, 3));
        // A CTR is a ratio, stated as a percentage the way data sheets do.
        assertEquals("110 %", PartsNotation.part("ctr", 1.1, 3));
    }
}
