package org.flyloop.cli.spec;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;

/** The spec files under src/test/resources/spec (surefire runs in the module directory). */
final class SpecFixtures {

    static final Path DIR = Path.of("src", "test", "resources", "spec");
    static final Path SHUNT_OPTO_FULL = DIR.resolve("shunt-opto-full.yaml");
    static final Path OPAMP_TYPE3 = DIR.resolve("opamp-type3.yaml");
    static final Path OTA_AUTO = DIR.resolve("ota-auto.yaml");

    /** Only stage and control: every later section absent. */
    static final String STAGE_AND_CONTROL = String.join("\n",
            "stage: {vin: 300, vout: 12, iout: 2, fsw: 65k, lm: 700u, turns: 8, cout: 1000u, esr: 40m}",
            "control: {scheme: voltage, ramp: 2.5}", "");

    private SpecFixtures() {
    }

    static String text(Path file) {
        try {
            return Files.readString(file);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
