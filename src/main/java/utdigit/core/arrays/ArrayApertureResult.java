package utdigit.core.arrays;

import java.util.List;
import java.util.Optional;
import utdigit.core.common.Reference;
import utdigit.core.common.Warning;

/**
 * An array aperture assessment. Fields whose optional inputs were not given are null; an
 * {@link Optional} is empty when the value cannot exist for the inputs (with a warning).
 *
 * @param maxSteeringAngleDeg the largest steering angle used (default 0), deg
 * @param wavelengthMm lambda = v / f in the medium of the steering, mm
 * @param activeApertureMm L: n p, or as given, mm
 * @param nearFieldLengthMm steering plane: L^2 / (4 lambda), mm
 * @param beamSpread6dbDeg steering plane, unsteered: pulse-echo -6 dB half-angle of sinc^2, deg
 * @param beamSpread20dbDeg steering plane, unsteered: pulse-echo -20 dB half-angle, deg
 * @param beamSpreadNullDeg steering plane, unsteered: first null, sin(theta) = lambda / L, deg
 * @param passiveNearFieldLengthMm passive plane: W^2 / (4 lambda) for the element length W, mm
 * @param passiveBeamSpread6dbDeg passive plane: pulse-echo -6 dB half-angle, deg
 * @param pitchToWavelengthRatio p / lambda
 * @param maxGratingLobeFreePitchMm lambda / (1 + sin(theta_max)), mm
 * @param gratingLobeFree whether p is below that pitch (no grating lobe enters the medium at any
 *     steering angle up to theta_max)
 */
public record ArrayApertureResult(
        double maxSteeringAngleDeg,
        double wavelengthMm,
        Double activeApertureMm,
        Double nearFieldLengthMm,
        Optional<Double> beamSpread6dbDeg,
        Optional<Double> beamSpread20dbDeg,
        Optional<Double> beamSpreadNullDeg,
        Double passiveNearFieldLengthMm,
        Optional<Double> passiveBeamSpread6dbDeg,
        double pitchToWavelengthRatio,
        double maxGratingLobeFreePitchMm,
        boolean gratingLobeFree,
        List<Warning> warnings,
        List<Reference> references) {

    public ArrayApertureResult {
        warnings = List.copyOf(warnings);
        references = List.copyOf(references);
    }

    public boolean hasWarning(String code) {
        return warnings.stream().anyMatch(w -> w.code().equals(code));
    }
}
