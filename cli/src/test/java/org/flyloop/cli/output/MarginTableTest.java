package org.flyloop.cli.output;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.flyloop.cli.command.DesignCommand;
import org.flyloop.cli.spec.SpecLoader;
import org.flyloop.design.DesignResult;
import org.junit.jupiter.api.Test;

/** The per-corner table: one row per corner, aligned, and colour only when asked for. */
class MarginTableTest {

    /** The 12 V op-amp example with a phase-margin target it cannot meet (see DesignCommandTest). */
    private static DesignResult missed() {
        return DesignCommand.design(SpecLoader.load(Path.of("..", "examples", "telecom-12v-opamp.yaml"),
                List.of("targets.phase_margin=89", "targets.crossover=3k")));
    }

    @Test
    void colourMarksMissesWithoutMovingColumns() {
        DesignResult r = missed();
        String plain = MarginTable.render(r.roundedLoop(), false);
        String coloured = MarginTable.render(r.roundedLoop(), true);
        assertFalse(plain.contains("\u001B"));
        assertTrue(coloured.contains("\u001B[31mMISS\u001B[0m"), coloured);
        // Stripping the escape codes gives back the plain table: alignment is unchanged.
        assertEquals(plain, coloured.replaceAll("\u001B\\[[0-9;]*m", ""));
        String[] lines = plain.split("\n");
        assertEquals(1 + r.roundedLoop().results().size(), lines.length, plain);
        int verdictColumn = lines[0].indexOf("verdict");
        int targetsColumn = lines[0].indexOf("targets");
        for (int i = 1; i < lines.length; i++) {
            assertEquals(verdictColumn, lines[i].indexOf("stable"), "aligned:\n" + plain);
            assertEquals(targetsColumn, lines[i].indexOf("MISS"), "aligned:\n" + plain);
        }
    }
}
