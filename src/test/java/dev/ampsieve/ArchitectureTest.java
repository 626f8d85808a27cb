package dev.ampsieve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * Dependencies point inward (architecture.md, DEVELOPERS.md "Architecture and data flow"): each
 * package may use only the packages in its row, and no two packages use each other, directly
 * or round a longer loop. A plain source scan, so it needs no extra library: it sees import
 * lines and fully qualified names written in the code ({@code dev.ampsieve.cli.Main.main(x)}),
 * but not names in comments or string literals.
 */
class ArchitectureTest {

    private static final Path MAIN = Path.of("src/main/java/dev/ampsieve");

    /** Every package may use these: the bottom of the graph. */
    private static final Set<String> BOTTOM = Set.of("text", "failure");

    private static Set<String> withBottom(String... packages) {
        Set<String> s = new TreeSet<>(BOTTOM);
        s.addAll(List.of(packages));
        return s;
    }

    /** package -> packages of ours it may use. Mirrors the table in DEVELOPERS.md. */
    private static final Map<String, Set<String>> ALLOWED = Map.ofEntries(
            Map.entry("text", Set.of()),
            Map.entry("failure", Set.of("text")),
            Map.entry("units", withBottom()),
            Map.entry("yaml", withBottom("units")),
            Map.entry("catalog", withBottom("units", "yaml")),
            Map.entry("stage", withBottom("units", "yaml", "catalog")),
            Map.entry("stats", withBottom()),
            Map.entry("budget", withBottom("units", "yaml", "catalog", "stage", "stats")),
            Map.entry("search", withBottom("units", "yaml", "catalog")),
            Map.entry("sheet", withBottom("units", "yaml", "catalog")),
            Map.entry("advice", withBottom("units", "yaml", "catalog", "stage", "stats", "budget", "search")),
            Map.entry("record", withBottom("units", "yaml", "catalog", "stage", "stats", "budget", "search", "advice")),
            // issue 16: bench rigs (the offset test circuit) from the part's budget figures
            Map.entry("rig", withBottom("units", "yaml", "catalog", "stage", "stats", "budget")),
            Map.entry(
                    "report",
                    withBottom(
                            "units", "yaml", "catalog", "stage", "stats", "budget", "search", "advice", "record",
                            "rig")),
            Map.entry(
                    "commands",
                    withBottom(
                            "units", "yaml", "catalog", "stage", "stats", "budget", "search", "advice", "record",
                            "report", "sheet", "rig")),
            Map.entry(
                    "shell",
                    withBottom(
                            "units",
                            "yaml",
                            "catalog",
                            "stage",
                            "stats",
                            "budget",
                            "search",
                            "advice",
                            "record",
                            "report",
                            "sheet",
                            "commands")),
            Map.entry("cli", Set.of("commands", "shell")));

    /** A name of ours: {@code dev.ampsieve.PKG.} in an import or written inline. */
    private static final Pattern OURS = Pattern.compile("\\bdev\\s*\\.\\s*ampsieve\\s*\\.\\s*(\\w+)\\s*\\.");

    @Test
    void packagesUseOnlyTheirRow() throws IOException {
        List<String> violations = new ArrayList<>();
        for (Map.Entry<Path, Set<String>> e : uses().entrySet()) {
            String pkg = packageOf(e.getKey());
            Set<String> allowed = ALLOWED.get(pkg);
            assertTrue(allowed != null, "package " + pkg + " has no row in ArchitectureTest.ALLOWED; add one");
            for (String target : e.getValue()) {
                if (!target.equals(pkg) && !allowed.contains(target)) {
                    violations.add(e.getKey() + " uses dev.ampsieve." + target);
                }
            }
        }
        assertEquals(List.of(), violations);
    }

    @Test
    void noPackageCycleInTheRulesOrInTheCode() throws IOException {
        assertEquals(List.of(), cycle(ALLOWED), "the table allows a cycle");
        Map<String, Set<String>> actual = new TreeMap<>();
        for (Map.Entry<Path, Set<String>> e : uses().entrySet()) {
            String pkg = packageOf(e.getKey());
            Set<String> to = actual.computeIfAbsent(pkg, k -> new TreeSet<>());
            e.getValue().stream().filter(t -> !t.equals(pkg)).forEach(to::add);
        }
        assertEquals(List.of(), cycle(actual), "the code has a cycle");
    }

    @Test
    void theScanSeesImportsAndInlineNamesButNotCommentsOrStrings() {
        String fixture = """
                package dev.ampsieve.shell;

                import dev.ampsieve.report.Wrap;
                import static dev.ampsieve.stage.StageKeys.paths;
                // dev.ampsieve.budget.Budget in a line comment
                /* dev.ampsieve.advice.Ranker in a block comment */
                /** {@link dev.ampsieve.search.PartIndex} in Javadoc */
                final class Fixture {
                    int code = dev.ampsieve.cli.Main.hashCode();
                    Object o = new dev.ampsieve
                            .sheet.Columns();
                    String s = "dev.ampsieve.catalog.Part in a string";
                    char c = '"';
                    String t = \"""
                            dev.ampsieve.stats.Wilson in a text block
                            \""";
                }
                """;
        assertEquals(Set.of("report", "stage", "cli", "sheet"), referenced(fixture));
    }

