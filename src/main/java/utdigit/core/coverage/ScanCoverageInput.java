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

    /** A given beam width, no step yet. */
    public static ScanCoverageInput ofBeamWidth(double beamWidth6dbMm) {
        return new ScanCoverageInput(beamWidth6dbMm, null, null, null, null, null, null, null, null);
    }

    /** A round probe's beam at a sound path, no step yet. */
    public static ScanCoverageInput ofProbe(double frequencyMhz, double velocityMPerS, double elementDiameterMm,
                                            double soundPathMm) {
        return new ScanCoverageInput(null, frequencyMhz, velocityMPerS, elementDiameterMm, soundPathMm, null, null,
                null, null);
    }

    public ScanCoverageInput withSoundPathMm(Double v) {
        return new ScanCoverageInput(beamWidth6dbMm, frequencyMhz, velocityMPerS, elementDiameterMm, v,
                scanIncrementMm, indexStepMm, angularStepDeg, amplitudeToleranceDb);
    }

    public ScanCoverageInput withScanIncrementMm(Double v) {
        return new ScanCoverageInput(beamWidth6dbMm, frequencyMhz, velocityMPerS, elementDiameterMm, soundPathMm,
                v, indexStepMm, angularStepDeg, amplitudeToleranceDb);
    }

    public ScanCoverageInput withIndexStepMm(Double v) {
        return new ScanCoverageInput(beamWidth6dbMm, frequencyMhz, velocityMPerS, elementDiameterMm, soundPathMm,
                scanIncrementMm, v, angularStepDeg, amplitudeToleranceDb);
    }

    public ScanCoverageInput withAngularStepDeg(Double v) {
        return new ScanCoverageInput(beamWidth6dbMm, frequencyMhz, velocityMPerS, elementDiameterMm, soundPathMm,
                scanIncrementMm, indexStepMm, v, amplitudeToleranceDb);
    }

    public ScanCoverageInput withAmplitudeToleranceDb(Double v) {
        return new ScanCoverageInput(beamWidth6dbMm, frequencyMhz, velocityMPerS, elementDiameterMm, soundPathMm,
                scanIncrementMm, indexStepMm, angularStepDeg, v);
    }
}
