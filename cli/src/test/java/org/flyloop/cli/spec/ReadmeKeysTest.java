package org.flyloop.cli.spec;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The spec reference in README.md documents every key the loader accepts. */
class ReadmeKeysTest {

    @Test
    void everyKeyHasARowInTheReadme() throws IOException {
        String readme = Files.readString(Path.of("..", "README.md"));
        for (List<String> keys : List.of(StageSectionReader.KEYS, ControlSectionReader.KEYS,
                FeedbackSectionReader.KEYS, PartKeys.ALL, TargetsSectionReader.KEYS, SeriesSectionReader.KEYS,
                TolerancesSectionReader.KEYS)) {
            for (String key : keys) {
                assertTrue(readme.contains("| `" + key + "` |"), "README.md has no table row for " + key);
            }
        }
    }

    @Test
    void everySectionHasAHeading() throws IOException {
        String readme = Files.readString(Path.of("..", "README.md"));
        for (String section : SpecLoader.knownKeys(List.of())) {
            if (!section.equals("title")) {
                assertTrue(readme.contains("### `" + section + "`"), "README.md has no heading for " + section);
            }
        }
    }
}
