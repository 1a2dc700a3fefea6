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
        @ArraySchema(arraySchema = @Schema(description = "The recorded amplitudes, equally spaced in time, in any "
                + "unit (volts, %FSH, digitizer codes): 16 to 8192 finite numbers, not all equal. The whole echo "
                + "should lie inside the record"), minItems = WaveformInput.MIN_SAMPLES,
                maxItems = WaveformInput.MAX_SAMPLES,
                schema = @Schema(type = "number", format = "double", example = "0.12"))
        // The count (16 to 8192) is checked by WaveformInput at /samples; a Bean Validation @Size here
        // would be written onto the items' schema as minimum/maximum by the model resolver.
        @NotNull(message = InputMessages.REQUIRED)
        List<Double> samples,

        @Schema(description = "The rate the record was sampled at, MHz (> 0, <= 100000); it should be well above "
                + "the probe's band (the record's energy near its own Nyquist frequency is checked)",
                example = "100")
        @NotNull(message = InputMessages.REQUIRED) @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000")
        Double recordSamplingFrequencyMhz,

        @Schema(description = "How the centre frequency is taken from the measured -6 dB edges: ARITHMETIC "
                + "(fl + fu)/2 or GEOMETRIC sqrt(fl fu); default ARITHMETIC")
        CentreFrequencyConvention centreFrequencyConvention,

        @Schema(description = "The target (raw) sampling frequency to judge the recorded pulse at, MHz (> 0, "
                + "<= 100000); gives the target figures", example = "25")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000")
        Double samplingFrequencyMhz,

        @Schema(description = "The target's decimation factor m (integer 1 to 65536); default 1. Only with "
                + "sampling_frequency_mhz", example = "1")
        @Min(1) @Max(65536)
        Integer decimationFactor,

        @Schema(description = "The target's decimation mode: DROP (amplitude figures at fs/m) or PEAK_PRESERVING "
                + "(at the raw fs); default DROP. Only with sampling_frequency_mhz")
        DecimationMode decimationMode,

        @Schema(description = "How the target's peak is read: ABSOLUTE (largest |sample|) or POSITIVE_PEAK; "
                + "default ABSOLUTE. Only with sampling_frequency_mhz")
        PeakReading peakReading,

        @Schema(description = "Amplitude tolerance, dB (> 0, <= 40); gives the required rates of the record and of "
                + "the model. Only with sampling_frequency_mhz", example = "1")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax("40")
        Double amplitudeToleranceDb) {
}
