package org.flyloop.cli.command;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.stream.Stream;
import org.flyloop.cli.CliRun;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Malformed model, Bode, transient and netlist options: exit 2, one stderr line that starts with
 * {@code flyloop: } and the option at fault, nothing on stdout, and no file written, not even
 * the outputs that would have succeeded.
 */
class StageOptionErrorsTest {

    @TempDir
    Path dir;

    static Stream<Arguments> cases() {
        String bus = StageFiles.BUS.toString();
        String charger = StageFiles.CHARGER.toString();
        return Stream.of(
                Arguments.of("range without ..", "--freq: '10' is not a range",
                        List.of(bus, "--iout", "2", "--bode", "@b.csv", "--freq", "10")),
                Arguments.of("range upside down", "--freq: need 0 < LO < HI",
                        List.of(bus, "--iout", "2", "--bode", "@b.csv", "--freq", "10k..10")),
                Arguments.of("range with the M rule", "--freq: '1M': M is ambiguous",
                        List.of(bus, "--iout", "2", "--bode", "@b.csv", "--freq", "10..1M")),
                Arguments.of("unknown model", "--model: unknown model 'x'; write analytic, averaged or both",
                        List.of(bus, "--iout", "2", "--bode", "@b.csv", "--model", "x")),
                Arguments.of("unknown quantity", "--quantity: unknown quantity 'y'",
                        List.of(bus, "--iout", "2", "--bode", "@b.csv", "--quantity", "y")),
                Arguments.of("unknown step", "--transient: 'pulse:3' is not a step; write duty-step:+2%",
                        List.of(bus, "--iout", "2", "--transient", "pulse:3", "--csv", "@t.csv")),
                Arguments.of("load step without percent", "--transient: 'load-step:50..100' is not a step",
                        List.of(bus, "--iout", "2", "--transient", "load-step:50..100", "--csv", "@t.csv")),
                Arguments.of("unsigned relative step", "--transient: 'duty-step:2%' needs a signed change",
                        List.of(bus, "--iout", "2", "--transient", "duty-step:2%", "--csv", "@t.csv")),
                Arguments.of("duty step in current mode", "--transient: duty-step needs voltage mode",
                        List.of(charger, "--vin", "90", "--iout", "2", "--transient", "duty-step:+2%", "--csv",
                                "@t.csv")),
                Arguments.of("negative time", "--time: must be positive, got -1",
                        List.of(bus, "--iout", "2", "--transient", "duty-step:+2%", "--time", "-1", "--csv", "@t.csv")),
                Arguments.of("time in the wrong unit", "--time: unit V does not fit a time",
                        List.of(bus, "--iout", "2", "--transient", "duty-step:+2%", "--time", "5V", "--csv", "@t.csv")),
                Arguments.of("several corners", "--vin/--iout: --bode works at one operating point and there are"
                        + " 2 input voltages (90, 375 V) and 3 loads (0.1, 1, 2 A); choose one with --vin 90 --iout 2",
                        List.of(charger, "--bode", "@b.csv")),
                Arguments.of("several loads", "--iout: --netlist works at one operating point",
                        List.of(bus, "--netlist", "@n.cir")),
                Arguments.of("line step still needs one load", "--iout: --transient works at one operating point",
                        List.of(charger, "--transient", "line-step:100..200", "--csv", "@t.csv")),
                Arguments.of("duty quantity of the averaged current-mode model", "--quantity: duty has no averaged"
                        + " counterpart in current mode",
                        List.of(charger, "--vin", "90", "--iout", "2", "--bode", "@b.csv", "--model", "both",
                                "--quantity", "duty")),
                Arguments.of("model without bode", "--model: applies to --bode only",
                        List.of(bus, "--model", "both")),
                Arguments.of("freq without a sweep", "--freq: applies to --bode and --netlist only",
                        List.of(bus, "--freq", "10..1k")),
                Arguments.of("time without transient", "--time: applies to --transient only",
                        List.of(bus, "--time", "5m")),
                Arguments.of("transient without csv", "--transient: needs --csv FILE.csv",
                        List.of(bus, "--iout", "2", "--transient", "duty-step:+2%")),
                Arguments.of("two outputs, one file", "--csv: ",
                        List.of(bus, "--iout", "2", "--bode", "@same.csv", "--transient", "duty-step:+2%", "--csv",
                                "@same.csv")),
                Arguments.of("missing directory", "--netlist: directory ",
                        List.of(bus, "--iout", "2", "--bode", "@b.csv", "--netlist", "@no/such/dir/n.cir")),
                // the Bode file would succeed; the line step starts where 12 V is out of reach
                Arguments.of("infeasible step after a good Bode file", "--transient: the averaged model cannot hold"
                        + " the output before the step",
                        List.of(bus, "--iout", "2", "--bode", "@b.csv", "--transient", "line-step:5..48", "--csv",
                                "@t.csv")));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void refusedWithOneLineAndNoFiles(String name, String expectedStart, List<String> args) throws IOException {
        List<String> argv = new ArrayList<>(List.of("stage"));
        for (String a : args) {
            argv.add(a.startsWith("@") ? dir.resolve(a.substring(1)).toString() : a);
        }
        CliRun run = CliRun.of(argv.toArray(String[]::new));
        assertEquals(2, run.exitCode(), run.err());
        assertEquals("", run.out());
        assertEquals(1, run.errLines().length, run.err());
        assertTrue(run.err().startsWith("flyloop: " + expectedStart), run.err());
        try (Stream<Path> left = Files.list(dir)) {
            assertEquals(List.of(), left.toList(), "nothing written for " + Arrays.toString(argv.toArray()));
        }
    }
}
