package dev.ampsieve.advice;

import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.Verdict;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stats.Cancelled;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicInteger;

/** Budgets every part for a stage and ranks the result. Pure: no printing, no files. */
public final class Ranker {
    private Ranker() {}

    /**
     * Fitting candidates first, by effective unit cost (no price last), then by margin, then
     * by id; then the undecided parts (a yield whose interval still holds the target), then the
     * parts that do not fit, each closest (largest margin) first.
     */
    public static final Comparator<Candidate> ORDER = Comparator.comparingInt(Ranker::group)
            .thenComparing((a, b) -> a.fits() ? Double.compare(a.effectiveCost(), b.effectiveCost()) : 0)
            .thenComparing(Comparator.comparingDouble(Candidate::margin).reversed())
            .thenComparing((a, b) -> Double.compare(a.effectiveCost(), b.effectiveCost()))
            .thenComparing(Candidate::id);

    /** 0 fits, 1 undecided, 2 does not fit. */
    static int group(Candidate c) {
        if (c.fits()) {
            return 0;
        }
        return c.verdict() == Verdict.UNDECIDED ? 1 : 2;
    }

    /**
     * Fewer parts than this are budgeted on the calling thread alone: handing work to other
     * threads costs more than it saves for a handful of parts.
     */
    static final int PARALLEL_FROM = 16;

    /** Threads that help the calling thread budget a large catalog: one per further core. */
    private static final int HELPERS = Runtime.getRuntime().availableProcessors() - 1;

    /** @throws Cancelled when the thread is interrupted (checked before each part) */
    public static Ranking rank(Stage stage, List<Part> parts, BudgetFunction budgets) {
        List<Candidate> candidates = new ArrayList<>();
        List<Rejected> rejected = new ArrayList<>();
        for (Budget b : budgetAll(stage, parts, budgets)) {
            if (b.constraintsMet()) {
                candidates.add(Candidate.of(b));
            } else {
                rejected.add(Rejected.of(b));
            }
        }
        candidates.sort(ORDER);
        rejected.sort(Comparator.comparing(Rejected::id));
        Advice advice = Advisor.advise(stage, candidates, rejected, budgets);
        return new Ranking(stage, candidates, rejected, Pareto.front(candidates), advice);
    }

    /**
     * Every part's budget, in the order of {@code parts}, computed on the calling thread and, for
     * a large list, on one helper thread per further core. Each part's Monte Carlo has its own
     * random stream (stage seed and part id), so the budgets are the same whatever the number of
     * threads and whichever thread takes which part; results are stored by index, so the order is
     * too. The calling thread checks for an interrupt before each of its parts and while waiting;
     * on one it stops the helpers (each stops at its next Monte Carlo block) and throws
     * {@link Cancelled}. The first failure of any thread is rethrown on the calling thread.
     */
    static List<Budget> budgetAll(Stage stage, List<Part> parts, BudgetFunction budgets) {
        int n = parts.size();
        Budget[] out = new Budget[n];
        int helpers = HELPERS;
        if (n < PARALLEL_FROM || helpers < 1) {
            for (int i = 0; i < n; i++) {
                Cancelled.check();
                out[i] = budgets.compute(stage, parts.get(i));
            }
            return List.of(out);
        }
        AtomicInteger next = new AtomicInteger();
        AtomicBoolean stop = new AtomicBoolean();
        Runnable share = () -> {
            for (int i = next.getAndIncrement(); i < n && !stop.get(); i = next.getAndIncrement()) {
                out[i] = budgets.compute(stage, parts.get(i));
            }
        };
        List<Future<?>> running = new ArrayList<>();
        try {
            for (int h = 0; h < helpers; h++) {
                running.add(Pool.EXECUTOR.submit(share));
            }
            for (int i = next.getAndIncrement(); i < n && !stop.get(); i = next.getAndIncrement()) {
                Cancelled.check();
                out[i] = budgets.compute(stage, parts.get(i));
            }
            for (Future<?> f : running) {
                f.get(); // also makes the helpers' results visible here
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt(); // the status stays set, as Cancelled promises
            stopAll(stop, running);
            throw new Cancelled();
        } catch (ExecutionException e) {
            stopAll(stop, running);
            Throwable cause = e.getCause();
            if (cause instanceof RuntimeException) {
                throw (RuntimeException) cause;
            }
            if (cause instanceof Error) {
                throw (Error) cause;
            }
            throw new IllegalStateException(cause);
        } catch (RuntimeException | Error e) {
            stopAll(stop, running);
            throw e;
        }
        return List.of(out);
    }

    private static void stopAll(AtomicBoolean stop, List<Future<?>> running) {
        stop.set(true);
        for (Future<?> f : running) {
            f.cancel(true); // interrupts a helper inside a Monte Carlo: it stops at its next block
        }
    }

    /** The helper threads, made on first use: daemons, so they never keep the program running. */
    private static final class Pool {
        static final ExecutorService EXECUTOR = Executors.newFixedThreadPool(Math.max(1, HELPERS), r -> {
            Thread t = new Thread(r, "ampsieve-budget");
            t.setDaemon(true);
            return t;
        });
    }
}
