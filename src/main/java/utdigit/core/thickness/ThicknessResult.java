package utdigit.core.thickness;

import java.util.List;
import java.util.Objects;
import utdigit.core.common.Reference;
import utdigit.core.common.Warning;

/**
 * A thickness resolution: the contract's result fields of POST /api/thickness-resolutions
 * (camelCase of the snake_case names), the options used, warnings and references.
 *
 * @param measurement the measurement used (default FIRST_ECHO)
 * @param echoSpacing the echo spacing m used (1 for FIRST_ECHO)
 * @param decimationFactor the decimation factor used (default 1)
 * @param coverageFactor the coverage factor k used (default 2)
 * @param velocityUncertaintyMPerS the standard uncertainty of the velocity used, m/s (0 when none given)
 * @param thicknessResolutionMm the thickness of one sample v dt / (2m), mm
 * @param thicknessResolutionIn the same in inches
 * @param roundTripTimeUs one round trip through the nominal thickness 2d/v (whatever m), us
 * @param samplesAcrossThickness samples in one round trip, 2d/v x fs_eff
 * @param relativeResolutionPercent thickness resolution / nominal thickness x 100
 * @param timingStandardUncertaintyNs dt/sqrt(12) (FIRST_ECHO) or dt/sqrt(6) (ECHO_TO_ECHO), ns
 * @param timingWorstCaseErrorNs dt/2 (FIRST_ECHO) or dt (ECHO_TO_ECHO), ns
 * @param standardUncertaintyMm the combined standard uncertainty u_d (JCGM 100:2008 eq. 10), mm
 * @param expandedUncertaintyMm k u_d, mm
 * @param requiredSamplingFrequencyMhz with required_resolution: the raw sampling frequency to set
 *     (for the same decimation) for that resolution, MHz; null otherwise
 * @param warnings conditions the caller should know about
 * @param references the source of every formula used
 */
public record ThicknessResult(
        Measurement measurement,
        int echoSpacing,
        int decimationFactor,
        double coverageFactor,
        double velocityUncertaintyMPerS,
        double thicknessResolutionMm,
        double thicknessResolutionIn,
        double roundTripTimeUs,
        double samplesAcrossThickness,
        double relativeResolutionPercent,
        double timingStandardUncertaintyNs,
        double timingWorstCaseErrorNs,
        double standardUncertaintyMm,
        double expandedUncertaintyMm,
        Double requiredSamplingFrequencyMhz,
        List<Warning> warnings,
        List<Reference> references) {

    public ThicknessResult {
        Objects.requireNonNull(measurement, "measurement");
        warnings = List.copyOf(warnings);
        references = List.copyOf(references);
    }
}
