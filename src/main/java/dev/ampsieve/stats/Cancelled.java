package dev.ampsieve.stats;

/**
 * Thrown by a long computation that finds its thread interrupted at one of its checkpoints
 * (between Monte Carlo blocks, between parts of a ranking): the shell interrupts the thread
 * running a command when the user presses Ctrl-C. The interrupt status is left set, so code
 * further up sees it too; whoever started the work clears it.
 *
 * <p>Why the thread's interrupt status and not a token passed down: the computations that need
 * it sit several calls below the commands ({@code BudgetFunction}, {@code BudgetCalculator},
 * the advice), and interrupting also wakes a command blocked in a wait.
 */
public final class Cancelled extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public Cancelled() {
        // no stack trace: this is an expected way out, never a fault
        super("interrupted", null, false, false);
    }

    /** Throws {@link Cancelled} when the current thread has been interrupted; the status stays set. */
    public static void check() {
        if (Thread.currentThread().isInterrupted()) {
            throw new Cancelled();
        }
    }
}
