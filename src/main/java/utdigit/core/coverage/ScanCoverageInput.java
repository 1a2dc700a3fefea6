package utdigit.core.coverage;

/**
 * Inputs of a scan coverage assessment, in the contract's units (lengths in mm, velocity in m/s,
 * frequency in MHz, angles in degrees). The beam width comes either as the measured or computed
 * pulse-echo -6 dB beam width at the reflector's depth, or from a round single-element probe
 * (frequency, element diameter, velocity and the sound path); not both. Optional inputs are null when
 * not given.
 *
 * @param beamWidth6dbMm pulse-echo -6 dB beam width w at the reflector's sound path, mm
 * @param frequencyMhz nominal probe frequency (with elementDiameterMm, velocityMPerS, soundPathMm)
 * @param velocityMPerS velocity of the wave mode in the part, m/s
 * @param elementDiameterMm round element diameter D, mm
 * @param soundPathMm sound path z from the probe to the reflector, mm (needed for the probe's beam
 *     width and for an angular step)
 * @param scanIncrementMm distance between neighbouring positions along the scan, mm
 * @param indexStepMm distance between neighbouring scan lines (index offset), mm
 * @param angularStepDeg angle between neighbouring beams of a sector scan, deg
 * @param amplitudeToleranceDb largest acceptable loss X, dB
 */
public record ScanCoverageInput(
        Double beamWidth6dbMm,
        Double frequencyMhz,
        Double velocityMPerS,
        Double elementDiameterMm,
        Double soundPathMm,
        Double scanIncrementMm,
        Double indexStepMm,
        Double angularStepDeg,
        Double amplitudeToleranceDb) {

    /** A builder with every input "not given" (the calculator checks which combination is given). */
    public static Builder builder() {
        return new Builder();
    }

    /** Collects the optional inputs; null leaves an input "not given". Not thread-safe. */
    public static final class Builder {
        private Double beamWidth6dbMm;
        private Double frequencyMhz;
        private Double velocityMPerS;
        private Double elementDiameterMm;
        private Double soundPathMm;
        private Double scanIncrementMm;
        private Double indexStepMm;
        private Double angularStepDeg;
        private Double amplitudeToleranceDb;

        private Builder() {
        }

        public Builder beamWidth6dbMm(Double value) {
            this.beamWidth6dbMm = value;
            return this;
        }

        public Builder frequencyMhz(Double value) {
            this.frequencyMhz = value;
            return this;
        }

        public Builder velocityMPerS(Double value) {
            this.velocityMPerS = value;
            return this;
        }

        public Builder elementDiameterMm(Double value) {
            this.elementDiameterMm = value;
            return this;
        }

        public Builder soundPathMm(Double value) {
            this.soundPathMm = value;
            return this;
        }

        public Builder scanIncrementMm(Double value) {
            this.scanIncrementMm = value;
            return this;
        }

        public Builder indexStepMm(Double value) {
            this.indexStepMm = value;
            return this;
        }

        public Builder angularStepDeg(Double value) {
            this.angularStepDeg = value;
            return this;
        }

        public Builder amplitudeToleranceDb(Double value) {
            this.amplitudeToleranceDb = value;
            return this;
        }

        public ScanCoverageInput build() {
            return new ScanCoverageInput(beamWidth6dbMm, frequencyMhz, velocityMPerS, elementDiameterMm,
                    soundPathMm, scanIncrementMm, indexStepMm, angularStepDeg, amplitudeToleranceDb);
        }
    }
}
