package dev.ampsieve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * Dependencies point inward (architecture.md): each package may import only the packages in
 * its row. A plain source scan, so it needs no extra library.
 */
class ArchitectureTest {

    private static final Path MAIN = Path.of("src/main/java/dev/ampsieve");

    /** package -> packages of ours it may import. */
    private static final Map<String, Set<String>> ALLOWED = Map.ofEntries(
            Map.entry("text", Set.of()),
            Map.entry("units", Set.of("text")),
            Map.entry("yaml", Set.of("text", "units")),
            Map.entry("catalog", Set.of("text", "units", "yaml")),
            Map.entry("stage", Set.of("text", "units", "yaml", "catalog")),
            Map.entry("stats", Set.of("text")),
            Map.entry("budget", Set.of("text", "units", "yaml", "catalog", "stage", "stats")),
            Map.entry("search", Set.of("text", "units", "yaml", "catalog")),
            Map.entry("sheet", Set.of("text", "units", "yaml", "catalog")),
            Map.entry("advice", Set.of("text", "units", "yaml", "catalog", "stage", "stats", "budget", "search")),
            Map.entry("record", Set.of("text", "units", "yaml", "catalog", "stage", "stats", "budget", "search", "advice")),
            Map.entry("report", Set.of("text", "units", "yaml", "catalog", "stage", "stats", "budget", "search", "advice", "record")),
            Map.entry("cli", Set.of("text", "units", "yaml", "catalog", "stage", "stats", "budget", "search", "advice", "record", "report", "shell", "sheet")),
            Map.entry("shell", Set.of("text", "units", "yaml", "catalog", "stage", "stats", "budget", "search", "advice", "record", "report", "cli", "sheet")));

    private static final Pattern OURS = Pattern.compile("(?m)^import\\s+(?:static\\s+)?dev\\.ampsieve\\.(\\w+)\\.");

    @Test
    void packagesImportOnlyInward() throws IOException {
        List<String> violations = new ArrayList<>();
        try (Stream<Path> files = Files.walk(MAIN)) {
            for (Path f : files.filter(p -> p.toString().endsWith(".java")).toList()) {
                String pkg = MAIN.relativize(f).getName(0).toString();
                Set<String> allowed = ALLOWED.get(pkg);
                assertTrue(allowed != null, "package " + pkg + " has no row in ArchitectureTest.ALLOWED; add one");
                Matcher m = OURS.matcher(Files.readString(f));
                while (m.find()) {
                    String target = m.group(1);
                    if (!target.equals(pkg) && !allowed.contains(target)) {
                        violations.add(f + " imports dev.ampsieve." + target);
                    }
                }
            }
        }
        assertEquals(List.of(), violations);
    }

    @Test
    void domainCodeNeverPrints() throws IOException {
        List<String> violations = new ArrayList<>();
        for (String pkg : List.of("text", "units", "yaml", "catalog", "stage", "stats", "budget", "search", "advice", "record", "sheet")) {
            Path dir = MAIN.resolve(pkg);
            if (!Files.isDirectory(dir)) {
                continue;
            }
            try (Stream<Path> files = Files.walk(dir)) {
                for (Path f : files.filter(p -> p.toString().endsWith(".java")).toList()) {
                    String src = Files.readString(f);
                    if (src.contains("System.out") || src.contains("System.err") || src.contains("printStackTrace")) {
                        violations.add(f.toString());
                    }
                }
            }
        }
        assertEquals(List.of(), violations);
    }
}
