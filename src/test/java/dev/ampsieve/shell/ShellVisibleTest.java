package dev.ampsieve.shell;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** In the shell too, catalog text reaches the terminal with its control characters shown as escapes. */
class ShellVisibleTest {

    /** An invented part whose title would set the window title and clear the screen (YAML escapes). */
    private static final String PART = String.join(
            "\n",
            "id: title-amp",
            "title: \"quiet \\e]0;owned\\a\\e[2J\\x9b1m \\u202eamp\"",
            "architecture: standard",
            "input: cmos",
            "vos: {typ: 0.2 mV, max: 1 mV}",
            "gbw: 2 MHz",
            "supply: {min: 2.7 V, max: 5.5 V}",
            "temperature: {min: -40 C, max: 125 C}",
            "price: {unit: 0.60, quantity: 1000}",
            "");

    @Test
    void findAndCheckShowTheTitleEscaped(@TempDir Path dir) throws IOException {
        Files.writeString(dir.resolve("amp.yaml"), PART);
        String printed = Sessions.run(
                List.of("--catalog", dir.toString()), null, Map.of("NO_COLOR", "1"), "find quiet", "check");
        assertTrue(printed.contains("quiet \\x1b]0;owned\\x07\\x1b[2J\\x9b1m \\u202eamp"), printed);
        assertTrue(
                printed.contains("amp.yaml:2:8: warning: title: contains control character U+001B (ESCAPE); remove it"),
                printed);
        for (char c : new char[] {0x1b, 0x07, 0x9b, 0x202e}) {
            assertFalse(printed.indexOf(c) >= 0, String.format("U+%04X in%n%s", (int) c, printed));
        }
    }
}
