package utdigit.core.pulse;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import utdigit.core.common.Reference;
import utdigit.core.common.Warning;

/**
 * The results of the pulse-parameters calculation, named as the contract names them (camelCase of
 * the snake_case fields). A boxed or {@code Optional} field is null when the input it needs was not
 * given; an {@code Optional} field is empty when the value cannot exist for the given inputs, and
 * then a {@link Warning} says why.
 *
 * @param centreFrequencyConvention the convention used (the default ARITHMETIC when the bandwidth
 *     was given without one); null without a bandwidth
 * @param periodUs period 1/f at the nominal frequency, us
 * @param wavelengthMm wavelength v/f in the part at the nominal frequency, mm
 * @param wavelengthIn the same in inches
 * @param lowerFrequencyMhz lower -6 dB band edge of the convention, MHz
 * @param upperFrequencyMhz upper -6 dB band edge of the convention, MHz
 * @param lowerFrequency20dbMhz lower -20 dB edge of the pulse model, MHz; empty when <= 0 Hz
 * @param upperFrequency20dbMhz upper -20 dB edge of the pulse model, MHz
 * @param lowerFrequency40dbMhz lower -40 dB edge of the pulse model, MHz; empty when <= 0 Hz
 * @param upperFrequency40dbMhz upper -40 dB edge of the pulse model, MHz
 * @param pulseDuration6dbUs full envelope duration of the pulse model at -6 dB, us
 * @param pulseDuration20dbUs full envelope duration of the pulse model at -20 dB, us
 * @param cycles6db carrier cycles within the -6 dB duration
 * @param spatialPulseLengthMm v times the -6 dB duration, mm
 * @param axialResolutionMm half the spatial pulse length (pulse-echo), mm
 * @param nearFieldLengthMm D^2 / (4 lambda), mm
 * @param nearFieldLengthExactMm (D^2 - lambda^2) / (4 lambda), mm; empty when D <= lambda
 * @param beamSpread6dbDeg pulse-echo -6 dB half-angle, degrees; empty when it does not exist
 * @param beamSpread20dbDeg pulse-echo -20 dB half-angle, degrees; empty when it does not exist
 * @param beamSpreadNullDeg half-angle of the first null, degrees; empty when it does not exist
 * @param beamDiameter6dbMm -6 dB beam diameter at the distance, mm; empty without a -6 dB angle and
 *     inside the near field (the far-field cone does not hold there)
 * @param nearFieldInPartMm near field left in the part behind the wedge, mm (negative: none)
 * @param refractedAngleDeg refracted angle in the part, degrees; empty past the critical angle
 * @param incidencePlane the angle beam's figures in the incidence plane, from the projected
 *     aperture D cos(beta)/cos(alpha); null without element diameter and incident angle (the other
 *     beam figures are then those of the plane perpendicular to incidence, with D)
 * @param warnings conditions the caller should know about
 * @param references the source of every formula used
 */
public record PulseResult(
        CentreFrequencyConvention centreFrequencyConvention,
        double periodUs,
        double wavelengthMm,
        double wavelengthIn,
        Double lowerFrequencyMhz,
        Double upperFrequencyMhz,
        Optional<Double> lowerFrequency20dbMhz,
        Double upperFrequency20dbMhz,
        Optional<Double> lowerFrequency40dbMhz,
        Double upperFrequency40dbMhz,
        Double pulseDuration6dbUs,
        Double pulseDuration20dbUs,
        Double cycles6db,
        Double spatialPulseLengthMm,
        Double axialResolutionMm,
        Double nearFieldLengthMm,
        Optional<Double> nearFieldLengthExactMm,
        Optional<Double> beamSpread6dbDeg,
        Optional<Double> beamSpread20dbDeg,
        Optional<Double> beamSpreadNullDeg,
        Optional<Double> beamDiameter6dbMm,
        Double nearFieldInPartMm,
        Optional<Double> refractedAngleDeg,
        IncidencePlane incidencePlane,
        List<Warning> warnings,
        List<Reference> references) {

    public PulseResult {
        warnings = List.copyOf(Objects.requireNonNull(warnings, "warnings"));
        references = List.copyOf(Objects.requireNonNull(references, "references"));
    }

    /**
     * An angle beam's near field and beam spread in the incidence plane, where the part sees the
     * projected aperture D_eff = D cos(beta)/cos(alpha). Every field is empty past the critical angle
     * (no refracted wave); a boxed field is null when its optional input was not given.
     *
     * @param apertureMm D_eff, mm
     * @param nearFieldLengthMm D_eff^2 / (4 lambda), mm
     * @param nearFieldInPartMm D_eff^2 / (4 lambda) - w (v_w/v) cos^2(beta)/cos^2(alpha), mm; null
     *     without a wedge path (negative: the part sees only far field in this plane)
     * @param beamSpread6dbDeg pulse-echo -6 dB half-angle with D_eff, degrees
     * @param beamSpread20dbDeg pulse-echo -20 dB half-angle with D_eff, degrees
     * @param beamDiameter6dbMm -6 dB beam width in this plane at the distance, mm; null without a
     *     distance; empty inside this plane's near field or without a -6 dB angle
     */
    public record IncidencePlane(
            Optional<Double> apertureMm,
            Optional<Double> nearFieldLengthMm,
            Optional<Double> nearFieldInPartMm,
            Optional<Double> beamSpread6dbDeg,
            Optional<Double> beamSpread20dbDeg,
            Optional<Double> beamDiameter6dbMm) {
    }

    /** Whether a warning with this code was given. */
    public boolean hasWarning(String code) {
        return warnings.stream().anyMatch(w -> w.code().equals(code));
    }
}
