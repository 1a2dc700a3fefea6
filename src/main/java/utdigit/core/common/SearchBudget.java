package utdigit.core.common;

/**
 * A bound on the work of one numerical search, and the point where the search sees that its
 * caller has gone. Work is counted in the search's own unit (for the sampled-peak searches: one
 * value of the pulse s(t)); every loop of a search spends from the budget, so no loop can run
 * longer than the budget allows, whatever the inputs. The count, not a clock, decides: the same
 * inputs always give the same answer (answers are stamped and must reproduce).
 *
 * <p>Cancellation stays framework-free: every {@link #CHECK_INTERVAL} units the search looks at
 * the running thread's interrupt flag; the caller (the web layer, on a deadline) interrupts the
 * thread, and the search stops with {@link Cancelled}.
 *
 * <p>Not thread-safe: one budget belongs to one search on one thread.
 */
public final class SearchBudget {
    /** Units of work between two looks at the interrupt flag. */
    public static final long CHECK_INTERVAL = 4096;

    private final long limit;
    private long spent;
    private long nextCheck = CHECK_INTERVAL;

    private SearchBudget(long limit) {
        if (limit <= 0) {
            throw new IllegalArgumentException("limit must be > 0");
        }
        this.limit = limit;
    }

    /** A budget of {@code limit} units of work. */
    public static SearchBudget of(long limit) {
        return new SearchBudget(limit);
    }

    /**
     * Spends {@code units} of work.
     *
     * @throws Exhausted when the budget is used up
     * @throws Cancelled when the running thread has been interrupted
     */
    public void spend(long units) {
        spent += units;
        if (spent > limit) {
            throw new Exhausted(limit);
        }
        if (spent >= nextCheck) {
            nextCheck = spent + CHECK_INTERVAL;
            if (Thread.currentThread().isInterrupted()) {
                throw new Cancelled();
            }
        }
    }

    /** Whether {@code units} more would exceed the budget (nothing is spent). */
    public boolean wouldExceed(double units) {
        return !(spent + units <= limit);
    }

    /** The units spent so far. */
    public long spent() {
        return spent;
    }

    /** The budget's limit. */
    public long limit() {
        return limit;
    }

    /** The search reached its bound; the caller answers that the figure was not determined. */
    public static final class Exhausted extends RuntimeException {
        private final long limit;

        Exhausted(long limit) {
            super("search bound of " + limit + " units reached", null, false, false);
            this.limit = limit;
        }

        /** A search that refuses before starting, because its predicted work exceeds the budget. */
        public static Exhausted predicted(SearchBudget budget) {
            return new Exhausted(budget.limit);
        }

        public long limit() {
            return limit;
        }
    }

    /** The running thread was interrupted: the caller has gone or its deadline passed. */
    public static final class Cancelled extends RuntimeException {
        public Cancelled() {
            super("calculation cancelled", null, false, false);
        }
    }
}
