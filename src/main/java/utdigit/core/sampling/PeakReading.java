package utdigit.core.sampling;

/**
 * How the amplitude of a sampled RF echo is read from its samples (only with
 * {@link SampledSignal#RF}).
 */
public enum PeakReading {
    /**
     * The largest |sample|, as on a full-wave rectified display: read = max_k |s(k dt + phi)|.
     */
    ABSOLUTE,
    /**
     * The largest positive sample, as on a positive half-wave display: read = max_k s(k dt + phi).
     */
    POSITIVE_PEAK
}
