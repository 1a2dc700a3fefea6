package utdigit.core.acquisition;

/**
 * How a matrix (array) capture with n elements fires and records. Each constant documents its own
 * counts. Firings decide the scan speed (the instrument's PRF is spent on firings); A-scans decide
 * the data volume.
 *
 * <p>Both counts are returned as {@code long}: with the contract's largest element count, 65 536,
 * FMC records n^2 = 4 294 967 296 A-scans per position, more than an {@code int} holds.
 */
public enum CaptureMode {
    /**
     * Full matrix capture: each of the n elements fires once and all n elements receive, so a
     * position takes n firings and records n^2 A-scans (every transmitter-receiver pair, both
     * orders). Common practice, no published source.
     */
    FMC {
        @Override
        public long firings(int elementCount) {
            return elementCount;
        }

        @Override
        public long aScans(int elementCount) {
            return (long) elementCount * elementCount;
        }
    },
    /**
     * Half matrix capture: each of the n elements fires once, and by reciprocity (the pair i->j
     * records the same signal as j->i) only the pairs with receiver index >= transmitter index are
     * kept, the n pulse-echo pairs included: n firings and n(n+1)/2 A-scans per position. Common
     * practice, no published source.
     */
    HMC {
        @Override
        public long firings(int elementCount) {
            return elementCount;
        }

        @Override
        public long aScans(int elementCount) {
            return (long) elementCount * (elementCount + 1L) / 2L;
        }
    };

    /** Firings per scan position for {@code elementCount} elements (>= 1). */
    public abstract long firings(int elementCount);

    /** A-scans recorded per scan position for {@code elementCount} elements (>= 1). */
    public abstract long aScans(int elementCount);
}
