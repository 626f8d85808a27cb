package dev.ampsieve.yaml;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.testing.SpecialFiles;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class YamlFilesTest {

    @TempDir
    Path dir;

    private static Problem only(InputException e) {
        assertEquals(1, e.problems().size(), e.getMessage());
        return e.problems().get(0);
    }

    @Test
    void keepsLineAndColumnOfEveryKeyAndValue() throws Exception {
        Node n = YamlFiles.parse("id: amp-1\nvos:\n  typ: 1 mV\n  max: \"2 mV\"\n", Path.of("a.yaml"));
        Node.Mapping m = assertInstanceOf(Node.Mapping.class, n);
        Node.Mapping vos = assertInstanceOf(Node.Mapping.class, m.entries().get("vos"));
        assertEquals(new Located(Path.of("a.yaml"), 3, 3), vos.keyAt().get("typ"));
        Node.Scalar max = assertInstanceOf(Node.Scalar.class, vos.entries().get("max"));
        assertEquals(new Located(Path.of("a.yaml"), 4, 8), max.at());
        assertEquals("2 mV", max.text());
        assertTrue(max.quoted());
    }

    @Test
    void malformedYamlPointsAtTheSpot() throws Exception {
        // line 2 has a second "key: value" after a value: its colon, column 16, is where parsing fails
        Path f = Files.writeString(dir.resolve("bad.yaml"), "id: amp-1\ngbw: 1 MHz slew: 2 V/us\n");
        Problem p = only(assertThrows(InputException.class, () -> YamlFiles.read(f)));
        assertEquals(f, p.file());
        assertEquals(2, p.line());
        assertEquals(16, p.column());
        assertTrue(p.message().startsWith("YAML syntax: mapping values are not allowed"), p.message());
        assertTrue(p.fix().contains("quote"), p.fix());
    }

    @Test
    void tabIndentationGetsItsOwnFix() {
        Problem p = only(assertThrows(InputException.class, () -> YamlFiles.parse("vos:\n\tmax: 1 mV\n", null)));
        assertEquals(2, p.line());
        assertEquals("indent with spaces, not tabs", p.fix());
    }

    @Test
    void anUnclosedBraceIsPointedAtWhereItOpened() {
        // the parser gives up on line 3 ("gbw:"), but the missing '}' belongs to line 2's '{' at column 6
        Problem p = only(assertThrows(
                InputException.class, () -> YamlFiles.parse("id: a\nvos: {max: 5 uV\ngbw: 2 MHz\n", null)));
        assertEquals(3, p.line());
        assertEquals("the '{' opened at line 2, column 6 is not closed; end it with '}' on that line", p.fix());
        Problem q = only(
                assertThrows(InputException.class, () -> YamlFiles.parse("id: a\ntags: [x, y\ngbw: 2 MHz\n", null)));
        assertEquals("the '[' opened at line 2, column 7 is not closed; end it with ']' on that line", q.fix());
    }

    @Test
    void aKeyWrittenTwiceNamesBothLinesAndThePath() {
        Problem p = only(assertThrows(
                InputException.class,
                () -> YamlFiles.parse("id: a\nvos:\n  max: 1 mV\n  typ: 1 mV\n  max: 2 mV\n", null)));
        assertEquals("vos.max", p.field());
        assertEquals(5, p.line());
        assertEquals(3, p.column());
        assertEquals("key written twice (first on line 3)", p.message());
    }

    /** The classic expansion bomb: nine levels of nine aliases, 9^9 strings if expanded. */
    private static String billionLaughs() {
        StringBuilder sb =
                new StringBuilder("a: &a [\"lol\",\"lol\",\"lol\",\"lol\",\"lol\",\"lol\",\"lol\",\"lol\",\"lol\"]\n");
        char prev = 'a';
        for (char c = 'b'; c <= 'i'; c++) {
            sb.append(c).append(": &").append(c).append(" [");
            for (int i = 0; i < 9; i++) {
                sb.append(i == 0 ? "" : ",").append('*').append(prev);
            }
            sb.append("]\n");
            prev = c;
        }
        return sb.toString();
    }

    @Test
    void anAliasBombIsRefusedAtTheAliasPastTheLimit() throws IOException {
        Path f = Files.writeString(dir.resolve("bomb.yaml"), billionLaughs());
        Problem p = only(assertThrows(InputException.class, () -> YamlFiles.read(f)));
        assertTrue(p.message().startsWith("refused: more than " + YamlFiles.MAX_ALIASES + " aliases"), p.message());
        assertEquals("write the values out instead of using *aliases", p.fix());
        assertEquals(f, p.file());
        // lines 2-6 hold 9 aliases each (45); the 51st is the 6th on line 7, "g: &g [*f,*f,*f,*f,*f,*f":
        // '[' is column 7, each "*f," takes 3 columns, so the 6th '*' is at 8 + 5 * 3 = 23 (counted by hand)
        assertEquals(7, p.line());
        assertEquals(23, p.column());
    }

    @Test
    void aliasesUnderTheLimitShareNodesInsteadOfExpanding() throws Exception {
        // 24 levels of doubling: 48 aliases, under the limit, 2^24 leaves if expanded
        StringBuilder sb = new StringBuilder("l0: &l0 [x]\n");
        for (int i = 1; i <= 24; i++) {
            sb.append("l")
                    .append(i)
                    .append(": &l")
                    .append(i)
                    .append(" [*l")
                    .append(i - 1)
                    .append(", *l")
                    .append(i - 1)
                    .append("]\n");
        }
        Node.Mapping m = assertInstanceOf(Node.Mapping.class, YamlFiles.parse(sb.toString(), null));
        Node.Seq top = assertInstanceOf(Node.Seq.class, m.entries().get("l24"));
        assertSame(top.items().get(0), top.items().get(1));
        assertSame(m.entries().get("l23"), top.items().get(0));
    }

    @Test
    void aSelfReferringAliasIsRefused() {
        Problem p = only(assertThrows(InputException.class, () -> YamlFiles.parse("a: &x\n  b: *x\n", null)));
        assertEquals("an alias refers to a value that contains it", p.message());
        assertEquals("a.b", p.field());
    }

    @Test
    void anOverSizeFileIsRefusedBeforeParsing() throws IOException {
        Path f = dir.resolve("huge.yaml");
        byte[] big = new byte[(int) YamlFiles.MAX_BYTES + 1];
        java.util.Arrays.fill(big, (byte) '#'); // one endless comment: valid YAML, just too large
        Files.write(f, big);
        Problem p = only(assertThrows(InputException.class, () -> YamlFiles.read(f)));
        // 4 MiB = 4 * 1024 * 1024 = 4194304 bytes
        assertEquals("file is over the limit of 4194304 bytes (4 MiB) for one YAML file", p.message());
        assertTrue(p.fix().startsWith("split it"), p.fix());
    }

    @Test
    void devZeroAndANamedPipeAreRefusedInOneLine() throws Exception {
        // the old reader asked for the size (0) and then read /dev/zero until the heap ran out,
        // and opened the pipe, which waits for a writer for ever
        Path zero = SpecialFiles.devZero();
        Problem z = only(assertTimeoutPreemptively(
                SpecialFiles.HANG_GUARD, () -> assertThrows(InputException.class, () -> YamlFiles.read(zero))));
        assertEquals("/dev/zero: not a regular file (a character device); give a YAML file", z.toString());
        Path fifo = SpecialFiles.fifo(dir.resolve("pipe.yaml"));
        Problem f = only(assertTimeoutPreemptively(
                SpecialFiles.HANG_GUARD, () -> assertThrows(InputException.class, () -> YamlFiles.read(fifo))));
        assertEquals(fifo + ": not a regular file (a named pipe); give a YAML file", f.toString());
    }

    @Test
    void deepNestingIsRefusedWhereItPassesTheLimit() {
        // the mapping is level 1 and the k-th '[' level k + 1, at column 3 + k: level 31 is the 30th '[', column 33
        String deep = "a: " + "[".repeat(YamlFiles.MAX_DEPTH + 5) + "]".repeat(YamlFiles.MAX_DEPTH + 5) + "\n";
        Problem p = only(assertThrows(InputException.class, () -> YamlFiles.parse(deep, null)));
        assertEquals("refused: YAML nested more than 30 levels deep", p.message());
        assertEquals(1, p.line());
        assertEquals(33, p.column());
        // block style, one more space per level: the mapping of level d starts on line d, column d
        StringBuilder block = new StringBuilder();
        for (int d = 1; d <= 40; d++) {
            block.append(" ".repeat(d - 1)).append("k").append(d).append(":\n");
        }
        block.append(" ".repeat(40)).append("end\n");
        Problem q = only(assertThrows(InputException.class, () -> YamlFiles.parse(block.toString(), null)));
        assertEquals("refused: YAML nested more than 30 levels deep", q.message());
        assertEquals(31, q.line());
        assertEquals(31, q.column());
    }

    @Test
    void textThatIsNotUtf8IsRefusedAtTheFirstBadByte() throws IOException {
        // Latin-1 writes the degree sign as the single byte 0xB0, never valid alone in UTF-8;
        // "title: 25 " is 10 characters, so the byte is in column 11 of line 2
        Path f = Files.write(
                dir.resolve("latin1.yaml"), "id: a\ntitle: 25 \u00b0C part\n".getBytes(StandardCharsets.ISO_8859_1));
        Problem p = only(assertThrows(InputException.class, () -> YamlFiles.read(f)));
        assertEquals("not valid UTF-8 text (byte 0xB0)", p.message());
        assertEquals(2, p.line());
        assertEquals(11, p.column());
        assertTrue(p.fix().startsWith("save the file as UTF-8"), p.fix());
    }

    @Test
    void columnsCountCharactersNotBytes() throws IOException {
        // valid UTF-8 "note: ±5 µV " (12 characters, 14 bytes) on line 3 after CR LF line ends, then a lone 0xB0
        byte[] head = "id: a\r\nx: 1\r\nnote: \u00b15 \u00b5V ".getBytes(StandardCharsets.UTF_8);
        byte[] bytes = java.util.Arrays.copyOf(head, head.length + 2);
        bytes[head.length] = (byte) 0xB0;
        bytes[head.length + 1] = '\n';
        Path f = Files.write(dir.resolve("mixed.yaml"), bytes);
        Problem p = only(assertThrows(InputException.class, () -> YamlFiles.read(f)));
        assertEquals(3, p.line());
        assertEquals(13, p.column());
    }

    @Test
    void aNulByteIsRefusedAtItsPlace() throws IOException {
        // "title: x" is 8 characters: the NUL is column 9 of line 2
        Path f = Files.write(dir.resolve("nul.yaml"), "id: a\ntitle: x\u0000y\n".getBytes(StandardCharsets.UTF_8));
        Problem p = only(assertThrows(InputException.class, () -> YamlFiles.read(f)));
        assertEquals("control character U+0000 (NUL) is not allowed in YAML", p.message());
        assertEquals(2, p.line());
        assertEquals(9, p.column());
        assertTrue(p.fix().contains("UTF-16"), p.fix());
        // an escape character (0x1B) after a CR LF line end and a BOM (not counted as a column)
        Problem q =
                only(assertThrows(InputException.class, () -> YamlFiles.parse("\uFEFFid: a\r\nb: \u001b[1m\n", null)));
        assertEquals("control character U+001B is not allowed in YAML", q.message());
        assertEquals(2, q.line());
        assertEquals(4, q.column());
    }

    @Test
    void aMissingFileIsAProblemNotAStackTrace() {
        Path f = dir.resolve("gone.yaml");
        Problem p = only(assertThrows(InputException.class, () -> YamlFiles.read(f)));
        assertTrue(p.message().startsWith("cannot read the file (no such file"), p.message());
    }

    @Test
    void aByteOrderMarkIsNotContent() throws Exception {
        Path f = Files.write(dir.resolve("bom.yaml"), "\uFEFFid: amp-1\n".getBytes(StandardCharsets.UTF_8));
        Node.Mapping m = assertInstanceOf(Node.Mapping.class, YamlFiles.read(f));
        assertEquals(new Located(f, 1, 1), m.keyAt().get("id"));
    }

    @Test
    void nullAndEmptyValuesReadAsNull() throws Exception {
        Node.Mapping m = assertInstanceOf(Node.Mapping.class, YamlFiles.parse("a:\nb: ~\nc: null\nd: 'null'\n", null));
        assertNull(((Node.Scalar) m.entries().get("a")).text());
        assertNull(((Node.Scalar) m.entries().get("b")).text());
        assertNull(((Node.Scalar) m.entries().get("c")).text());
        assertEquals("null", ((Node.Scalar) m.entries().get("d")).text());
        assertNull(((Node.Scalar) YamlFiles.parse("", null)).text());
    }
}
