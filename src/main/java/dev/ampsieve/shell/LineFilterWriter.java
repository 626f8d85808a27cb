package dev.ampsieve.shell;

import java.io.IOException;
import java.io.Writer;
import java.util.function.UnaryOperator;

/**
 * Passes text on line by line through a function: hides the shell's temporary stage file
 * behind "(current stage)", spells µ and ° in ASCII on terminals that cannot show them,
 * colours error lines. A partial line (no newline yet) goes out, filtered, on flush.
 */
final class LineFilterWriter extends Writer {
    private final Writer target;
    private final UnaryOperator<String> filter;
    private final StringBuilder line = new StringBuilder();

    LineFilterWriter(Writer target, UnaryOperator<String> filter) {
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
