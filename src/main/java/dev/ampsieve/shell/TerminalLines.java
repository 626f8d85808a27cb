package dev.ampsieve.shell;

import java.io.IOException;
import java.io.Writer;
import java.util.function.UnaryOperator;

/**
 * Passes text to the terminal a line at a time through the shell's presentation: the guard
 * against control characters, µ and ° in ASCII on terminals that cannot show them, error lines
 * folded and coloured. A partial line (no newline yet) goes out on flush.
 */
final class TerminalLines extends Writer {
    private final Writer target;
    private final UnaryOperator<String> filter;
    private final StringBuilder line = new StringBuilder();

    TerminalLines(Writer target, UnaryOperator<String> filter) {
        this.target = target;
        this.filter = filter;
    }

    @Override
    public void write(char[] cbuf, int off, int len) throws IOException {
        for (int i = off; i < off + len; i++) {
            char c = cbuf[i];
            if (c == '\n') {
                target.write(filter.apply(line.toString()));
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
            target.write(filter.apply(line.toString()));
            line.setLength(0);
        }
        target.flush();
    }

    @Override
    public void close() throws IOException {
        flush();
    }
}