    @Test
    void theCycleCheckFindsALoop() {
        Map<String, Set<String>> g = Map.of("cli", Set.of("shell"), "shell", Set.of("text", "cli"), "text", Set.of());
        assertEquals(List.of("cli", "shell", "cli"), cycle(g));
        assertEquals(List.of(), cycle(Map.of("cli", Set.of("shell"), "shell", Set.of("text"))));
    }

    @Test
    void domainCodeNeverPrints() throws IOException {
        List<String> violations = new ArrayList<>();
        for (String pkg : List.of(
                "text", "failure", "units", "yaml", "catalog", "stage", "stats", "budget", "search", "advice", "record",
                "sheet", "rig")) {
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

    @Test
    void theDomainPackagesReturnFactsNotFormattedText() throws IOException {
        // terms return operands, assumptions and constraints as typed facts; the advice its findings, changes and
        // caveats; the loaders their problems (StageFact, CatalogFact): report words and formats them all
        // (TermNotes, AssumptionText, ConstraintText, AdviceText, ProblemText, CriterionText)
        for (String pkg :
                List.of("budget", "advice", "stage", "catalog", "search", "sheet", "stats", "record", "yaml", "rig")) {
            assertEquals(List.of(), formatting(pkg), pkg);
        }
    }

    /** The files of {@code pkg} that call {@code Units.format(}. */
    private static List<String> formatting(String pkg) throws IOException {
        List<String> found = new ArrayList<>();
        if (!Files.isDirectory(MAIN.resolve(pkg))) {
            return found;
        }
        try (Stream<Path> files = Files.walk(MAIN.resolve(pkg))) {
            for (Path f : files.filter(p -> p.toString().endsWith(".java")).toList()) {
                if (Files.readString(f).contains("Units.format(")) {
                    found.add(f.toString());
                }
            }
        }
        return found;
    }

    private static String packageOf(Path file) {
        return MAIN.relativize(file).getName(0).toString();
    }

    /** Each main source file and the packages of ours it names in code. */
    private static Map<Path, Set<String>> uses() throws IOException {
        Map<Path, Set<String>> out = new TreeMap<>();
        try (Stream<Path> files = Files.walk(MAIN)) {
            for (Path f : files.filter(p -> p.toString().endsWith(".java")).toList()) {
                out.put(f, referenced(Files.readString(f)));
            }
        }
        return out;
    }

    /** The packages of ours a Java source names in code, in imports or inline (its own package line names none). */
    static Set<String> referenced(String source) {
        Set<String> found = new TreeSet<>();
        Matcher m = OURS.matcher(codeOnly(source));
        while (m.find()) {
            found.add(m.group(1));
        }
        return found;
    }

    /** The source with comments, string and character literals and text blocks blanked out. */
    static String codeOnly(String s) {
        StringBuilder out = new StringBuilder(s.length());
        int i = 0;
        while (i < s.length()) {
            char c = s.charAt(i);
            if (s.startsWith("//", i)) {
                int end = s.indexOf('\n', i);
                i = end < 0 ? s.length() : end;
            } else if (s.startsWith("/*", i)) {
                int end = s.indexOf("*/", i + 2);
                i = end < 0 ? s.length() : end + 2;
                out.append(' ');
            } else if (s.startsWith("\"\"\"", i)) {
                int end = s.indexOf("\"\"\"", i + 3);
                i = end < 0 ? s.length() : end + 3;
                out.append("\"\"");
            } else if (c == '"' || c == '\'') {
                int j = i + 1;
                while (j < s.length() && s.charAt(j) != c) {
                    j += s.charAt(j) == '\\' ? 2 : 1;
                }
                i = Math.min(s.length(), j + 1);
                out.append(c).append(c);
            } else {
                out.append(c);
                i++;
            }
        }
        return out.toString();
    }

    /** A cycle in the graph as the packages round it (first repeated at the end), or empty when there is none. */
    static List<String> cycle(Map<String, Set<String>> graph) {
        Map<String, Integer> state = new LinkedHashMap<>(); // 1 on the path, 2 done
        for (String start : new TreeSet<>(graph.keySet())) {
            List<String> found = visit(start, graph, state, new LinkedHashSet<>());
            if (!found.isEmpty()) {
                return found;
            }
        }
        return List.of();
    }

    private static List<String> visit(
            String node, Map<String, Set<String>> graph, Map<String, Integer> state, LinkedHashSet<String> path) {
        Integer st = state.get(node);
        if (st != null && st == 2) {
            return List.of();
        }
        if (st != null && st == 1) {
            List<String> p = new ArrayList<>(path);
            List<String> loop = new ArrayList<>(p.subList(p.indexOf(node), p.size()));
            loop.add(node);
            return loop;
        }
        state.put(node, 1);
        path.add(node);
        for (String next : new TreeSet<>(graph.getOrDefault(node, Set.of()))) {
            if (next.equals(node)) {
                continue;
            }
            List<String> found = visit(next, graph, state, path);
            if (!found.isEmpty()) {
                return found;
            }
        }
        path.remove(node);
        state.put(node, 2);
        return List.of();
    }
}
