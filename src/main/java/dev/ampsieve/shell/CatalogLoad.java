package dev.ampsieve.shell;

import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.function.Function;
import java.util.function.Supplier;

/**
 * The shell's first read of the catalog, done while the prompt is already up (issue 13: the
 * prompt within half a second; reading and checking a large catalog takes seconds). It ends in
 * the banner's catalog line (the counts, or why the catalog was not loaded), which is shown once:
 * above the prompt when the read ends while the user types, else before the first command's
 * output.
 *
 * <p>While the read runs, its thread is the only one using the root command (picocli writes the
 * root's options again on every line the shell runs, and the read uses them), so every command
 * waits for {@link #await} before it runs. The end is published through a {@link
 * CompletableFuture}: what the reading thread wrote (the root's catalog) is visible to whoever
 * saw the future done.
 */
final class CatalogLoad {
    /** The banner's catalog line; null until {@link #start} (nothing to wait for). */
    private volatile CompletableFuture<String> line;

    private final AtomicBoolean shown = new AtomicBoolean();

    /**
     * Reads now, on this thread ({@code background} false), or in a daemon thread of its own.
     *
     * @param read   reads the catalog and returns the banner's line about it
     * @param failed the line for a read that threw (an Error such as running out of memory)
     */
    void start(Supplier<String> read, Function<Throwable, String> failed, boolean background) {
        CompletableFuture<String> f = new CompletableFuture<>();
        line = f;
        Runnable run = () -> {
            try {
                f.complete(read.get());
            } catch (Throwable e) { // whatever happens, the shell must not wait for ever
                f.complete(failed.apply(e));
            }
        };
        if (!background) {
            run.run();
            return;
        }
        Thread t = new Thread(run, "ampsieve-catalog");
        t.setDaemon(true); // leaving the shell does not wait for it
        t.start();
    }

    /** True when there is nothing to wait for. */
    boolean done() {
        CompletableFuture<String> f = line;
        return f == null || f.isDone();
    }

    /** Runs {@code then} (on the reading thread, or here when already done) once the read has ended. */
    void whenDone(Runnable then) {
        CompletableFuture<String> f = line;
        if (f == null) {
            then.run();
        } else {
            f.whenComplete((l, e) -> then.run());
        }
    }

    /** Waits for the end of the read. */
    void await() throws InterruptedException {
        CompletableFuture<String> f = line;
        if (f == null) {
            return;
        }
        try {
            f.get();
        } catch (ExecutionException e) {
            throw new IllegalStateException("the read completes with its line, never exceptionally", e);
        }
    }

    /** The catalog line the first time it is asked for after the read ended; else null. */
    String takeLine() {
        CompletableFuture<String> f = line;
        if (f == null || !f.isDone() || shown.getAndSet(true)) {
            return null;
        }
        return f.join();
    }
}
