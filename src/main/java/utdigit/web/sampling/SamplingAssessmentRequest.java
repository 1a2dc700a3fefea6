package utdigit.web.sampling;

import io.swagger.v3.oas.annotations.media.Schema;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotNull;
import utdigit.core.materials.WaveMode;
import utdigit.core.pulse.CentreFrequencyConvention;
import utdigit.core.sampling.DecimationMode;
import utdigit.core.sampling.PeakReading;
import utdigit.core.sampling.SampledSignal;
import utdigit.core.sampling.TfmImage;
import utdigit.web.json.InputMessages;
import utdigit.web.units.Lengths;
import utdigit.web.units.VelocityFields;

/** POST /api/sampling-assessments. */
@Schema(name = "SamplingAssessmentRequest", description = "A digitizer's sampling frequency and a probe's nominal "
        + "frequency, with optional decimation, bandwidth, amplitude tolerance and TFM grid. Each length once: _mm or "
        + "_in. A velocity (once: velocity_m_per_s, velocity_in_per_us or material + wave_mode, + temperature_c for "
        + "water) only with the TFM grid figures.")
public record SamplingAssessmentRequest(
        @NotNull(message = InputMessages.REQUIRED) @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000")
        Double samplingFrequencyMhz,

        @NotNull(message = InputMessages.REQUIRED) @DecimalMin(value = "0", inclusive = false) @DecimalMax("1000")
        Double frequencyMhz,

        @Min(1) @Max(65536)
        Integer decimationFactor,

        DecimationMode decimationMode,

        @DecimalMin(value = "0", inclusive = false) @DecimalMax(value = "200", inclusive = false)
        Double bandwidthPercent,

        CentreFrequencyConvention centreFrequencyConvention,

        SampledSignal signal,

        PeakReading peakReading,

        @DecimalMin(value = "0", inclusive = false) @DecimalMax("40")
        Double amplitudeToleranceDb,

        @Lengths.Mm
        Double tfmGridSpacingMm,

        @Lengths.In
        Double tfmGridSpacingIn,

        @VelocityFields.MPerS Double velocityMPerS,
        @VelocityFields.InPerUs Double velocityInPerUs,
        @VelocityFields.MaterialId String material,
        @VelocityFields.Mode WaveMode waveMode,
        @VelocityFields.TemperatureC Double temperatureC,

        TfmImage tfmImage,

        @Lengths.Mm
        Double tfmLateralGridSpacingMm,

        @Lengths.In
        Double tfmLateralGridSpacingIn,

        @Lengths.Mm
        Double tfmApertureMm,

        @Lengths.In
        Double tfmApertureIn,

        @Lengths.Mm
        Double tfmDepthMm,

        @Lengths.In
        Double tfmDepthIn) implements VelocityFields {
}
