package dev.ampsieve.catalog;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.fail;

import dev.ampsieve.yaml.Problem;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

/** Invented test parts written in block style, so every value's line and column can be read off the text. */
final class CatalogFixtures {
    private CatalogFixtures() {}

    /** A valid, invented part with every required key and the common optional ones; all values distinct. */
    static final String BASE = """
            id: test-amp-01
            title: Invented test amplifier
            architecture: standard
            input: bipolar
            vos:
              typ: 0.5 mV
              max: 2 mV
              max-over-temp: 3 mV
            vos-drift:
              typ: 2 uV/C
              max: 10 uV/C
            ib:
              typ: 20 nA
              max: 100 nA
              max-over-temp: 200 nA
            ios:
              typ: 2 nA
              max: 10 nA
              max-over-temp: 20 nA
            cmrr:
              min: 90 dB
              typ: 110 dB
            psrr:
              min: 95 dB
              typ: 115 dB
            aol:
              min: 100 dB
              typ: 120 dB
            gbw: 1 MHz
            slew: 0.5 V/us
            supply:
              min: 4.5 V
              max: 36 V
            temperature:
              min: -40 C
              max: 85 C
            price:
              unit: 1.20
              quantity: 1000
              currency: USD
            noise:
              en: 12 nV/rtHz
              en-corner: 7 Hz
              in: 0.3 pA/rtHz
              in-corner: 150 Hz
            long-term-drift:
              value: 1.5 uV
              per: 1000 h
            """;

    /** Only what a part must have. */
    static final String MINIMAL = """
            id: bare-amp
            architecture: standard
            input: cmos
            vos:
              max: 5 mV
            gbw: 1 MHz
            supply:
              min: 2.7 V
              max: 5.5 V
            temperature:
              min: 0 C
              max: 70 C
            price:
              unit: 0.15
            """;

    /** BASE plus every optional key, so each quantity path has a value. */
    static final String FULL = BASE.substring(0, BASE.indexOf("noise:\n")) + """
            factory-trim: laser
            null-pins: true
            channels: 2
            packages: [soic-8, msop-8]
            tags:
              - precision
              - dual
            noise:
              en: 12 nV/rtHz
              en-corner: 3 Hz
              in: 0.4 pA/rtHz
              in-corner: 140 Hz
            long-term-drift:
              value: 0.3 uV
              per: 1000 h
            input-headroom:
              low: 1.5 V
              high: -0.1 V
            output-headroom:
              low: 0.2 V
              high: 0.25 V
            chopping-frequency: 150 kHz
            quiescent-current: 1.8 mA
            input-capacitance: 7 pF
            test-conditions:
              supply: 30 V
              common-mode: 15 V
            input-crossover:
              from-positive-rail: 1.2 V
              offset-step: 40 uV
            theta-ja: 160 C/W
            chopping-ripple: 3 uV
            measured:
              file: lots/unit-lot.csv
            source: invented for tests
            notes: nothing real
            """;

    /** {@code text} with {@code from} (which must occur exactly once) replaced. */
    static String with(String text, String from, String to) {
        int first = text.indexOf(from);
        if (first < 0 || text.indexOf(from, first + 1) >= 0) {
            fail("fixture must contain '" + from + "' exactly once");
        }
        return text.replace(from, to);
    }

    /** {@code text} without the top-level key {@code key} and the indented lines below it. */
    static String without(String text, String key) {
        StringBuilder sb = new StringBuilder();
        boolean skipping = false;
        boolean found = false;
        for (String line : text.split("\n", -1)) {
            if (line.startsWith(key + ":")) {
                skipping = true;
                found = true;
                continue;
            }
            if (skipping && line.startsWith(" ")) {
                continue;
            }
            skipping = false;
            sb.append(line).append('\n');
        }
        if (!found) {
            fail("fixture has no key '" + key + "'");
        }
        return sb.substring(0, sb.length() - 1);
    }

    /** 1-based line of the only line containing {@code needle}. */
    static int lineOf(String text, String needle) {
        String[] lines = text.split("\n", -1);
        int hit = 0;
        for (int i = 0; i < lines.length; i++) {
            if (lines[i].contains(needle)) {
                if (hit != 0) {
                    fail("'" + needle + "' occurs on more than one line");
                }
                hit = i + 1;
            }
        }
        if (hit == 0) {
            fail("'" + needle + "' not in fixture");
        }
        return hit;
    }

    /** 1-based column where {@code needle} starts on its line. */
    static int columnOf(String text, String needle) {
        return text.split("\n", -1)[lineOf(text, needle) - 1].indexOf(needle) + 1;
    }

    /** The same part as a {@code parts:} list item, indented, for list files. */
    static String asItem(String part) {
        StringBuilder sb = new StringBuilder();
        boolean first = true;
        for (String line : part.split("\n")) {
            sb.append(first ? "  - " : "    ").append(line).append('\n');
            first = false;
        }
        return sb.toString();
    }

    static Path write(Path dir, String name, String text) {
        try {
            Path f = dir.resolve(name);
            Files.createDirectories(f.getParent());
            return Files.writeString(f, text);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The one problem about {@code field}. */
    static Problem about(List<Problem> problems, String field) {
        List<Problem> hits =
                problems.stream().filter(p -> p.field().equals(field)).toList();
        assertEquals(
                1,
                hits.size(),
                "problems about '" + field + "' in:\n"
                        + String.join(
                                "\n", problems.stream().map(Problem::toString).toList()));
        return hits.get(0);
    }

    static void assertAt(Problem p, Path file, int line, int column) {
        assertEquals(file, p.file(), p.toString());
        assertEquals(line, p.line(), "line of " + p);
        assertEquals(column, p.column(), "column of " + p);
    }
}
