package org.flyloop.cli.output;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

class NumberTextTest {

    /** Expected strings are the inputs rounded to four significant digits by hand. */
    @Test
    void roundsToSignificantDigitsWithoutExponent() {
        assertEquals("0.04922", NumberText.significant(0.0492187, 4));
        assertEquals("375", NumberText.significant(375.0, 4));
        assertEquals("1235000", NumberText.significant(1_234_567, 4));
        assertEquals("0.000015", NumberText.significant(1.5e-5, 4));
        assertEquals("-2.5", NumberText.significant(-2.5, 4));
        assertEquals("0", NumberText.significant(0, 4));
        assertEquals("-", NumberText.significant(Double.NaN, 4));
        assertEquals("inf", NumberText.significant(Double.POSITIVE_INFINITY, 4));
    }

    @Test
    void tableAlignsNumbersRightAndTextLeft() {
        String text = new TextTable(List.of(TextTable.Column.number("v[V]"), TextTable.Column.text("mode")))
                .add(List.of("1.5", "CCM"))
                .add(List.of("375", "boundary"))
                .render();
        assertEquals("v[V]  mode\n 1.5  CCM\n 375  boundary\n", text);
    }
}
