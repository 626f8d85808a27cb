package dev.ampsieve.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.catalog.CatalogKeys;
import dev.ampsieve.failure.ExitCode;
import dev.ampsieve.search.Schema;
import dev.ampsieve.stage.StageKeys;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** The reference pages and the completion script come from the tables the program reads. */
class HelpCommandTest {

    @Test
    void helpAloneListsTheCommandsAndTheTopics() {
        CliRun r = CliRun.of("help");
        assertEquals(ExitCode.OK.code(), r.code(), r.toString());
        assertTrue(r.out().contains("Reference topics (ampsieve help TOPIC):"), r.out());
        assertTrue(
                r.out().contains("  stage-keys    every key of a stage file: default, example, why it matters"),
                r.out());
        assertTrue(r.out().contains("  completion  Print a shell completion script (bash or zsh)."), r.out());
    }

    @Test
    void stageKeysPageHasALinePerKeyFromTheTable() {
        CliRun r = CliRun.of("help", "stage-keys");
        for (StageKeys.Key k : StageKeys.ORDERED) {
            assertTrue(r.out().contains("- " + k.path() + ": "), k.path());
        }
        // the default and example of one key, as StageKeys holds them
        assertTrue(r.out().replace("\n  ", " ").contains("(default: 20000; example: 20000)"), r.out());
    }

    @Test
    void catalogKeysPageShowsTheBoundsThatRefuseAPart() {
        CliRun r = CliRun.of("help", "catalog-keys");
        List<String> lines = r.outLines();
        // CatalogKeys.BOUNDS: an offset above 1 V and a rejection above 200 dB are errors (GUIDE.md section 9)
        String vos =
                lines.stream().filter(l -> l.startsWith("vos.max ")).findFirst().orElseThrow();
        assertTrue(vos.matches("vos\\.max\\s+V\\s+-\\s+100 mV\\s+-\\s+1\\.00 V\\s+2\\.5 uV"), vos);
        String cmrr = lines.stream()
                .filter(l -> l.startsWith("cmrr.min "))
                .findFirst()
                .orElseThrow();
        assertTrue(cmrr.matches("cmrr\\.min\\s+dB\\s+-\\s+180 dB\\s+-\\s+200 dB\\s+110 dB"), cmrr);
        String supply = lines.stream()
                .filter(l -> l.startsWith("supply.min *"))
                .findFirst()
                .orElseThrow();
        assertTrue(supply.endsWith("2.7 V"), supply);
        for (String path : CatalogKeys.QUANTITIES.keySet()) {
            assertTrue(lines.stream().anyMatch(l -> l.startsWith(path + " ")), path);
        }
    }

    @Test
    void queryPageListsEveryField() {
        CliRun r = CliRun.of("help", "query");
        for (String name : Schema.queryNames()) {
            assertTrue(r.outLines().stream().anyMatch(l -> l.startsWith(name + " ")), name);
        }
        assertTrue(
                r.out()
                        .contains(
                                "null-pins                           word          offset null pins brought out (true, false)"),
                r.out());
    }

    @Test
    void unitsPageStatesTheCaseRule() {
        CliRun r = CliRun.of("help", "units");
        String flat = r.out().replace("\n", " ");
        assertTrue(
                flat.contains("SI prefixes, case-sensitive (m is milli, M is mega): f 1e-15, p 1e-12, n 1e-09,"), flat);
        assertTrue(flat.contains("'10 UV' gets \"write '10 uV'\""), flat);
        assertTrue(r.out().contains("a voltage                  V        2.5 uV"), r.out());
    }

    @Test
    void aTopicNameWithATypoGetsASuggestionAndExitTwo() {
        CliRun r = CliRun.of("help", "querry");
        assertEquals(ExitCode.USAGE.code(), r.code());
        assertEquals(
                "ampsieve: no help topic or command 'querry'; did you mean 'query'?",
                r.err().strip());
    }

    @Test
    void helpOfACommandIsItsUsage() {
        assertEquals(
                CliRun.of("rank", "--help").out(), CliRun.of("help", "rank").out());
    }

    @ParameterizedTest
    @ValueSource(
            strings = {
                "check",
                "budget",
                "find",
                "rank",
                "compare",
                "suffices",
                "bars",
                "scatter",
                "completion",
                "help",
                "record",
                "recheck"
            })
    void everyCommandsHelpHasAParagraphAndAnExample(String command) {
        CliRun r = CliRun.of(command, "--help");
        assertEquals(ExitCode.OK.code(), r.code(), r.toString());
        assertTrue(
                r.out().contains("Example: ampsieve")
                        || r.out().contains("Examples:\n  ampsieve")
                        || r.out().contains("Example:\n  ampsieve"),
                r.out());
        assertTrue(!r.out().contains("%n") && !r.err().contains("WARN"), r.toString());
    }

    @Test
    void completionScriptsAreGeneratedFromTheCommandTree() {
        CliRun bash = CliRun.of("completion", "bash");
        assertEquals(ExitCode.OK.code(), bash.code(), bash.toString());
        assertTrue(bash.out().contains("complete -F _complete_ampsieve"), bash.out());
        // every command and the options of check, as the tree has them
        for (String c : List.of(
                "check", "budget", "find", "rank", "compare", "suffices", "bars", "scatter", "completion", "help")) {
            assertTrue(bash.out().contains(c), c);
        }
        assertTrue(bash.out().contains("--quiet"), "check --quiet");
        // zsh reads the same script through bashcompinit, which the script enables under $ZSH_VERSION
        CliRun zsh = CliRun.of("completion", "zsh");
        assertEquals(bash.out(), zsh.out());
        assertTrue(zsh.out().contains("bashcompinit"), zsh.out());
        assertEquals(ExitCode.USAGE.code(), CliRun.of("completion", "fish").code());
    }
}
