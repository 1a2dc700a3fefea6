package utdigit.core.coverage;

import java.util.List;
import java.util.Optional;
import utdigit.core.common.Reference;
import utdigit.core.common.Warning;

/**
 * A scan coverage assessment. A field whose optional inputs were not given is null; an
 * {@link Optional} is empty when the value cannot be known for the inputs (the reflector inside the
 * probe's near field), with a warning. Losses are positive dB.
 *
 * @param beamWidth6dbMm the beam width used, as given or from the probe, mm
 * @param scanIncrementLossDb 6 (dx / w)^2 for the scan increment, dB
 * @param indexStepLossDb 6 (dx / w)^2 for the index step, dB
 * @param angularStepLossDb 6 (z dtheta / w)^2 for the angular step, dB
 * @param maxStepMm with a tolerance X: w sqrt(X / 6), mm (scan increment and index step alike)
 * @param maxAngularStepDeg with a tolerance and a sound path: w sqrt(X / 6) / z in degrees
 * @param scanIncrementWithinTolerance whether the scan increment's loss is at most X
 * @param indexStepWithinTolerance whether the index step's loss is at most X
 * @param angularStepWithinTolerance whether the angular step's loss is at most X
 */
public record ScanCoverageResult(
        Optional<Double> beamWidth6dbMm,
        Optional<Double> scanIncrementLossDb,
        Optional<Double> indexStepLossDb,
        Optional<Double> angularStepLossDb,
        Optional<Double> maxStepMm,
        Optional<Double> maxAngularStepDeg,
        Optional<Boolean> scanIncrementWithinTolerance,
        Optional<Boolean> indexStepWithinTolerance,
        Optional<Boolean> angularStepWithinTolerance,
        List<Warning> warnings,
        List<Reference> references) {

    public ScanCoverageResult {
        warnings = List.copyOf(warnings);
        references = List.copyOf(references);
    }

    public boolean hasWarning(String code) {
        return warnings.stream().anyMatch(w -> w.code().equals(code));
    }
}
