package dev.ampsieve.catalog;

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

/**
 * Whatever a catalog file holds, {@link CatalogLoader#load} reports it as problems naming that
 * file (or, strict, as an {@link InputException}), never with another exception, and leaves the
 * file byte for byte as it was and the folder without new files.
 */
class CatalogLoaderProperties {

    /** The demo catalog's part files, broken by typing slips, bad numbers and units, and stray YAML. */
    static final Gen<byte[]> FILE = Mutations.bytes(Generate.frequency(List.of(
            Pair.of(8, Mutations.mutated(Mutations.yamlTexts(Path.of("demo-catalog"), false), 6)),
            Pair.of(1, Mutations.noise(200)))));

    @TempDir
    Path dir;

    @Test
    void anyPartFileLoadsOrGivesProblemsAndIsLeftAlone() {
        Path file = dir.resolve("parts.yaml");
        boolean[] strict = {false};
        Props.theory(300).forAll(FILE).checkAssert(bytes -> {
            String shown = new String(bytes, StandardCharsets.UTF_8);
            strict[0] = !strict[0];
            write(file, bytes);
            byte[] before = sha256(bytes);
            Props.onlyTyped(shown, InputException.class, e -> sound(e.problems(), file), () -> {
                Catalog c = CatalogLoader.load(dir, strict[0]);
                assertTrue(sound(c.problems(), file), () -> "problems without file or text: " + c.problems());
            });
            assertArrayEquals(
                    before, sha256(read(file)), () -> "the file changed while loading " + Props.escape(shown));
            assertEquals(List.of(file), list(dir), "the loader left files behind");
        });
    }

    /** Every problem names the file, and says what is wrong. */
    static boolean sound(List<Problem> problems, Path file) {
        return problems.stream()
                .allMatch(p -> file.equals(p.file()) && !ProblemText.message(p).isBlank());
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
