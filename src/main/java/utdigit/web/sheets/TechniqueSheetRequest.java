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
import utdigit.web.units.Lengths;
import utdigit.web.units.VelocityFields;

/** POST /api/technique-sheet-validations: a technique sheet and the profile to check it against. */
@Schema(name = "TechniqueSheet", description = "A technique sheet. Every section and field is optional: the service "
        + "computes what the given fields allow and reports rules it could not evaluate. Lengths once as _mm or _in; "
        + "the velocity once as velocity_m_per_s, velocity_in_per_us or material.")
public record TechniqueSheetRequest(
        @Size(max = 200) String sheetId,
        @Size(max = 50) String revision,
        @NotNull(message = "is required") SheetTechnique technique,
        @Size(max = 100) @Pattern(regexp = "[a-z0-9]+(-[a-z0-9]+)*", message = "must be a kebab-case profile id")
        String profileId,
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
    @Schema(name = "SheetProbe",
            description = "The probe: frequency, bandwidth, element diameter, number of array elements")
    public record Probe(
            @DecimalMin(value = "0", inclusive = false) @DecimalMax("1000") Double frequencyMhz,
            @DecimalMin(value = "0", inclusive = false) @DecimalMax(value = "200", inclusive = false) Double bandwidthPercent,
            @Lengths.Mm Double elementDiameterMm,
            @Lengths.In Double elementDiameterIn,
            @Min(1) @Max(65536) Integer elementCount) {}

    /** The part's material and geometry. */
    @Schema(name = "SheetMaterial",
            description = "The part: material or velocity (with its uncertainty), wall thickness, "
            + "refracted angle")
    public record Material(
            String material,
            WaveMode waveMode,
            @DecimalMin("0") @DecimalMax("95") Double temperatureC,
            @DecimalMin("100") @DecimalMax("20000") Double velocityMPerS,
            @DecimalMin(value = "0", inclusive = false) Double velocityInPerUs,
            @DecimalMin("0") @DecimalMax("4000") Double velocityUncertaintyMPerS,
            @DecimalMin("0") @DecimalMax("20") Double velocityUncertaintyPercent,
            @Lengths.Mm Double thicknessMm,
            @Lengths.In Double thicknessIn,
            @DecimalMin("0") @DecimalMax(value = "90", inclusive = false) Double refractedAngleDeg,
            @DecimalMin("0") Double velocityUncertaintyInPerUs) implements VelocityFields {}

    /** The digitizer's settings. */
    @Schema(name = "SheetDigitization",
            description = "The digitizer: sampling frequency, decimation, "
            + "bit depth and how the signal is quantized")
    public record Digitization(
            @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000") Double samplingFrequencyMhz,
            @Min(1) @Max(65536) Integer decimationFactor,
            @Min(1) @Max(32) Integer bitDepth,
            DigitizedSignal digitizedSignal,
            Quantizer quantizer,
            CodeMapping codeMapping,
            DecimationMode decimationMode,
            SampledSignal signal) {}

    /** The acquisition. */
    @Schema(name = "SheetAcquisition",
            description = "The acquisition: PRF, focal laws or FMC/HMC capture, averaging, scan increment, length and speed, "
            + "gate and longest sound path")
    public record Acquisition(
            @DecimalMin(value = "0", inclusive = false) @DecimalMax("1000000") Double pulseRepetitionFrequencyHz,
            @Min(1) @Max(65536) Integer focalLaws,
            @Min(1) @Max(65536) Integer fmcElementCount,
            CaptureMode capture,
            @Min(1) @Max(65536) Integer averaging,
            @Lengths.Mm Double scanIncrementMm,
            @Lengths.In Double scanIncrementIn,
            @Lengths.Mm Double scanLengthMm,
            @Lengths.In Double scanLengthIn,
            @Lengths.Mm Double plannedScanSpeedMmPerS,
            @Lengths.In Double plannedScanSpeedInPerS,
            @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000") Double gateLengthUs,
            @Lengths.Mm Double gateLengthMm,
            @Lengths.In Double gateLengthIn,
            @Lengths.Mm Double maxSoundPathMm,
            @Lengths.In Double maxSoundPathIn,
            @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000") Double maxRoundTripUs,
            @DecimalMin("1") @DecimalMax("100") Double wraparoundDecayFactor) {}

    /** TOFD set-up. */
    @Schema(name = "SheetTofd",
            description = "TOFD: probe-centre separation and depth of interest")
    public record Tofd(
            @Lengths.Mm Double probeCentreSeparationMm,
            @Lengths.In Double probeCentreSeparationIn,
            @Lengths.Mm Double depthOfInterestMm,
            @Lengths.In Double depthOfInterestIn) {}

    /** TFM image grid. */
    @Schema(name = "SheetTfm",
            description = "TFM: image grid steps, and the aperture and depth of the lateral check")
    public record Tfm(
            @Lengths.Mm Double gridSpacingMm,
            @Lengths.In Double gridSpacingIn,
            @Lengths.Mm Double lateralGridSpacingMm,
            @Lengths.In Double lateralGridSpacingIn,
            @Lengths.Mm Double apertureMm,
            @Lengths.In Double apertureIn,
            @Lengths.Mm Double depthMm,
            @Lengths.In Double depthIn,
            TfmImage image) {}

    /** The evaluation. */
    @Schema(name = "SheetEvaluation",
            description = "Evaluation: reference height, evaluation level, "
            + "amplitude and thickness tolerances")
    public record Evaluation(
            @DecimalMin(value = "0", inclusive = false) @DecimalMax("100") Double referenceHeightPercentFsh,
            @DecimalMin("-80") @DecimalMax("20") Double evaluationLevelDb,
            @DecimalMin(value = "0", inclusive = false) @DecimalMax("40") Double amplitudeToleranceDb,
            @Lengths.Mm Double thicknessToleranceMm,
            @Lengths.In Double thicknessToleranceIn) {}
}
