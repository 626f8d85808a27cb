package dev.ampsieve.commands;

import dev.ampsieve.text.Visible;
import java.io.IOException;
import java.io.Writer;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The last guard before stdout and stderr: every control character is made {@link Visible}
 * except the line feed and the few SGR colour sequences the program writes itself
 * ({@code report.Ansi}, {@code shell.Paint}). Each string from data is already made visible
 * where it is printed; this catches one that a future change forgets (the shell applies
 * {@link #guard} to each line it prints). Works a line at a time,
 * so a colour sequence is never split; a partial line goes out on flush.
 */
public final class VisibleWriter extends Writer {

    /** Our own colours: reset, bold, dim, red, green, yellow, cyan (ECMA-48 SGR 0, 1, 2, 31, 32, 33, 36). */
    static final Pattern OUR_SGR = Pattern.compile("\u001b\\[(?:0|1|2|31|32|33|36)m");

    private final Writer target;
    private final StringBuilder line = new StringBuilder();

    VisibleWriter(Writer target) {
        this.target = target;
    }

    /** The guard in front of {@code target}. */
    public static VisibleWriter over(Writer target) {
        return new VisibleWriter(target);
    }

    /** One line (without its line feed) as it may reach a terminal; the shell passes its lines through it too. */
    public static String guard(String s) {
        Matcher m = OUR_SGR.matcher(s);
        StringBuilder out = new StringBuilder(s.length());
        int at = 0;
        while (m.find()) {
            out.append(Visible.of(s.substring(at, m.start()))).append(m.group());
            at = m.end();
        }
        return out.append(Visible.of(s.substring(at))).toString();
    }

    @Override
    public void write(char[] cbuf, int off, int len) throws IOException {
        for (int i = off; i < off + len; i++) {
            char c = cbuf[i];
            if (c == '\n') {
                target.write(guard(line.toString()));
                target.write('\n');
                line.setLength(0);
            } else {
                line.append(c);
            }
        }
    }

    @Override
    public void flush() throws IOException {
        if (line.length() > 0) {
            target.write(guard(line.toString()));
            line.setLength(0);
        }
        target.flush();
    }

    @Override
    public void close() throws IOException {
        flush();
        target.close();
    }
}
