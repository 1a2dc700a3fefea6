package utdigit.core.waveform;

import java.util.Objects;
import utdigit.core.common.CalculationException;
import utdigit.core.common.Checks;
import utdigit.core.pulse.CentreFrequencyConvention;
import utdigit.core.sampling.DecimationMode;
import utdigit.core.sampling.PeakReading;

/**
 * The inputs of a waveform analysis (POST /api/waveform-analyses): a recorded pulse and, optionally,
 * a target digitizer setting to judge on it. Optional values are nullable (null: not given; the
 * analyzer applies the defaults). Each value is checked on its own here; combinations by
 * {@link WaveformAnalyzer}.
 *
 * @param samples the recorded amplitudes (any unit, equally spaced in time), {@link #MIN_SAMPLES} to
 *     {@link #MAX_SAMPLES} finite values, not all equal
 * @param recordSamplingFrequencyMhz the rate the record was sampled at, MHz, > 0
 * @param centreFrequencyConvention how the centre is taken from the -6 dB edges, or null (ARITHMETIC)
 * @param samplingFrequencyMhz the target (raw) sampling frequency to judge, MHz, > 0, or null
 * @param decimationFactor the target's decimation factor (only with a target), or null (1)
 * @param decimationMode the target's decimation mode (only with a target), or null (DROP)
 * @param peakReading how the target's peak is read (only with a target), or null (ABSOLUTE)
 * @param amplitudeToleranceDb the tolerance for the required rate (only with a target), dB, or null
 */
public record WaveformInput(
        double[] samples,
        double recordSamplingFrequencyMhz,
        CentreFrequencyConvention centreFrequencyConvention,
        Double samplingFrequencyMhz,
        Integer decimationFactor,
        DecimationMode decimationMode,
        PeakReading peakReading,
        Double amplitudeToleranceDb) {

    /** Fewest samples of a record: a pulse and its spectrum need some. */
    public static final int MIN_SAMPLES = 16;
    /** Most samples of a record: bounds the work of the reconstruction (32 times as many points). */
    public static final int MAX_SAMPLES = 8192;

    public WaveformInput {
        Objects.requireNonNull(samples, "samples");
        if (samples.length < MIN_SAMPLES || samples.length > MAX_SAMPLES) {
            throw CalculationException.invalid("samples", samples.length,
                    "must hold " + MIN_SAMPLES + " to " + MAX_SAMPLES + " samples");
        }
        for (double v : samples) {
            Checks.finite("samples", v);
        }
        samples = samples.clone();
        Checks.positive("record_sampling_frequency_mhz", recordSamplingFrequencyMhz);
        if (samplingFrequencyMhz != null) {
            Checks.positive("sampling_frequency_mhz", samplingFrequencyMhz);
        }
        if (decimationFactor != null) {
            Checks.atLeastOne("decimation_factor", decimationFactor);
        }
        if (amplitudeToleranceDb != null) {
            Checks.positive("amplitude_tolerance_db", amplitudeToleranceDb);
        }
    }

    /** A record alone, every option at its default, no target. */
    public static WaveformInput of(double[] samples, double recordSamplingFrequencyMhz) {
        return builder(samples, recordSamplingFrequencyMhz).build();
    }

    /** A builder with the two required inputs; every other input starts as "not given". */
    public static Builder builder(double[] samples, double recordSamplingFrequencyMhz) {
        return new Builder(samples, recordSamplingFrequencyMhz);
    }

    /** Collects the optional inputs; null leaves an input "not given". Not thread-safe. */
    public static final class Builder {
        private final double[] samples;
        private final double recordSamplingFrequencyMhz;
        private CentreFrequencyConvention centreFrequencyConvention;
        private Double samplingFrequencyMhz;
        private Integer decimationFactor;
        private DecimationMode decimationMode;
        private PeakReading peakReading;
        private Double amplitudeToleranceDb;

        private Builder(double[] samples, double recordSamplingFrequencyMhz) {
            this.samples = samples;
            this.recordSamplingFrequencyMhz = recordSamplingFrequencyMhz;
        }

        public Builder centreFrequencyConvention(CentreFrequencyConvention value) {
            this.centreFrequencyConvention = value;
            return this;
        }

        public Builder samplingFrequencyMhz(Double value) {
            this.samplingFrequencyMhz = value;
            return this;
        }

        public Builder decimationFactor(Integer value) {
            this.decimationFactor = value;
            return this;
        }

        public Builder decimationMode(DecimationMode value) {
            this.decimationMode = value;
            return this;
        }

        public Builder peakReading(PeakReading value) {
            this.peakReading = value;
            return this;
        }

        public Builder amplitudeToleranceDb(Double value) {
            this.amplitudeToleranceDb = value;
            return this;
        }

        public WaveformInput build() {
            return new WaveformInput(samples, recordSamplingFrequencyMhz, centreFrequencyConvention,
                    samplingFrequencyMhz, decimationFactor, decimationMode, peakReading, amplitudeToleranceDb);
        }
    }

    /** A copy of the samples. */
    @Override
    public double[] samples() {
        return samples.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof WaveformInput w && java.util.Arrays.equals(samples, w.samples)
                && Double.compare(recordSamplingFrequencyMhz, w.recordSamplingFrequencyMhz) == 0
                && centreFrequencyConvention == w.centreFrequencyConvention
                && Objects.equals(samplingFrequencyMhz, w.samplingFrequencyMhz)
                && Objects.equals(decimationFactor, w.decimationFactor) && decimationMode == w.decimationMode
                && peakReading == w.peakReading && Objects.equals(amplitudeToleranceDb, w.amplitudeToleranceDb);
    }

    @Override
    public int hashCode() {
        return Objects.hash(java.util.Arrays.hashCode(samples), recordSamplingFrequencyMhz, centreFrequencyConvention,
                samplingFrequencyMhz, decimationFactor, decimationMode, peakReading, amplitudeToleranceDb);
    }

    @Override
    public String toString() {
        return "WaveformInput[" + samples.length + " samples at " + recordSamplingFrequencyMhz + " MHz]";
    }
}
