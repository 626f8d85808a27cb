package dev.ampsieve.shell;

import dev.ampsieve.cli.RootCommand;
import dev.ampsieve.report.OutputStyle;
import java.io.PrintWriter;
import org.jline.reader.LineReader;

/** What the shell's own commands share: the state, the line reader, the output and its look. */
final class ShellContext {
    final RootCommand root;
    final ShellState state = new ShellState();
    final LineReader reader;
    final PrintWriter out;
    OutputStyle style;
    Paint paint;
    /** The stage key being asked, so completion offers its words and units; null at the command prompt. */
    volatile String question;
    boolean quit;
    /** Set after one warning about an unsaved stage, so a second quit leaves. */
    boolean warnedUnsaved;

    ShellContext(RootCommand root, LineReader reader, PrintWriter out, OutputStyle style) {
        this.root = root;
        this.reader = reader;
        this.out = out;
        this.style = style;
        this.paint = new Paint(style.color());
    }
}
