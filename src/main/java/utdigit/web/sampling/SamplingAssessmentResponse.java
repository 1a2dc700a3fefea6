package utdigit.web.sampling;

import io.swagger.v3.oas.annotations.media.Schema;
import java.util.List;
import java.util.Optional;
import utdigit.web.pipeline.ResultNotes.ReferenceView;
import utdigit.web.pipeline.ToleranceCheck;
import utdigit.web.pipeline.ResultNotes.WarningView;
import utdigit.web.units.Mirrors;
import utdigit.web.units.VelocitySourceView;

/** The answer of POST /api/sampling-assessments. */
@Schema(name = "SamplingAssessment", description = "Sampling adequacy of a digitizer setting for a probe. Losses are "
        + "positive numbers of dB. The spectral level at Nyquist and the energy above Nyquist are model values of the "
        + "Gaussian pulse model, optimistic for real probes (ringing, noise): the instrument's anti-alias filter "
        + "decides what aliases. The TFM figures are a derived model: the code's own amplitude-fidelity check on a "
        + "reference reflector governs. Fields whose optional inputs were not given are omitted; a value that cannot "
        + "exist is null with a warning.")
record SamplingAssessmentResponse(
        double effectiveSamplingFrequencyMhz,

        double samplingIntervalNs,

        double samplesPerPeriod,

        Double samplesPerPeriodUpper,

        double nyquistFrequencyMhz,

        Double spectralLevelAtNyquistDb,

        Double energyAboveNyquistFraction,

        Optional<Double> sineAmplitudeLossDb,

        Optional<Double> pulseAmplitudeLossDb,

        double timingErrorNs,

        double timingStandardUncertaintyNs,

        Double requiredSamplesPerPeriod,

        Double requiredSamplingFrequencyMhz,

        Optional<Double> requiredSamplingFrequencyPulseMhz,

        Optional<Double> tfmGridAmplitudeLossDb,

        Double tfmMaxGridSpacingMm,

        Double tfmLateralAmplitudeLossDb,

        List<ToleranceCheck> toleranceChecks,

        SamplingAssessmentRequest inputs,

        VelocitySourceView velocitySource,

        List<WarningView> warnings,
        List<ReferenceView> references,
        InInches inInches) {

    /** Inch mirrors of the length results, each the mm result / 25.4. */
    @Schema(name = "SamplingAssessmentInInches", description = "Inch mirrors of the length "
            + "results (the inch is 25.4 mm exactly)")
    record InInches(
            Double tfmMaxGridSpacingIn) {

        /** The mirrors, or null (omitted) when the answer has no length result. */
        static InInches of(Double tfmMaxGridSpacingIn) {
            return Mirrors.orNone(new InInches(tfmMaxGridSpacingIn));
        }
    }
}
