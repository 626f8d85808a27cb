package dev.ampsieve.stage;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.report.ProblemText;
import dev.ampsieve.testing.Mutations;
import dev.ampsieve.testing.Props;
import dev.ampsieve.yaml.InputException;
import dev.ampsieve.yaml.Problem;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.quicktheories.api.Pair;
import org.quicktheories.core.Gen;
import org.quicktheories.generators.Generate;
import org.quicktheories.generators.SourceDSL;

/**
 * Whatever a stage file or a typed answer holds, {@link StageLoader} gives a stage or an
 * {@link InputException} whose problems say what is wrong; never another exception, and the
 * file is left byte for byte as it was.
 */
class StageLoaderProperties {

    static final List<String> STAGES = Mutations.yamlTexts(Path.of("demo-catalog"), true);

    static final Gen<String> TEXT = Generate.frequency(List.of(
            Pair.of(8, Mutations.mutated(STAGES, 6)),
            Pair.of(1, Mutations.noise(200)),
            Pair.of(1, SourceDSL.strings().allPossible().ofLengthBetween(0, 60))));

    @TempDir
    Path dir;

    @Test
    void anyStageTextGivesAStageOrTypedProblems() {
        Path name = Path.of("stage.yaml");
        Props.theory(1000)
                .forAll(TEXT)
                .checkAssert(text -> Props.onlyTyped(
                        text,
                        InputException.class,
                        e -> sound(e.problems(), name),
                        () -> StageLoader.parse(text, name)));
    }

    @Test
    void anyStageFileGivesAStageOrTypedProblemsAndIsLeftAlone() {
        Path file = dir.resolve("stage.yaml");
        Props.theory(300).forAll(Mutations.bytes(TEXT)).checkAssert(bytes -> {
            String shown = new String(bytes, StandardCharsets.UTF_8);
            write(file, bytes);
            byte[] before = sha256(bytes);
            Props.onlyTyped(shown, InputException.class, e -> sound(e.problems(), file), () -> StageLoader.load(file));
            assertArrayEquals(
                    before, sha256(read(file)), () -> "the file changed while loading " + Props.escape(shown));
            assertEquals(List.of(file), list(dir), "the loader left files behind");
        });
    }

    /** What the shell's guided entry does with each typed answer: problems for that key, never an exception. */
    @Test
    void anyAnswerToAnyKeyGivesProblemsOnly() {
        List<String> keys = StageKeys.paths();
        Gen<String> answer = Generate.frequency(List.of(
                Pair.of(
                        4,
                        Mutations.mutated(
                                List.of(
                                        "10",
                                        "100 V/V",
                                        "40 dB",
                                        "10 kohm",
                                        "-40 C",
                                        "125 C",
                                        "5 V",
                                        "0.25 V",
                                        "0.1 Hz",
                                        "10 kHz",
                                        "0.1 %",
                                        "25 ppm/C",
                                        "10 y",
                                        "1 mV",
                                        "yield 99.9 %",
                                        "rss",
                                        "worst-case",
                                        "inverting",
                                        "follower",
                                        "one-point",
                                        "true",
                                        "20000",
                                        "42",
                                        "0.5",
                                        "16",
                                        "2.5 V"),
                                3)),
                Pair.of(1, Mutations.noise(20))));
        Props.theory(800).forAll(Generate.pick(keys), answer).checkAssert((key, text) -> {
            try {
                List<Problem> problems = StageLoader.checkAnswer(key, text);
                assertTrue(
                        problems.stream().allMatch(p -> !ProblemText.message(p).isBlank()),
                        () -> "blank message for " + key + " = " + Props.escape(text) + ": " + problems);
            } catch (RuntimeException | Error e) {
                throw new AssertionError("untyped " + e + " for " + key + " = " + Props.escape(text), e);
            }
        });
    }

    /** Every problem names the file and says what is wrong. */
    static boolean sound(List<Problem> problems, Path file) {
        return !problems.isEmpty()
                && problems.stream()
                        .allMatch(p ->
                                file.equals(p.file()) && !ProblemText.message(p).isBlank());
    }

    static void write(Path file, byte[] bytes) {
        try {
            Files.write(file, bytes);
        } catch (IOException e) {
            throw new AssertionError(e);
        }
    }

    static byte[] read(Path file) {
        try {
            return Files.readAllBytes(file);
        } catch (IOException e) {
            throw new AssertionError(e);
        }
    }

    static List<Path> list(Path dir) {
        try (Stream<Path> s = Files.walk(dir)) {
            return s.filter(p -> !p.equals(dir)).sorted().toList();
        } catch (IOException e) {
            throw new AssertionError(e);
        }
    }

    static byte[] sha256(byte[] bytes) {
        try {
            return MessageDigest.getInstance("SHA-256").digest(bytes);
        } catch (NoSuchAlgorithmException e) {
            throw new AssertionError(e);
        }
    }
}
