package utdigit.web.dac;

import io.swagger.v3.oas.annotations.media.Schema;
import utdigit.web.pipeline.ToleranceCheck;
import java.util.List;
import java.util.Optional;
import utdigit.web.pipeline.ResultNotes.ReferenceView;
import utdigit.web.pipeline.ResultNotes.WarningView;

/** The answer of POST /api/dac-quantizations. */
@Schema(name = "DacQuantization", description = "What a DAC curve's span costs in amplitude resolution: the lowest "
        + "reference point's quantization error without correction, with TCG before the converter and with TCG "
        + "applied to digitized data. Errors are the worst reading below the true height (negative dB). Fields whose "
        + "optional inputs were not given are omitted; a value that cannot exist is null with a warning.")
record DacQuantizationResponse(
        @Schema(description = "One code step, %FSH", example = "0.0488")
        double lsbPercentFsh,
        @Schema(description = "Lowest reference point without correction, reference_height_percent_fsh x "
                + "10^(-dac_span_db/20), %FSH", example = "5.05")
        double lowestReferenceHeightPercentFsh,
        @Schema(description = "No correction: worst reading below the lowest reference point, dB; null when it can "
                + "read as 0", example = "-0.042", types = {"number", "null"})
        Optional<Double> uncorrectedErrorUnderDb,
        @Schema(description = "TCG before the converter: every reference point digitized at "
                + "reference_height_percent_fsh, worst reading below it, dB", example = "-0.0027",
                types = {"number", "null"})
        Optional<Double> analogTcgErrorUnderDb,
        @Schema(description = "TCG on digitized data: the displayed LSB at the lowest point, grown by dac_span_db, "
                + "%FSH", example = "0.774")
        double digitalTcgLsbPercentFsh,
        @Schema(description = "TCG on digitized data: worst reading below the lowest point displayed at "
                + "reference_height_percent_fsh, dB (the same as without correction: gain after the converter adds "
                + "no resolution); null when it can read as 0", example = "-0.042",
                types = {"number", "null"})
        Optional<Double> digitalTcgErrorUnderDb,
        @Schema(description = "With amplitude_tolerance_db: the lowest height read within it, %FSH", example = "0.225")
        Double minimumHeightPercentFsh,
        @Schema(description = "With amplitude_tolerance_db: the largest span without correction whose lowest point is "
                + "still read within it, dB; null when the highest point itself is not",
                example = "51", types = {"number", "null"})
        Optional<Double> maxUncorrectedSpanDb,
        @Schema(description = "With amplitude_tolerance_db: whether the lowest point is read within it without "
                + "correction")
        Boolean uncorrectedWithinTolerance,
        @Schema(description = "With amplitude_tolerance_db: whether it is read within it with TCG before the converter")
        Boolean analogTcgWithinTolerance,
        @Schema(description = "With amplitude_tolerance_db: whether it is read within it with TCG on digitized data")
        Boolean digitalTcgWithinTolerance,
        @Schema(description = "Each figure compared with a tolerance of the request, the same shape as on every "
                + "endpoint: uncorrected_error_under_db, analog_tcg_error_under_db and digital_tcg_error_under_db at least the "
                + "negative of amplitude_tolerance_db; only with amplitude_tolerance_db")
        List<ToleranceCheck> toleranceChecks,
        @Schema(description = "The normalised request (options filled in); itself a valid request that reproduces "
                + "this answer")
        DacQuantizationRequest inputs,
        List<WarningView> warnings,
        List<ReferenceView> references) {
}
