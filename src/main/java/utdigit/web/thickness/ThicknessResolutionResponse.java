package utdigit.web.thickness;

import io.swagger.v3.oas.annotations.media.Schema;
import java.util.List;
import java.util.Optional;
import utdigit.web.pipeline.ResultNotes.ReferenceView;
import utdigit.web.pipeline.ToleranceCheck;
import utdigit.web.pipeline.ResultNotes.WarningView;
import utdigit.web.units.VelocitySourceView;

/** The answer of POST /api/thickness-resolutions. */
@Schema(name = "ThicknessResolution", description = "How finely one sample of the stored time base resolves the "
        + "wall thickness, and how certainly the thickness is measured (the GUM combination of the velocity's and "
        + "the sampling's standard uncertainties). Fields whose optional inputs were not given are omitted.")
record ThicknessResolutionResponse(
        @Schema(description = "Thickness of one sample, v dt / (2 echo_spacing), mm", example = "0.0592")
        double thicknessResolutionMm,
        @Schema(description = "The same in inches", example = "0.00233")
        double thicknessResolutionIn,
        @Schema(description = "One round trip through the nominal thickness, 2d/v (whatever echo_spacing), us",
                example = "4.22")
        double roundTripTimeUs,
        @Schema(description = "Samples in one round trip, round_trip_time_us x the stored rate (not rounded)",
                example = "211.1")
        double samplesAcrossThickness,
        @Schema(description = "thickness_resolution_mm / nominal thickness x 100, %", example = "0.47")
        double relativeResolutionPercent,
        @Schema(description = "Standard uncertainty of the measured time from the sampling: dt/sqrt(12) FIRST_ECHO "
                + "(rectangular), dt/sqrt(6) ECHO_TO_ECHO (triangular), ns", example = "5.77")
        double timingStandardUncertaintyNs,
        @Schema(description = "Worst-case timing error from the sampling: dt/2 FIRST_ECHO, dt ECHO_TO_ECHO, ns",
                example = "10")
        double timingWorstCaseErrorNs,
        @Schema(description = "Combined standard uncertainty of the thickness u_d, JCGM 100:2008 eq. 10: "
                + "u_d^2 = (t/(2m))^2 u_v^2 + (v/(2m))^2 u_t^2, mm", example = "0.0631")
        double standardUncertaintyMm,
        @Schema(description = "Expanded uncertainty U = coverage_factor x u_d, mm; where the rectangular sampling "
                + "term dominates, k = 2 does not mean 95 % (a warning says so)", example = "0.126")
        double expandedUncertaintyMm,
        @Schema(description = "With required_resolution: the raw sampling frequency to set (same decimation) for "
                + "that resolution, decimation_factor x v / (2 m r), MHz", example = "59.2")
        Double requiredSamplingFrequencyMhz,
        @Schema(description = "Each figure compared with a tolerance or requirement of the request: "
                + "thickness_resolution_mm at most required_resolution_mm; only with required_resolution")
        List<ToleranceCheck> toleranceChecks,

        @Schema(description = "The normalised request (lengths in mm, velocity in m/s, the velocity uncertainty in "
                + "the form given (absent when none: 0), and measurement, echo_spacing, decimation_factor and "
                + "coverage_factor filled in); itself a valid request that reproduces this answer")
        ThicknessResolutionRequest inputs,
        VelocitySourceView velocitySource,
        List<WarningView> warnings,
        List<ReferenceView> references,
        @Schema(description = "Inch mirrors of the length results: each x_mm result as x_in = x_mm / 25.4 (the "
                + "inch is 25.4 mm exactly), a speed x_mm_per_s as x_in_per_s; each present when its mm field is, "
                + "null when it is null; omitted when the answer has no length result")
        InInches inInches) {

    /** Inch mirrors of the length results, each the mm result / 25.4. */
    @Schema(name = "ThicknessResolutionInInches", description = "Inch mirrors of the length "
            + "results (the inch is 25.4 mm exactly)")
    record InInches(
            @Schema(description = "standard_uncertainty_mm / 25.4, in", format = "double")
            Double standardUncertaintyIn,
            @Schema(description = "expanded_uncertainty_mm / 25.4, in", format = "double")
            Double expandedUncertaintyIn) {

        /** The mirrors, or null (omitted) when the answer has no length result. */
        static InInches of(Double standardUncertaintyIn, Double expandedUncertaintyIn) {
            return standardUncertaintyIn == null && expandedUncertaintyIn == null ? null
                    : new InInches(standardUncertaintyIn, expandedUncertaintyIn);
        }
    }
}
