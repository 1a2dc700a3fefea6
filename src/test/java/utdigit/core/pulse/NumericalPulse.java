package utdigit.core.pulse;

import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.transform.DftNormalization;
import org.apache.commons.math3.transform.FastFourierTransformer;
import org.apache.commons.math3.transform.TransformType;

/**
 * Brute-force numerical measurements of a sampled pulse, independent of the closed forms under test:
 * the band edges of its spectrum (Apache Commons Math FastFourierTransformer of the finely sampled,
 * zero-padded pulse) and the duration of its envelope (the magnitude of the analytic signal, also by
 * FFT, scanned sample by sample).
 */
final class NumericalPulse {
    private NumericalPulse() {}

    /** Sampling interval of the pulse, us (1000 MHz: 200 samples per period at 5 MHz). */
    static final double SAMPLING_INTERVAL_US = 1e-3;
    /** FFT length: 2^18 points, a frequency bin of 1000/262144 = 0.0038 MHz. */
    static final int FFT_LENGTH = 1 << 18;
    /** The pulse occupies this many samples (+/- 8 us) centred in the record; the rest is zeros. */
    static final int PULSE_HALF_SAMPLES = 8000;

    /** A band {lower, upper} in MHz; lower is NaN when the spectrum does not fall that far above 0 Hz. */
    record Band(double lowerMhz, double upperMhz, double peakMhz) {}

    /** The pulse s(t) sampled at t = (k - N/2) dt, zero outside +/- PULSE_HALF_SAMPLES. */
    static double[] sample(DoubleUnaryOperator pulseOfTimeUs) {
        double[] samples = new double[FFT_LENGTH];
        int centre = FFT_LENGTH / 2;
        for (int k = centre - PULSE_HALF_SAMPLES; k <= centre + PULSE_HALF_SAMPLES; k++) {
            samples[k] = pulseOfTimeUs.applyAsDouble((k - centre) * SAMPLING_INTERVAL_US);
        }
        return samples;
    }

    /** The magnitude spectrum of a sampled pulse, bins 0 .. N/2. */
    static final class Spectrum {
        private final double[] magnitude;
        private final int peak;

        private Spectrum(double[] magnitude) {
            this.magnitude = magnitude;
            int p = 0;
            for (int i = 0; i < magnitude.length; i++) {
                if (magnitude[i] > magnitude[p]) {
                    p = i;
                }
            }
            this.peak = p;
        }

        /**
         * The band where the spectrum stays within {@code levelDb} of its peak: walk from the peak
         * bin outwards to the first bins below the level, interpolating linearly between bins.
         */
        Band band(double levelDb) {
            double threshold = magnitude[peak] * Math.pow(10.0, -Math.abs(levelDb) / 20.0);
            double binMhz = 1.0 / (FFT_LENGTH * SAMPLING_INTERVAL_US);
            double lower = Double.NaN;
            for (int i = peak; i > 0; i--) {
                if (magnitude[i - 1] < threshold) {
                    lower = binMhz * crossing(i - 1, magnitude[i - 1], i, magnitude[i], threshold);
                    break;
                }
            }
            double upper = Double.NaN;
            for (int i = peak; i < magnitude.length - 1; i++) {
                if (magnitude[i + 1] < threshold) {
                    upper = binMhz * crossing(i, magnitude[i], i + 1, magnitude[i + 1], threshold);
                    break;
                }
            }
            return new Band(lower, upper, peak * binMhz);
        }
    }

    /** The magnitude spectrum of the finely sampled, zero-padded pulse (Commons Math FFT). */
    static Spectrum spectrum(DoubleUnaryOperator pulseOfTimeUs) {
        Complex[] transform = new FastFourierTransformer(DftNormalization.STANDARD)
                .transform(sample(pulseOfTimeUs), TransformType.FORWARD);
        double[] magnitude = new double[FFT_LENGTH / 2 + 1];
        for (int i = 0; i < magnitude.length; i++) {
            magnitude[i] = transform[i].abs();
        }
        return new Spectrum(magnitude);
    }

    /**
     * Full duration in us over which the envelope of the sampled pulse stays within {@code levelDb}
     * of its peak. The envelope is |analytic signal|: FFT, negative frequencies zeroed and positive
     * ones doubled, inverse FFT. The scan walks every sample and interpolates the two crossings.
     */
    static double envelopeDurationUs(DoubleUnaryOperator pulseOfTimeUs, double levelDb) {
        FastFourierTransformer fft = new FastFourierTransformer(DftNormalization.STANDARD);
        Complex[] spectrum = fft.transform(sample(pulseOfTimeUs), TransformType.FORWARD);
        int half = FFT_LENGTH / 2;
        for (int i = 1; i < half; i++) {
            spectrum[i] = spectrum[i].multiply(2.0);
        }
        for (int i = half + 1; i < FFT_LENGTH; i++) {
            spectrum[i] = Complex.ZERO;
        }
        Complex[] analytic = fft.transform(spectrum, TransformType.INVERSE);
        double[] envelope = new double[FFT_LENGTH];
        double peakValue = 0;
        for (int k = 0; k < FFT_LENGTH; k++) {
            envelope[k] = analytic[k].abs();
            peakValue = Math.max(peakValue, envelope[k]);
        }
        double threshold = peakValue * Math.pow(10.0, -Math.abs(levelDb) / 20.0);
        int first = -1;
        int last = -1;
        for (int k = 0; k < FFT_LENGTH; k++) {
            if (envelope[k] >= threshold) {
                if (first < 0) {
                    first = k;
                }
                last = k;
            }
        }
        double start = crossing(first - 1, envelope[first - 1], first, envelope[first], threshold);
        double end = crossing(last, envelope[last], last + 1, envelope[last + 1], threshold);
        return (end - start) * SAMPLING_INTERVAL_US;
    }

    /** Index (fractional) where the straight line through (i0, y0) and (i1, y1) reaches y. */
    private static double crossing(int i0, double y0, int i1, double y1, double y) {
        return i0 + (y - y0) / (y1 - y0) * (i1 - i0);
    }
}
