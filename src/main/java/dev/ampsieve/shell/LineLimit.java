package dev.ampsieve.shell;

import java.time.Instant;
import java.util.Locale;
import java.util.Map;
import org.jline.keymap.KeyMap;
import org.jline.reader.Binding;
import org.jline.reader.Buffer;
import org.jline.reader.LineReader;
import org.jline.reader.Reference;
import org.jline.reader.UserInterruptException;
import org.jline.reader.Widget;
import org.jline.reader.impl.history.DefaultHistory;

/**
 * Refuses input lines longer than {@link #MAX} characters, cheaply. The line editor redraws and
 * re-highlights the whole line after every key, so a pasted megabyte costs time in the square of
 * its length (about 18 s of CPU for 20 000 characters, hours for 1 MB). Once a line passes the
 * limit its text is dropped, only a short head stays on screen, and every further key is
 * discarded through a key map of its own until Enter; Enter then ends the read as Ctrl-C does
 * (nothing runs, an {@code ask} stops) and {@link #takeRefusal()} has the one line to print.
 * {@link History} keeps such lines out of the history file whatever path they take.
 */
final class LineLimit {
    /** The longest line the shell takes, in characters (README "The shell"). */
    static final int MAX = 4096;

    private static final String KEYMAP = "ampsieve-overlong";
    private static final String DROP = "ampsieve-drop-key";
    private static final String REFUSE = "ampsieve-refuse-line";
    /** Characters of a refused line left on screen, so the user sees which line it was. */
    private static final int HEAD = 40;

    private final LineReader reader;
    /** Length of the line being discarded; 0 while the line is within the limit. */
    private long length;

    private String refusal;

    private LineLimit(LineReader reader) {
        this.reader = reader;
    }

    /** Guards {@code reader}: wraps the widgets that insert text and adds the discarding key map. */
    static LineLimit install(LineReader reader) {
        LineLimit limit = new LineLimit(reader);
        Map<String, Widget> widgets = reader.getWidgets();
        Widget insert = widgets.get(LineReader.SELF_INSERT);
        widgets.put(LineReader.SELF_INSERT, () -> insert.apply() && limit.afterInsert());
        Widget paste = widgets.get(LineReader.BEGIN_PASTE);
        if (paste != null) {
            widgets.put(LineReader.BEGIN_PASTE, () -> paste.apply() && limit.afterInsert());
        }
        Widget init = widgets.get(LineReader.CALLBACK_INIT);
        widgets.put(LineReader.CALLBACK_INIT, () -> {
            limit.length = 0; // each read starts within the limit, in the usual key map
            return init == null || init.apply();
        });
        widgets.put(DROP, limit::drop);
        widgets.put(REFUSE, limit::refuse);

        KeyMap<Binding> discard = new KeyMap<>();
        Reference drop = new Reference(DROP);
        for (char c = 0; c < KeyMap.KEYMAP_LENGTH; c++) {
            discard.bind(c == '\r' || c == '\n' ? new Reference(REFUSE) : drop, String.valueOf(c));
        }
        discard.setUnicode(drop);
        discard.setNomatch(drop);
        reader.getKeyMaps().put(KEYMAP, discard);
        return limit;
    }

    /** The line to print for the last refused line, once; null when none was refused since. */
    String takeRefusal() {
        String r = refusal;
        refusal = null;
        return r;
    }

    /** The one line that says a line was refused. */
    static String refusal(long length) {
        return String.format(
                Locale.ROOT,
                "Refused a line of %d characters: the shell takes lines of at most %d characters; "
                        + "nothing was run or kept in the history.",
                length,
                MAX);
    }

    private boolean afterInsert() {
        Buffer buf = reader.getBuffer();
        if (buf.length() <= MAX) {
            return true;
        }
        length = buf.length();
        // a short head keeps the redraw after each further key cheap; never empty, or a Ctrl-D
        // among the discarded keys would read as end of input
        String head = buf.substring(0, HEAD);
        buf.clear();
        buf.write(head + "…");
        reader.setKeyMap(KEYMAP);
        return true;
    }

    private boolean drop() {
        length += reader.getLastBinding() == null ? 1 : reader.getLastBinding().length();
        return true;
    }

    private boolean refuse() {
        refusal = refusal(length);
        length = 0;
        reader.getBuffer().clear();
        throw new UserInterruptException("");
    }

    /** The history, without lines over the limit (however they reached the end of a read). */
    static final class History extends DefaultHistory {
        @Override
        public void add(Instant time, String line) {
            if (line.length() <= MAX) {
                super.add(time, line);
            }
        }
    }
}
