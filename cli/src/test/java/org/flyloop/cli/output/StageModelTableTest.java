package org.flyloop.cli.output;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.flyloop.units.QuantityParser;
import org.flyloop.units.Unit;
import org.junit.jupiter.api.Test;

/** Number formats of the stage command's model outputs. */
class StageModelTableTest {

    @Test
    void engineeringTextUsesTheSpecSuffixes() {
        assertEquals("32.5k", StageModelTable.engineering(32_500));
        assertEquals("999", StageModelTable.engineering(999.4));
        assertEquals("1k", StageModelTable.engineering(999.6));
        assertEquals("1.2meg", StageModelTable.engineering(1.2e6));
        assertEquals("4.27m", StageModelTable.engineering(4.27e-3));
        assertEquals("47u", StageModelTable.engineering(47e-6));
        assertEquals("0", StageModelTable.engineering(0));
        assertEquals("-", StageModelTable.engineering(Double.NaN));
    }

    /** Whatever the table prints reads back through the spec's own number parser within the three digits shown. */
    @Test
    void engineeringTextReadsBackAsTheSameNumber() {
        for (double v : new double[] {3.3e-9, 0.0123, 1, 59.3, 6500, 32_512, 171_000, 2.5e6}) {
            double back = QuantityParser.parse(StageModelTable.engineering(v), Unit.HERTZ);
            assertEquals(v, back, 5e-3 * v, String.valueOf(v));
        }
    }

    @Test
    void csvNumbersKeepTenDigitsWithoutTrailingZeros() {
        assertEquals("10", BodeCsv.number(10));
        assertEquals("32.5", BodeCsv.number(32.5));
        assertEquals("-171.5149503", BodeCsv.number(-171.51495034));
        assertEquals("1.293219754e-09", BodeCsv.number(1.2932197541e-9));
        assertEquals("NaN", BodeCsv.number(Double.NaN));
        assertEquals(1.2932197541e-9, Double.parseDouble(BodeCsv.number(1.2932197541e-9)), 1e-18);
    }
}
