package dev.ampsieve.testing;

import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.net.StandardProtocolFamily;
import java.net.UnixDomainSocketAddress;
import java.nio.channels.ServerSocketChannel;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Assumptions;

/**
 * Real special files for tests of what the program refuses to read: named pipes, sockets and
 * the character device {@code /dev/zero}. Where the platform lacks one, the test is skipped with
 * a message, except under {@code CI=true}, where that is a failure (CI runs on Linux, which has
 * all of them).
 */
public final class SpecialFiles {
    private SpecialFiles() {}

    /** Generous: a refusal takes milliseconds; the old code read for ever or waited for a writer. */
    public static final Duration HANG_GUARD = Duration.ofSeconds(20);

    /** Makes a named pipe with mkfifo(1). Nothing ever writes to it: opening it to read would wait for ever. */
    public static Path fifo(Path at) throws IOException, InterruptedException {
        Process p;
        try {
            p = new ProcessBuilder("mkfifo", at.toString())
                    .redirectErrorStream(true)
                    .start();
        } catch (IOException e) {
            missing("mkfifo cannot be run (" + e.getMessage() + ")");
            return at;
        }
        if (!p.waitFor(10, TimeUnit.SECONDS) || p.exitValue() != 0 || !Files.exists(at)) {
            missing("mkfifo did not make " + at);
        }
        return at;
    }

    /** Binds a Unix-domain socket at {@code at}; close the channel when done (the socket file stays). */
    public static ServerSocketChannel socket(Path at) throws IOException {
        try {
            ServerSocketChannel ch = ServerSocketChannel.open(StandardProtocolFamily.UNIX);
            ch.bind(UnixDomainSocketAddress.of(at));
            return ch;
        } catch (UnsupportedOperationException e) {
            missing("no Unix-domain sockets here");
            return null;
        }
    }

    /** {@code /dev/zero}: endless zero bytes, reported size 0. */
    public static Path devZero() {
        Path zero = Path.of("/dev/zero");
        if (!Files.exists(zero)) {
            missing("no /dev/zero here");
        }
        return zero;
    }

    private static void missing(String what) {
        if ("true".equalsIgnoreCase(System.getenv("CI"))) {
            fail(what + "; CI=true requires it");
        }
        Assumptions.abort(what + ": test skipped");
    }
}
