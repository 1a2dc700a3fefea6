package utdigit.core.thickness;

import static utdigit.core.thickness.ThicknessCalculator.THICKNESS_BELOW_AXIAL_RESOLUTION;

import java.util.Locale;
import utdigit.core.common.MessageNumbers;
import utdigit.core.common.Warning;

/** Every warning and failure text of the thickness resolution, one factory per condition. */
final class ThicknessMessages {
    private ThicknessMessages() {}

    static Warning samplingTermDominates(Measurement measurement, double coverageFactor, double coveragePercent,
            double worstCaseMm) {
        return Warning.of("SAMPLING_TERM_DOMINATES",
                String.format(Locale.ROOT,
                        "the sampling term dominates standard_uncertainty_mm; its distribution is %s, not"
                                + " normal, so coverage_factor %s does not give a 95 %% coverage probability:"
                                + " for the sampling term alone k u covers %s %% and the worst case is"
                                + " +/- %s mm",
                        measurement == Measurement.ECHO_TO_ECHO ? "triangular" : "rectangular",
                        MessageNumbers.exact(coverageFactor), MessageNumbers.rounded(coveragePercent),
                        MessageNumbers.rounded(worstCaseMm)));
    }

    static Warning resolutionCoarserThanRequired(double thicknessResolutionMm, double requiredResolutionMm,
            double requiredSamplingFrequencyMhz) {
        return Warning.of("RESOLUTION_COARSER_THAN_REQUIRED",
                String.format(Locale.ROOT,
                        "thickness_resolution_mm (%s mm) is coarser than required_resolution (%s mm):"
                                + " sampling_frequency_mhz %s or more is needed",
                        MessageNumbers.rounded(thicknessResolutionMm),
                        MessageNumbers.rounded(requiredResolutionMm),
                        MessageNumbers.rounded(requiredSamplingFrequencyMhz)));
    }

    static Warning velocityUncertaintyZero() {
        return Warning.of("VELOCITY_UNCERTAINTY_ZERO",
                "the velocity uncertainty is 0 (velocity_uncertainty_m_per_s or velocity_uncertainty_percent"
                        + " not given or 0): standard_uncertainty_mm and expanded_uncertainty_mm then hold the"
                        + " sampling alone; a velocity known to p % adds p % of the thickness");
    }

    static Warning thicknessBelowAxialResolution(double thicknessMm, double axialResolutionMm) {
        return Warning.of(THICKNESS_BELOW_AXIAL_RESOLUTION,
                String.format(Locale.ROOT,
                        "nominal_thickness (%s mm) is below the axial resolution v tau(-6 dB)/2 (%s mm,"
                                + " model value from frequency_mhz and bandwidth_percent): successive wall echoes,"
                                + " 2d/v apart, overlap and the reading depends on how the instrument picks them",
                        MessageNumbers.rounded(thicknessMm), MessageNumbers.rounded(axialResolutionMm)));
    }
}
