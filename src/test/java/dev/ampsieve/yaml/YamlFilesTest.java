package dev.ampsieve.yaml;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

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
        Problem p = only(assertThrows(InputException.class,
                () -> YamlFiles.parse("id: a\nvos: {max: 5 uV\ngbw: 2 MHz\n", null)));
        assertEquals(3, p.line());
        assertEquals("the '{' opened at line 2, column 6 is not closed; end it with '}' on that line", p.fix());
        Problem q = only(assertThrows(InputException.class,
                () -> YamlFiles.parse("id: a\ntags: [x, y\ngbw: 2 MHz\n", null)));
        assertEquals("the '[' opened at line 2, column 7 is not closed; end it with ']' on that line", q.fix());
    }

    @Test
    void aKeyWrittenTwiceNamesBothLinesAndThePath() {
        Problem p = only(assertThrows(InputException.class,
                () -> YamlFiles.parse("id: a\nvos:\n  max: 1 mV\n  typ: 1 mV\n  max: 2 mV\n", null)));
        assertEquals("vos.max", p.field());
        assertEquals(5, p.line());
        assertEquals(3, p.column());
        assertEquals("key written twice (first on line 3)", p.message());
    }

    /** The classic expansion bomb: nine levels of nine aliases, 9^9 strings if expanded. */
    private static String billionLaughs() {
        StringBuilder sb = new StringBuilder("a: &a [\"lol\",\"lol\",\"lol\",\"lol\",\"lol\",\"lol\",\"lol\",\"lol\",\"lol\"]\n");
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
    void anAliasBombIsRefusedWithAClearMessage() throws IOException {
        Path f = Files.writeString(dir.resolve("bomb.yaml"), billionLaughs());
        Problem p = only(assertThrows(InputException.class, () -> YamlFiles.read(f)));
        assertTrue(p.message().startsWith("refused: more than " + YamlFiles.MAX_ALIASES + " aliases"), p.message());
        assertEquals("write the values out instead of using *aliases", p.fix());
        assertEquals(f, p.file());
    }

    @Test
    void aliasesUnderTheLimitShareNodesInsteadOfExpanding() throws Exception {
        // 24 levels of doubling: 48 aliases, under the limit, 2^24 leaves if expanded
        StringBuilder sb = new StringBuilder("l0: &l0 [x]\n");
        for (int i = 1; i <= 24; i++) {
            sb.append("l").append(i).append(": &l").append(i).append(" [*l").append(i - 1).append(", *l").append(i - 1)
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
        assertEquals("file is " + (YamlFiles.MAX_BYTES + 1) + " bytes, over the limit of " + YamlFiles.MAX_BYTES
                + " bytes (4 MiB) for one YAML file", p.message());
        assertTrue(p.fix().startsWith("split it"), p.fix());
    }

    @Test
    void deepNestingIsRefused() {
        String deep = "a: " + "[".repeat(YamlFiles.MAX_DEPTH + 5) + "]".repeat(YamlFiles.MAX_DEPTH + 5) + "\n";
        Problem p = only(assertThrows(InputException.class, () -> YamlFiles.parse(deep, null)));
        assertTrue(p.message().contains("nested"), p.message());
    }

    @Test
    void textThatIsNotUtf8IsRefused() throws IOException {
        Path f = Files.write(dir.resolve("latin1.yaml"), "title: 25 \u00b0C part\n".getBytes(StandardCharsets.ISO_8859_1));
        Problem p = only(assertThrows(InputException.class, () -> YamlFiles.read(f)));
        assertEquals("file is not valid UTF-8 text", p.message());
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
