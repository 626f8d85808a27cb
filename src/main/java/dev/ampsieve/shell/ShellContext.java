package dev.ampsieve.shell;

import dev.ampsieve.commands.RootCommand;
import dev.ampsieve.report.OutputStyle;
import dev.ampsieve.report.Wrap;
import java.io.PrintWriter;
import java.util.function.UnaryOperator;
import org.jline.reader.LineReader;

/** What the shell's own commands share: the state, the line reader, the output and its look. */
final class ShellContext {
    final RootCommand root;
    final ShellState state = new ShellState();
    /** The shell's first read of the catalog; every use of the catalog waits for it (see {@link CatalogLoad}). */
    final CatalogLoad load = new CatalogLoad();

    final LineReader reader;
    final PrintWriter out;
    OutputStyle style;
    Paint paint;
    /** The stage key being asked, so completion offers its words and units; null at the command prompt. */
    volatile String question;

    boolean quit;
    /** Set after one warning about an unsaved stage, so a second quit leaves. */
    boolean warnedUnsaved;
    /** The guard against over-long lines on {@link #reader}; null without a reader. */
    LineLimit lineLimit;

    ShellContext(RootCommand root, LineReader reader, PrintWriter out, OutputStyle style) {
        this.root = root;
        this.reader = reader;
        this.out = out;
        this.style = style;
        this.paint = new Paint(style.color());
    }

    /** Text folded at word boundaries to the terminal's width, so the terminal never breaks a word. */
    String fold(String text) {
        return Wrap.prose(text, style.width());
    }

    /** Folded, then each line painted on its own (an escape sequence never spans a line break). */
    String fold(String text, UnaryOperator<String> how) {
        return java.util.Arrays.stream(fold(text).split("\n", -1))
                .map(how)
                .collect(java.util.stream.Collectors.joining("\n"));
    }

    /** Folded, then each phrase made bold where it still stands whole on one line. */
    String foldBold(String text, String... phrases) {
        String folded = fold(text);
        if (!paint.on()) {
            return folded;
        }
        int from = 0;
        StringBuilder sb = new StringBuilder();
        for (String p : phrases) {
            int at = folded.indexOf(p, from);
            if (at < 0) {
                continue;
            }
            sb.append(folded, from, at).append(paint.bold(p));
            from = at + p.length();
        }
        return sb.append(folded.substring(from)).toString();
    }
}
