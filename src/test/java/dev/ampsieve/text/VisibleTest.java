package dev.ampsieve.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import org.junit.jupiter.api.Test;

/**
 * Expected strings are written by hand from the escape table in {@link Visible}'s Javadoc; the
 * code points from the Unicode code charts (C0 Controls and Basic Latin, C1 Controls and
 * Latin-1 Supplement, General Punctuation) [from memory]. Inputs are built with
 * {@code (char) 0x..} so no raw control character sits in this source file.
 */
class VisibleTest {

    private static final String ESC = String.valueOf((char) 0x1b);
    private static final String BEL = String.valueOf((char) 0x07);

    @Test
    void engineeringTextIsUnchanged() {
        String s = "Low-noise JFET, 4.5 nV/√Hz, 0.1 µV/°C, 10 kΩ ± 0.1 %, ≤ 85 °C … path\\to\\file “quoted”";
        assertEquals(s, Visible.of(s));
        assertEquals("", Visible.of(""));
        assertNull(Visible.of(null));
    }

    @Test
    void tabLineFeedCarriageReturnGetTheirCEscapes() {
        assertEquals("a\\tb\\nc\\rd", Visible.of("a\tb\nc\rd"));
    }

    @Test
    void c0ControlsBecomeTwoHexDigits() {
        assertEquals(
                "\\x00\\x01\\x07\\x08\\x0b\\x0c\\x1b\\x1f",
                Visible.of("" + (char) 0 + (char) 1 + (char) 7 + (char) 8 + (char) 11 + (char) 12 + (char) 0x1b
                        + (char) 0x1f));
    }

    @Test
    void deleteAndC1Controls() {
        assertEquals(
                "\\x7f\\x80\\x85\\x9b\\x9d\\x9f",
                Visible.of("" + (char) 0x7f + (char) 0x80 + (char) 0x85 + (char) 0x9b + (char) 0x9d + (char) 0x9f));
        // the first printable characters either side of C1 stay: '~' U+007E and NBSP U+00A0
        assertEquals("~" + (char) 0xa0, Visible.of("~" + (char) 0xa0));
    }

    @Test
    void escapeSequencesLoseTheirEscape() {
        // OSC 0 window title ended by BEL; erase display (CSI 2 J); OSC 52 clipboard; OSC 8 link ended by ST
        assertEquals("\\x1b]0;owned\\x07", Visible.of(ESC + "]0;owned" + BEL));
        assertEquals("\\x1b[2J", Visible.of(ESC + "[2J"));
        assertEquals("\\x1b]52;c;ZWNobw==\\x07", Visible.of(ESC + "]52;c;ZWNobw==" + BEL));
        assertEquals("\\x1b]8;;http://x\\x1b\\", Visible.of(ESC + "]8;;http://x" + ESC + "\\"));
    }

    @Test
    void bidiControlsBecomeFourHexDigits() {
        StringBuilder in = new StringBuilder();
        for (int c : new int[] {
            0x202a, 0x202b, 0x202c, 0x202d, 0x202e, 0x2066, 0x2067, 0x2068, 0x2069, 0x200e, 0x200f, 0x061c, 0x2028,
            0x2029
        }) {
            in.append((char) c);
        }
        assertEquals(
                "\\u202a\\u202b\\u202c\\u202d\\u202e\\u2066\\u2067\\u2068\\u2069\\u200e\\u200f\\u061c\\u2028\\u2029",
                Visible.of(in.toString()));
        // "abc" RLO "fdp.exe": shown in stored order, the override visible
        assertEquals("abc\\u202efdp.exe", Visible.of("abc" + (char) 0x202e + "fdp.exe"));
        // the neighbours U+2029 < x < U+202A and U+2065, U+206A are not bidi controls
        assertEquals(
                "" + (char) 0x2030 + (char) 0x2065 + (char) 0x206a,
                Visible.of("" + (char) 0x2030 + (char) 0x2065 + (char) 0x206a));
    }

    @Test
    void astralCharactersSurviveWhole() {
        String clef = new String(Character.toChars(0x1d11e));
        assertEquals(clef + "\\x1b", Visible.of(clef + ESC));
    }

    @Test
    void idempotent() {
        String once = Visible.of(ESC + "[31mred" + BEL + "\n" + (char) 0x202e);
        assertEquals("\\x1b[31mred\\x07\\n\\u202e", once);
        assertEquals(once, Visible.of(once));
    }

    @Test
    void linesKeepTheirLineFeedsOnly() {
        assertEquals("one\\x1b\ntwo\\r\n", Visible.lines("one" + ESC + "\ntwo\r\n"));
    }

    @Test
    void isControlMatchesWhatOfRewrites() {
        assertEquals(true, Visible.isControl(0x1b));
        assertEquals(true, Visible.isControl('\n'));
        assertEquals(false, Visible.isControl('µ'));
        assertEquals(false, Visible.isControl(' '));
    }
}
