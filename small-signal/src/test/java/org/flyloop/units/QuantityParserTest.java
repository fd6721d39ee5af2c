package org.flyloop.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Prefix factors are checked against the SI prefixes of BIPM, "The International System of Units
 * (SI)", 9th edition, 2019, Table 7 (femto 1e-15 ... giga 1e9), and the {@code meg} spelling
 * against the SPICE scale-factor convention (ngspice User's Manual, section 2.3, "meg" = 1e6,
 * "m" = 1e-3). Expected values below are those decimal definitions, written out by hand.
 */
class QuantityParserTest {

    /** Relative tolerance: the parser multiplies one decimal by one power of ten. */
    private static final double REL = 1e-12;

    @ParameterizedTest(name = "{0} as {1} = {2}")
    @CsvSource(delimiter = '|', value = {
            "4.7uF       | FARAD           | 4.7e-6",
            "4.7µF       | FARAD           | 4.7e-6",
            "4.7μF       | FARAD           | 4.7e-6",
            "1000u       | FARAD           | 1e-3",
            "65kHz       | HERTZ           | 65e3",
            "65khz       | HERTZ           | 65e3",
            "65KHz       | HERTZ           | 65e3",
            "65k         | HERTZ           | 65e3",
            "40mohm      | OHM             | 0.04",
            "40mΩ        | OHM             | 0.04",
            "40mOhm      | OHM             | 0.04",
            "40m         | OHM             | 0.04",
            "1meg        | OHM             | 1e6",
            "1MEG        | OHM             | 1e6",
            "1Meg        | OHM             | 1e6",
            "2.2megohm   | OHM             | 2.2e6",
            "1.5megHz    | HERTZ           | 1.5e6",
            "1e6         | HERTZ           | 1e6",
            "2.5e-6      | HENRY           | 2.5e-6",
            "2.5E-6H     | HENRY           | 2.5e-6",
            "700uH       | HENRY           | 700e-6",
            "0           | OHM             | 0",
            "-3          | VOLT            | -3",
            "-0.5V       | VOLT            | -0.5",
            "+12V        | VOLT            | 12",
            ".47u        | FARAD           | 0.47e-6",
            "'  12 V  '  | VOLT            | 12",
            "10 k        | HERTZ           | 1e4",
            "10 kHz      | HERTZ           | 1e4",
            "2A          | AMPERE          | 2",
            "300mA       | AMPERE          | 0.3",
            "1fF         | FARAD           | 1e-15",
            "1f          | FARAD           | 1e-15",
            "1F          | FARAD           | 1",
            "10pF        | FARAD           | 10e-12",
            "22nF        | FARAD           | 22e-9",
            "3g          | HERTZ           | 3e9",
            "3GHz        | HERTZ           | 3e9",
            "1ms         | SECOND          | 1e-3",
            "5s          | SECOND          | 5",
            "24W         | WATT            | 24",
            "200uS       | SIEMENS         | 200e-6",
            "1mS         | SIEMENS         | 1e-3",
            "0.5V/A      | VOLT_PER_AMPERE | 0.5",
            "50kV/s      | VOLT_PER_SECOND | 5e4",
            "0.05V/us    | VOLT_PER_SECOND | 5e4",
            "0.05V/µs    | VOLT_PER_SECOND | 5e4",
            "8           | DIMENSIONLESS   | 8",
            "75%         | DIMENSIONLESS   | 0.75",
            "0.75        | DIMENSIONLESS   | 0.75",
    })
    void parsesToSi(String text, Unit unit, double expected) {
        double got = QuantityParser.parse(text, unit);
        assertEquals(expected, got, Math.abs(expected) * REL, text);
    }

    @ParameterizedTest(name = "{0} refused as ambiguous")
    @CsvSource({"1M", "2.2MHz", "1MΩ", "1Mohm", "3 M"})
    void upperCaseMIsRefusedWithHint(String text) {
        QuantityFormatException e = assertThrows(QuantityFormatException.class,
                () -> QuantityParser.parse(text, Unit.OHM));
        assertTrue(e.problem().contains("ambiguous"), e.getMessage());
        assertTrue(e.accepted().contains("meg") && e.accepted().contains("e6"), e.getMessage());
    }

    @Test
    void megaHintKeepsTheUnit() {
        QuantityFormatException e = assertThrows(QuantityFormatException.class,
                () -> QuantityParser.parse("2.2MHz", Unit.HERTZ));
        assertEquals("write 2.2megHz or 2.2e6Hz for mega, 2.2mHz for milli", e.accepted());
    }

    @Test
    void inductanceForACapacitanceNamesTheExpectedUnit() {
        QuantityFormatException e = assertThrows(QuantityFormatException.class,
                () -> QuantityParser.parse("2.2uH", Unit.FARAD));
        assertEquals("unit uH does not fit a capacitance", e.problem());
        assertEquals("write farads, e.g. 2.2u or 2.2uF", e.accepted());
    }

    @Test
    void percentIsDimensionlessAndRefusedForAVoltage() {
        QuantityFormatException e = assertThrows(QuantityFormatException.class,
                () -> QuantityParser.parse("5%", Unit.VOLT));
        assertTrue(e.problem().contains("does not fit a voltage"), e.getMessage());
    }

    @Test
    void unitForADimensionlessNumberIsRefused() {
        QuantityFormatException e = assertThrows(QuantityFormatException.class,
                () -> QuantityParser.parse("8V", Unit.DIMENSIONLESS));
        assertTrue(e.accepted().contains("plain number"), e.getMessage());
    }

    @ParameterizedTest(name = "''{0}'' refused")
    @CsvSource(delimiter = '|', value = {
            "''", "'   '", "abc", "k10", "1.2.3", "12x", "10 k Hz", "1e999", "inf", "NaN",
            "1 0", "4.7uFF", "5vv", "1mega", "0x10"})
    void malformedTextIsRefused(String text) {
        assertThrows(QuantityFormatException.class, () -> QuantityParser.parse(text, Unit.HERTZ));
    }

    @Test
    void messagesStayOnOneLine() {
        QuantityFormatException e = assertThrows(QuantityFormatException.class,
                () -> QuantityParser.parse("12\nvolts\tplease", Unit.VOLT));
        assertFalse(e.getMessage().contains("\n") || e.getMessage().contains("\t"), e.getMessage());
    }

    @Test
    void nullIsRefusedNotAnNpe() {
        assertThrows(QuantityFormatException.class, () -> QuantityParser.parse(null, Unit.VOLT));
    }
}
