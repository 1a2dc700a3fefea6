package utdigit.core.sampling;

/**
 * How an instrument reduces the stored sampling rate by an integer factor m. Samples per period,
 * the sampling interval and all timing figures follow the effective rate fs/m in both modes (codes
 * check the digitization rate after compression).
 */
public enum DecimationMode {
    /**
     * Keeps every m-th sample: amplitude losses, the Nyquist frequency and the spectral figures
     * follow the effective rate fs/m.
     */
    DROP,
    /**
     * Keeps the largest |sample| of each group of m (what "compression" of phased-array data
     * usually means): amplitude losses, the Nyquist frequency and the spectral figures follow the
     * raw rate fs, since the kept sample is the largest of all raw samples. Processing of the
     * compressed data (TFM, SAFT, filtering, FFT) still sees fs/m and aliases above fs/(2m).
     */
    PEAK_PRESERVING
}
