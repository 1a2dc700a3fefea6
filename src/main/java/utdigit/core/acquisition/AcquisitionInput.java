package utdigit.core.acquisition;

/**
 * Inputs of an acquisition budget (POST /api/acquisition-budgets), normalised to the contract's
 * units: frequencies in MHz (sampling) and Hz (PRF), times in us, lengths in mm, velocities in m/s,
 * sizes in megabytes of 10^6 bytes. Inch inputs and material velocities are converted by the caller
 * (the web layer) before this record is built. Optional inputs and options are boxed: {@code null}
 * means "not given"; the defaults of the contract are applied by {@link AcquisitionCalculator}.
 *
 * @param samplingFrequencyMhz the converter's raw rate fs, MHz (required)
 * @param decimationFactor integer m >= 1 dividing fs for storage; null: 1
 * @param bitDepth bits per sample, 1 to 32 (required)
 * @param gateLengthUs recorded gate length, us; give this or {@code gateLengthMm}
 * @param gateLengthMm recorded gate as a pulse-echo sound path in the part, mm (time 2L/v); needs
 *     {@code velocityMPerS}
 * @param velocityMPerS velocity in the part, m/s, for {@code gateLengthMm} and {@code maxSoundPathMm};
 *     not applicable without one of them
 * @param focalLaws phased array: focal laws per position summed over all groups (one firing and one
 *     A-scan each); null: 1; not applicable with {@code fmcElementCount}
 * @param fmcElementCount matrix capture: number of elements n (FMC or HMC)
 * @param capture FMC or HMC; null with an element count: FMC; not applicable without one
 * @param averaging firings averaged into one recorded A-scan; null: 1
 * @param scanIncrementMm distance between recorded positions, mm (required)
 * @param scanLengthMm scan length, mm, for the file size; optional
 * @param pulseRepetitionFrequencyHz the instrument's firing rate (all firings), Hz (required)
 * @param plannedScanSpeedMmPerS planned scan speed, mm/s; optional
 * @param maxRoundTripUs longest round trip of a firing, summed over all media, us; optional, give this
 *     or {@code maxSoundPathMm}
 * @param maxSoundPathMm longest one-way sound path in the part, mm (round trip 2L/v); optional
 * @param wraparoundDecayFactor factor q >= 1 on the round trip for reverberation; null: 1; only with a
 *     round trip
 * @param fileSizeLimitMegabytes largest file the caller wants, MB (10^6 bytes); optional
 */
public record AcquisitionInput(
        double samplingFrequencyMhz,
        Integer decimationFactor,
        int bitDepth,
        Double gateLengthUs,
        Double gateLengthMm,
        Double velocityMPerS,
        Integer focalLaws,
        Integer fmcElementCount,
        CaptureMode capture,
        Integer averaging,
        double scanIncrementMm,
        Double scanLengthMm,
        double pulseRepetitionFrequencyHz,
        Double plannedScanSpeedMmPerS,
        Double maxRoundTripUs,
        Double maxSoundPathMm,
        Double wraparoundDecayFactor,
        Double fileSizeLimitMegabytes) {

    /**
     * A builder holding the four required scalar inputs; the gate (required, one of two forms) and
     * every optional input are set on it.
     */
    public static Builder builder(
            double samplingFrequencyMhz, int bitDepth, double scanIncrementMm, double pulseRepetitionFrequencyHz) {
        return new Builder(samplingFrequencyMhz, bitDepth, scanIncrementMm, pulseRepetitionFrequencyHz);
    }

    /** A mutable builder; {@link #build()} returns the immutable record. Not thread-safe. */
    public static final class Builder {
        private final double samplingFrequencyMhz;
        private final int bitDepth;
        private final double scanIncrementMm;
        private final double pulseRepetitionFrequencyHz;
        private Integer decimationFactor;
        private Double gateLengthUs;
        private Double gateLengthMm;
        private Double velocityMPerS;
        private Integer focalLaws;
        private Integer fmcElementCount;
        private CaptureMode capture;
        private Integer averaging;
        private Double scanLengthMm;
        private Double plannedScanSpeedMmPerS;
        private Double maxRoundTripUs;
        private Double maxSoundPathMm;
        private Double wraparoundDecayFactor;
        private Double fileSizeLimitMegabytes;

        private Builder(double samplingFrequencyMhz, int bitDepth, double scanIncrementMm, double prfHz) {
            this.samplingFrequencyMhz = samplingFrequencyMhz;
            this.bitDepth = bitDepth;
            this.scanIncrementMm = scanIncrementMm;
            this.pulseRepetitionFrequencyHz = prfHz;
        }

        public Builder decimationFactor(Integer value) {
            this.decimationFactor = value;
            return this;
        }

        public Builder gateLengthUs(Double value) {
            this.gateLengthUs = value;
            return this;
        }

        public Builder gateLengthMm(Double value) {
            this.gateLengthMm = value;
            return this;
        }

        public Builder velocityMPerS(Double value) {
            this.velocityMPerS = value;
            return this;
        }

        public Builder focalLaws(Integer value) {
            this.focalLaws = value;
            return this;
        }

        public Builder fmcElementCount(Integer value) {
            this.fmcElementCount = value;
            return this;
        }

        public Builder capture(CaptureMode value) {
            this.capture = value;
            return this;
        }

        public Builder averaging(Integer value) {
            this.averaging = value;
            return this;
        }

        public Builder scanLengthMm(Double value) {
            this.scanLengthMm = value;
            return this;
        }

        public Builder plannedScanSpeedMmPerS(Double value) {
            this.plannedScanSpeedMmPerS = value;
            return this;
        }

        public Builder maxRoundTripUs(Double value) {
            this.maxRoundTripUs = value;
            return this;
        }

        public Builder maxSoundPathMm(Double value) {
            this.maxSoundPathMm = value;
            return this;
        }

        public Builder wraparoundDecayFactor(Double value) {
            this.wraparoundDecayFactor = value;
            return this;
        }

        public Builder fileSizeLimitMegabytes(Double value) {
            this.fileSizeLimitMegabytes = value;
            return this;
        }

        public AcquisitionInput build() {
            return new AcquisitionInput(samplingFrequencyMhz, decimationFactor, bitDepth, gateLengthUs,
                    gateLengthMm, velocityMPerS, focalLaws, fmcElementCount, capture, averaging,
                    scanIncrementMm, scanLengthMm, pulseRepetitionFrequencyHz, plannedScanSpeedMmPerS,
                    maxRoundTripUs, maxSoundPathMm, wraparoundDecayFactor, fileSizeLimitMegabytes);
        }
    }
}
