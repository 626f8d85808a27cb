package dev.ampsieve.shell;

import static java.nio.charset.StandardCharsets.UTF_8;

import dev.ampsieve.commands.RootCommand;
import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.InterruptedIOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.jline.terminal.Attributes;
import org.jline.terminal.Terminal;
import org.jline.terminal.impl.DumbTerminal;

/** Runs a scripted shell session on JLine's dumb terminal, in-process, and returns what it printed. */
final class Sessions {
    private Sessions() {}

    /** Lines typed, each ended by Enter; the session ends at the end of the input (as Ctrl-D). */
    static String run(List<String> rootArgs, Path history, Map<String, String> env, String... lines) {
        return session(rootArgs, history, env, List.of(), lines).printed();
    }

    /** What a session printed and each line's exit code, in order. */
    record Ran(String printed, List<Integer> codes) {}

    /** As {@link #run}, with commands added to the shell's tree, and the exit code of each line. */
    static Ran withCodes(List<String> rootArgs, List<Object> extraCommands, String... lines) {
        return session(rootArgs, null, Map.of(), extraCommands, lines);
    }

    private static Ran session(
            List<String> rootArgs, Path history, Map<String, String> env, List<Object> extra, String... lines) {
        StringBuilder typed = new StringBuilder();
        for (String l : lines) {
            typed.append(l);
            if (!l.endsWith("\u0003")) {
                typed.append('\n'); // Ctrl-C needs no Enter
            }
        }
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try (Terminal t = terminal(new Typed(typed.toString().getBytes(UTF_8)), out)) {
            // the catalog read before the banner, as a script's keys arrive at once: the lines come out in one order
            Shell shell = new Shell(new RootCommand(), rootArgs, t, history, env).catalogRead(false, () -> {});
            extra.forEach(shell::withCommand);
            shell.run();
            return new Ran(out.toString(UTF_8), shell.exitCodes());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** JLine's dumb terminal on the given keys, set up as a tty is. */
    static Terminal terminal(InputStream keys, java.io.OutputStream out) throws IOException {
        Terminal t = new DumbTerminal("test", "dumb", keys, out, UTF_8);
        // as a tty's line discipline does: Ctrl-C raises SIGINT (the dumb terminal has this off by default).
        // The other signal characters get their usual keys too: left unset (-1) they would match end of input.
        Attributes tty = t.getAttributes();
        tty.setLocalFlag(Attributes.LocalFlag.ISIG, true);
        tty.setControlChar(Attributes.ControlChar.VINTR, 3);
        tty.setControlChar(Attributes.ControlChar.VQUIT, 28);
        tty.setControlChar(Attributes.ControlChar.VSUSP, 26);
        tty.setControlChar(Attributes.ControlChar.VSTATUS, 20);
        tty.setControlChar(Attributes.ControlChar.VEOF, 4); // Ctrl-D: the line reader binds it to end of input
        t.setAttributes(tty);
        return t;
    }

    /**
     * Keys as a terminal delivers them. Like a read from a tty that a signal interrupts, a read
     * on an interrupted thread fails with InterruptedIOException: the dumb terminal turns Ctrl-C
     * into SIGINT, the line reader's handler interrupts its thread, and the next read reports it.
     */
    static final class Typed extends InputStream {
        private final ByteArrayInputStream keys;

        Typed(byte[] bytes) {
            keys = new ByteArrayInputStream(bytes);
        }

        @Override
        public int read() throws IOException {
            if (Thread.interrupted()) {
                throw new InterruptedIOException("Ctrl-C");
            }
            return keys.read();
        }

        @Override
        public int read(byte[] b, int off, int len) throws IOException {
            if (len == 0) {
                return 0;
            }
            int c = read();
            if (c < 0) {
                return -1;
            }
            b[off] = (byte) c;
            return 1;
        }
    }

    static String run(String... lines) {
        return run(List.of(), null, Map.of(), lines);
    }

    /** A printed line without the prompts in front of it (the shell's, then any question's). */
    static String withoutPrompts(String line) {
        return line.replaceFirst("^(ampsieve( \\[[^\\]]*\\])?> |\\s+[\\w.-]+ \\[[^\\]]*\\] > )+", "");
    }
}
