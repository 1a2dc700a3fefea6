package utdigit.web.sheets;

import io.swagger.v3.oas.annotations.media.Schema;
import jakarta.validation.Valid;
import java.util.List;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Pattern;
import jakarta.validation.constraints.Size;
import utdigit.core.acquisition.CaptureMode;
import utdigit.core.materials.WaveMode;
import utdigit.core.quantization.CodeMapping;
import utdigit.core.quantization.DigitizedSignal;
import utdigit.core.quantization.Quantizer;
import utdigit.core.sampling.DecimationMode;
import utdigit.core.sampling.SampledSignal;
import utdigit.core.sampling.TfmImage;
import utdigit.core.sheets.SheetTechnique;
import utdigit.web.units.VelocityFields;

/** POST /api/technique-sheet-validations: a technique sheet and the profile to check it against. */
@Schema(name = "TechniqueSheet", description = "A technique sheet. Every section and field is optional: the service "
        + "computes what the given fields allow and reports rules it could not evaluate. Lengths once as _mm or _in; "
        + "the velocity once as velocity_m_per_s, velocity_in_per_us or material.")
public record TechniqueSheetRequest(
        @Schema(description = "The sheet's identifier in the caller's system", example = "NWF-PAUT-0142")
        @Size(max = 200) String sheetId,
        @Schema(description = "The sheet's revision", example = "C")
        @Size(max = 50) String revision,
        @Schema(description = "Technique of the sheet")
        @NotNull(message = "is required") SheetTechnique technique,
        @Schema(description = "One requirement profile to check against (GET /api/requirement-profiles); the "
                + "single form of profile_ids, not both; default common-practice", example = "common-practice")
        @Size(max = 100) @Pattern(regexp = "[a-z0-9]+(-[a-z0-9]+)*", message = "must be a kebab-case profile id")
        String profileId,
        @Schema(description = "Requirement profiles to check against, one or more (at most 20, no repeats; e.g. a "
                + "company procedure and the code it invokes): the findings name their profile and the verdict is "
                + "the worst. In CSV: the ids in one cell separated by ';'. Not with profile_id; default "
                + "[common-practice]")
        @Size(min = 1, max = 20)
        List<@NotNull(message = "must be a profile id") @Size(max = 100)
                @Pattern(regexp = "[a-z0-9]+(-[a-z0-9]+)*", message = "must be a kebab-case profile id") String>
                profileIds,
        @Valid Probe probe,
        @Valid Material material,
        @Valid Digitization digitization,
        @Valid Acquisition acquisition,
        @Valid Tofd tofd,
        @Valid Tfm tfm,
        @Valid Evaluation evaluation,
        @Valid SheetSetupSection setup) {

    /** The probe. */
    @Schema(name = "SheetProbe")
    public record Probe(
            @Schema(description = "Nominal probe frequency, MHz (> 0, <= 1000)", format = "double", example = "5")
            @DecimalMin(value = "0", inclusive = false) @DecimalMax("1000") Double frequencyMhz,
            @Schema(description = "-6 dB fractional bandwidth, % (0 to 200 exclusive)", format = "double", example = "60")
            @DecimalMin(value = "0", inclusive = false) @DecimalMax(value = "200", inclusive = false) Double bandwidthPercent,
            @Schema(description = "Element diameter (single circular element), mm", format = "double", example = "10")
            @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000") Double elementDiameterMm,
            @Schema(description = "Element diameter, in", format = "double", example = "0.375")
            @DecimalMin(value = "0", inclusive = false) Double elementDiameterIn,
            @Schema(description = "Number of array elements (1 to 65536)", format = "int32", example = "64")
            @Min(1) @Max(65536) Integer elementCount) {}

    /** The part's material and geometry. */
    @Schema(name = "SheetMaterial")
    public record Material(
            @Schema(description = "Built-in material id", example = "carbon-steel") String material,
            @Schema(description = "Wave mode of the material's velocity; default LONGITUDINAL") WaveMode waveMode,
            @Schema(description = "Water only: temperature, C (0 to 95)", format = "double", example = "20")
            @DecimalMin("0") @DecimalMax("95") Double temperatureC,
            @Schema(description = "Velocity of the wave mode used, m/s (100 to 20000)", format = "double", example = "3255")
            @DecimalMin("100") @DecimalMax("20000") Double velocityMPerS,
            @Schema(description = "Velocity of the wave mode used, in/us", format = "double", example = "0.128")
            @DecimalMin(value = "0", inclusive = false) Double velocityInPerUs,
            @Schema(description = "Standard uncertainty of the velocity, m/s", format = "double", example = "15")
            @DecimalMin("0") @DecimalMax("4000") Double velocityUncertaintyMPerS,
            @Schema(description = "Standard uncertainty of the velocity, % (0 to 20)", format = "double", example = "0.5")
            @DecimalMin("0") @DecimalMax("20") Double velocityUncertaintyPercent,
            @Schema(description = "Wall thickness, mm", format = "double", example = "25")
            @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000") Double thicknessMm,
            @Schema(description = "Wall thickness, in", format = "double", example = "1")
            @DecimalMin(value = "0", inclusive = false) Double thicknessIn,
            @Schema(description = "Refracted angle of an angle beam, deg (0 to below 90)", format = "double", example = "60")
            @DecimalMin("0") @DecimalMax(value = "90", inclusive = false) Double refractedAngleDeg,
            @Schema(description = "Standard uncertainty of the velocity, in/us (equivalent of 0 to 4000 m/s); the inch "
                    + "form of velocity_uncertainty_m_per_s", format = "double", example = "0.00059")
            @DecimalMin("0") Double velocityUncertaintyInPerUs) implements VelocityFields {}

    /** The digitizer's settings. */
    @Schema(name = "SheetDigitization")
    public record Digitization(
            @Schema(description = "Converter sampling frequency, MHz (> 0, <= 100000)", format = "double", example = "100")
            @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000") Double samplingFrequencyMhz,
            @Schema(description = "Integer decimation (compression) factor, 1 to 65536; default 1", format = "int32", example = "1")
            @Min(1) @Max(65536) Integer decimationFactor,
            @Schema(description = "Converter resolution, bits (1 to 32)", format = "int32", example = "12")
            @Min(1) @Max(32) Integer bitDepth,
            @Schema(description = "RF or RECTIFIED digitizing; default RF") DigitizedSignal digitizedSignal,
            @Schema(description = "ROUNDING or TRUNCATION; default ROUNDING") Quantizer quantizer,
            @Schema(description = "FSR_OVER_2N or MAX_CODE; default FSR_OVER_2N") CodeMapping codeMapping,
            @Schema(description = "DROP or PEAK_PRESERVING decimation; default DROP") DecimationMode decimationMode,
            @Schema(description = "RF or ENVELOPE signal sampled; default RF") SampledSignal signal) {}

    /** The acquisition. */
    @Schema(name = "SheetAcquisition")
    public record Acquisition(
            @Schema(description = "Firing rate of the instrument (all firings), Hz (> 0, <= 1e6)", format = "double", example = "5000")
            @DecimalMin(value = "0", inclusive = false) @DecimalMax("1000000") Double pulseRepetitionFrequencyHz,
            @Schema(description = "Focal laws summed over all groups (1 to 65536)", format = "int32", example = "61")
            @Min(1) @Max(65536) Integer focalLaws,
            @Schema(description = "Elements of a full-matrix capture (1 to 65536)", format = "int32", example = "64")
            @Min(1) @Max(65536) Integer fmcElementCount,
            @Schema(description = "FMC or HMC; only with fmc_element_count; default FMC") CaptureMode capture,
            @Schema(description = "Acquisitions averaged (1 to 65536); default 1", format = "int32", example = "1")
            @Min(1) @Max(65536) Integer averaging,
            @Schema(description = "Scan (encoder) increment, mm", format = "double", example = "1")
            @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000") Double scanIncrementMm,
            @Schema(description = "Scan increment, in", format = "double", example = "0.04")
            @DecimalMin(value = "0", inclusive = false) Double scanIncrementIn,
            @Schema(description = "Scan length, mm", format = "double", example = "2000")
            @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000") Double scanLengthMm,
            @Schema(description = "Scan length, in", format = "double", example = "80")
            @DecimalMin(value = "0", inclusive = false) Double scanLengthIn,
            @Schema(description = "Planned scan speed, mm/s", format = "double", example = "50")
            @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000") Double plannedScanSpeedMmPerS,
            @Schema(description = "Planned scan speed, in/s (1 in/s = 25.4 mm/s)", format = "double", example = "2")
            @DecimalMin(value = "0", inclusive = false) Double plannedScanSpeedInPerS,
            @Schema(description = "Gate length, us (> 0, <= 100000)", format = "double", example = "40")
            @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000") Double gateLengthUs,
            @Schema(description = "Gate length as a pulse-echo sound path in the part, mm", format = "double", example = "100")
            @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000") Double gateLengthMm,
            @Schema(description = "Gate length as a sound path, in", format = "double", example = "4")
            @DecimalMin(value = "0", inclusive = false) Double gateLengthIn,
            @Schema(description = "Longest one-way sound path in the part, mm (wrap-around limit)", format = "double", example = "150")
            @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000") Double maxSoundPathMm,
            @Schema(description = "Longest one-way sound path in the part, in", format = "double", example = "6")
            @DecimalMin(value = "0", inclusive = false) Double maxSoundPathIn,
            @Schema(description = "Longest round trip over all media, us (wrap-around limit)", format = "double", example = "80")
            @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000") Double maxRoundTripUs,
            @Schema(description = "Reverberation margin q >= 1 on the round trip (1 to 100); default 1", format = "double", example = "2")
            @DecimalMin("1") @DecimalMax("100") Double wraparoundDecayFactor) {}

    /** TOFD set-up. */
    @Schema(name = "SheetTofd")
    public record Tofd(
            @Schema(description = "Probe-centre separation, the full separation 2S, mm", format = "double", example = "80")
            @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000") Double probeCentreSeparationMm,
            @Schema(description = "Probe-centre separation 2S, in", format = "double", example = "3")
            @DecimalMin(value = "0", inclusive = false) Double probeCentreSeparationIn,
            @Schema(description = "Depth of interest below the scanning surface, mm", format = "double", example = "20")
            @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000") Double depthOfInterestMm,
            @Schema(description = "Depth of interest, in", format = "double", example = "0.8")
            @DecimalMin(value = "0", inclusive = false) Double depthOfInterestIn) {}

    /** TFM image grid. */
    @Schema(name = "SheetTfm")
    public record Tfm(
            @Schema(description = "Depth step of the image grid, mm", format = "double", example = "0.1")
            @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000") Double gridSpacingMm,
            @Schema(description = "Depth step of the image grid, in", format = "double", example = "0.004")
            @DecimalMin(value = "0", inclusive = false) Double gridSpacingIn,
            @Schema(description = "Lateral step of the image grid, mm", format = "double", example = "0.2")
            @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000") Double lateralGridSpacingMm,
            @Schema(description = "Lateral step of the image grid, in", format = "double", example = "0.008")
            @DecimalMin(value = "0", inclusive = false) Double lateralGridSpacingIn,
            @Schema(description = "Active aperture for the lateral check, mm", format = "double", example = "38")
            @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000") Double apertureMm,
            @Schema(description = "Active aperture for the lateral check, in", format = "double", example = "1.5")
            @DecimalMin(value = "0", inclusive = false) Double apertureIn,
            @Schema(description = "Depth of the lateral check, mm", format = "double", example = "20")
            @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000") Double depthMm,
            @Schema(description = "Depth of the lateral check, in", format = "double", example = "0.8")
            @DecimalMin(value = "0", inclusive = false) Double depthIn,
            @Schema(description = "RF or ENVELOPE image; default RF") TfmImage image) {}

    /** The evaluation. */
    @Schema(name = "SheetEvaluation")
    public record Evaluation(
            @Schema(description = "Reference echo height, %FSH (> 0, <= 100)", format = "double", example = "80")
            @DecimalMin(value = "0", inclusive = false) @DecimalMax("100") Double referenceHeightPercentFsh,
            @Schema(description = "Evaluation level relative to the reference, dB (-80 to +20)", format = "double", example = "-14")
            @DecimalMin("-80") @DecimalMax("20") Double evaluationLevelDb,
            @Schema(description = "Amplitude tolerance of the evaluation, dB (> 0, <= 40)", format = "double", example = "2")
            @DecimalMin(value = "0", inclusive = false) @DecimalMax("40") Double amplitudeToleranceDb,
            @Schema(description = "Thickness measurement tolerance, mm", format = "double", example = "0.1")
            @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000") Double thicknessToleranceMm,
            @Schema(description = "Thickness measurement tolerance, in", format = "double", example = "0.004")
            @DecimalMin(value = "0", inclusive = false) Double thicknessToleranceIn) {}
}
