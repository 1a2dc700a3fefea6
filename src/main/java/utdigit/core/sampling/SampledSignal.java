package utdigit.core.sampling;

/**
 * What the converter digitizes: the RF waveform or its envelope detected before sampling.
 */
public enum SampledSignal {
    /**
     * The RF waveform s(t) = exp(-a t^2) cos(2 pi fc t) is sampled; the read amplitude is the
     * largest sample (as |s| or as the positive peak, see {@link PeakReading}). The classic sine
     * bound 20 log10(cos(pi/n)) applies.
     */
    RF,
    /**
     * The envelope exp(-a t^2) is detected (analogue) before sampling; the read amplitude is the
     * largest envelope sample, at worst exp(-a (dt/2)^2) with the peak midway between two samples.
     * The sine bound does not apply, and there is no peak-reading option.
     */
    ENVELOPE
}
