package org.flyloop.units;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.math.BigDecimal;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

/**
 * Round trip against an independent implementation: the value is built with {@link BigDecimal}
 * (exact decimal arithmetic, scale shifted by the prefix exponent of BIPM SI Brochure 2019,
 * Table 7) and compared with the parser's double.
 */
class QuantityParserProperties {

    private static final String[] SUFFIX = {"f", "p", "n", "u", "m", "", "k", "meg", "g"};
    private static final int[] EXPONENT = {-15, -12, -9, -6, -3, 0, 3, 6, 9};

    @Property(tries = 500)
    void suffixShiftsTheDecimalPoint(@ForAll("mantissas") BigDecimal mantissa, @ForAll("suffixIndex") int i) {
        String text = mantissa.toPlainString() + SUFFIX[i] + "V";
        double expected = mantissa.scaleByPowerOfTen(EXPONENT[i]).doubleValue();
        double got = QuantityParser.parse(text, Unit.VOLT);
        // Four roundings of at most 2^-53 relative each: the parsed mantissa, the prefix constant,
        // their product, and the reference's own conversion to double; 5e-16 covers 4 × 1.11e-16.
        assertEquals(expected, got, Math.abs(expected) * 5e-16 + Double.MIN_VALUE, text);
    }

    @Provide
    Arbitrary<BigDecimal> mantissas() {
        return Arbitraries.bigDecimals().between(new BigDecimal("-9999.999"), new BigDecimal("9999.999")).ofScale(3);
    }

    @Provide
    Arbitrary<Integer> suffixIndex() {
        return Arbitraries.integers().between(0, SUFFIX.length - 1);
    }
}
