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
        double lsbPercentFsh,
        double lowestReferenceHeightPercentFsh,
        Optional<Double> uncorrectedErrorUnderDb,
        Optional<Double> analogTcgErrorUnderDb,
        double digitalTcgLsbPercentFsh,
        Optional<Double> digitalTcgErrorUnderDb,
        Double minimumHeightPercentFsh,
        Optional<Double> maxUncorrectedSpanDb,
        Boolean uncorrectedWithinTolerance,
        Boolean analogTcgWithinTolerance,
        Boolean digitalTcgWithinTolerance,
        List<ToleranceCheck> toleranceChecks,
        DacQuantizationRequest inputs,
        List<WarningView> warnings,
        List<ReferenceView> references) {
}
