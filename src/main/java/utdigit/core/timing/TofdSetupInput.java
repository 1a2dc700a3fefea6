package utdigit.core.timing;

/**
 * Inputs of a TOFD set-up check, in the contract's units (lengths in mm, velocity in m/s, times in
 * us, frequency in MHz). Times are in the part, from emission to reception (wedge delays excluded).
 * Optional inputs are null when not given.
 *
 * @param velocityMPerS velocity of the wave mode used (longitudinal for TOFD), m/s
 * @param probeCentreSeparationMm the full probe centre separation 2S, mm
 * @param thicknessMm wall thickness T, mm
 * @param gateStartUs gate opening time, us (with gateEndUs)
 * @param gateEndUs gate closing time, us (with gateStartUs)
 * @param pulseDurationUs signal duration tp, the margin each side of the gate, us; null: no margin
 * @param depthMm tip depth where the depth uncertainty is wanted, mm; or measuredTimeUs (not both)
 * @param measuredTimeUs measured tip arrival time, us: gives the depth and its uncertainty there
 * @param samplingFrequencyMhz converter rate, MHz: the timing uncertainty of the sampling
 * @param decimationFactor stored rate fs / m; null: 1
 * @param timeReference TRIGGER (one quantized instant) or LATERAL_WAVE (a difference of two);
 *     null: TRIGGER
 * @param probeCentreSeparationUncertaintyMm standard uncertainty of the full separation 2S, mm
 * @param coverageFactor k of the expanded uncertainty; null: 2
 */
public record TofdSetupInput(
        double velocityMPerS,
        double probeCentreSeparationMm,
        double thicknessMm,
        Double gateStartUs,
        Double gateEndUs,
        Double pulseDurationUs,
        Double depthMm,
        Double measuredTimeUs,
        Double samplingFrequencyMhz,
        Integer decimationFactor,
        TimeReference timeReference,
        Double probeCentreSeparationUncertaintyMm,
        Double coverageFactor) {

    /** The geometry alone. */
    public static TofdSetupInput of(double velocityMPerS, double probeCentreSeparationMm, double thicknessMm) {
        return new TofdSetupInput(velocityMPerS, probeCentreSeparationMm, thicknessMm, null, null, null, null, null,
                null, null, null, null, null);
    }

    public TofdSetupInput withGate(Double startUs, Double endUs) {
        return new TofdSetupInput(velocityMPerS, probeCentreSeparationMm, thicknessMm, startUs, endUs,
                pulseDurationUs, depthMm, measuredTimeUs, samplingFrequencyMhz, decimationFactor, timeReference,
                probeCentreSeparationUncertaintyMm, coverageFactor);
    }

    public TofdSetupInput withPulseDurationUs(Double v) {
        return new TofdSetupInput(velocityMPerS, probeCentreSeparationMm, thicknessMm, gateStartUs, gateEndUs, v,
                depthMm, measuredTimeUs, samplingFrequencyMhz, decimationFactor, timeReference,
                probeCentreSeparationUncertaintyMm, coverageFactor);
    }

    public TofdSetupInput withDepthMm(Double v) {
        return new TofdSetupInput(velocityMPerS, probeCentreSeparationMm, thicknessMm, gateStartUs, gateEndUs,
                pulseDurationUs, v, measuredTimeUs, samplingFrequencyMhz, decimationFactor, timeReference,
                probeCentreSeparationUncertaintyMm, coverageFactor);
    }

    public TofdSetupInput withMeasuredTimeUs(Double v) {
        return new TofdSetupInput(velocityMPerS, probeCentreSeparationMm, thicknessMm, gateStartUs, gateEndUs,
                pulseDurationUs, depthMm, v, samplingFrequencyMhz, decimationFactor, timeReference,
                probeCentreSeparationUncertaintyMm, coverageFactor);
    }

    public TofdSetupInput withSampling(Double frequencyMhz, Integer decimation, TimeReference reference) {
        return new TofdSetupInput(velocityMPerS, probeCentreSeparationMm, thicknessMm, gateStartUs, gateEndUs,
                pulseDurationUs, depthMm, measuredTimeUs, frequencyMhz, decimation, reference,
                probeCentreSeparationUncertaintyMm, coverageFactor);
    }

    public TofdSetupInput withSeparationUncertaintyMm(Double v) {
        return new TofdSetupInput(velocityMPerS, probeCentreSeparationMm, thicknessMm, gateStartUs, gateEndUs,
                pulseDurationUs, depthMm, measuredTimeUs, samplingFrequencyMhz, decimationFactor, timeReference, v,
                coverageFactor);
    }

    public TofdSetupInput withCoverageFactor(Double v) {
        return new TofdSetupInput(velocityMPerS, probeCentreSeparationMm, thicknessMm, gateStartUs, gateEndUs,
                pulseDurationUs, depthMm, measuredTimeUs, samplingFrequencyMhz, decimationFactor, timeReference,
                probeCentreSeparationUncertaintyMm, v);
    }
}
