package utdigit.web.waveform;

import io.swagger.v3.oas.annotations.media.ArraySchema;
import io.swagger.v3.oas.annotations.media.Schema;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Size;
import java.util.List;
import utdigit.core.pulse.CentreFrequencyConvention;
import utdigit.core.sampling.DecimationMode;
import utdigit.core.sampling.PeakReading;
import utdigit.core.waveform.WaveformInput;
import utdigit.web.json.InputMessages;

/** POST /api/waveform-analyses. */
@Schema(name = "WaveformAnalysisRequest", description = "A recorded pulse (its samples, equally spaced, and the rate "
        + "they were recorded at) and optionally a target digitizer setting to judge on it: sampling_frequency_mhz "
        + "with decimation, peak reading and amplitude tolerance as in the sampling assessment.")
public record WaveformAnalysisRequest(
        @ArraySchema(minItems = WaveformInput.MIN_SAMPLES, maxItems = WaveformInput.MAX_SAMPLES,
                schema = @Schema(type = "number", format = "double", example = "0.12"))
        // The count (16 to 8192) is checked by WaveformInput at /samples; a Bean Validation @Size here
        // would be written onto the items' schema as minimum/maximum by the model resolver.
        @NotNull(message = InputMessages.REQUIRED)
        List<Double> samples,

        @NotNull(message = InputMessages.REQUIRED) @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000")
        Double recordSamplingFrequencyMhz,

        CentreFrequencyConvention centreFrequencyConvention,

        @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000")
        Double samplingFrequencyMhz,

        @Min(1) @Max(65536)
        Integer decimationFactor,

        DecimationMode decimationMode,

        PeakReading peakReading,

        @DecimalMin(value = "0", inclusive = false) @DecimalMax("40")
        Double amplitudeToleranceDb) {
}
