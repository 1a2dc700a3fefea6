package utdigit.web.sampling;

import io.swagger.v3.oas.annotations.media.Schema;
import java.util.List;
import java.util.Optional;
import utdigit.web.pipeline.ResultNotes.ReferenceView;
import utdigit.web.pipeline.ToleranceCheck;
import utdigit.web.pipeline.ResultNotes.WarningView;
import utdigit.web.units.VelocitySourceView;

/** The answer of POST /api/sampling-assessments. */
@Schema(name = "SamplingAssessment", description = "Sampling adequacy of a digitizer setting for a probe. Losses are "
        + "positive numbers of dB. The spectral level at Nyquist and the energy above Nyquist are model values of the "
        + "Gaussian pulse model, optimistic for real probes (ringing, noise): the instrument's anti-alias filter "
        + "decides what aliases. The TFM figures are a derived model: the code's own amplitude-fidelity check on a "
        + "reference reflector governs. Fields whose optional inputs were not given are omitted; a value that cannot "
        + "exist is null with a warning.")
record SamplingAssessmentResponse(
        @Schema(description = "Stored sampling frequency fs/m, MHz", example = "25")
        double effectiveSamplingFrequencyMhz,

        @Schema(description = "Sampling interval of the stored samples dt = m/fs, ns", example = "40")
        double samplingIntervalNs,

        @Schema(description = "Samples per period at the nominal frequency, (fs/m)/f", example = "5")
        double samplesPerPeriod,

        @Schema(description = "Samples per period at the upper -6 dB band edge, (fs/m)/fu; only with "
                + "bandwidth_percent", example = "3.846")
        Double samplesPerPeriodUpper,

        @Schema(description = "Nyquist frequency, half the rate that decides amplitude (fs/m for DROP, fs for "
                + "PEAK_PRESERVING), MHz", example = "12.5")
        double nyquistFrequencyMhz,

        @Schema(description = "Model value: the Gaussian pulse model's spectral level at the Nyquist frequency, "
                + "-6 ((fs/2 - fc)/(bw fc/2))^2 dB; with signal ENVELOPE the detected envelope's spectrum, centred at "
                + "0 Hz: -6 ((fs/2)/(bw fc/2))^2 dB; optimistic for real probes, the instrument's anti-alias filter "
                + "decides what aliases; a level below -200 dB is reported as -200 (the model means nothing there); "
                + "only with bandwidth_percent", example = "-150")
        Double spectralLevelAtNyquistDb,

        @Schema(description = "Model value: the fraction (0 to 1) of the Gaussian pulse model's energy above the "
                + "Nyquist frequency; with signal ENVELOPE of the detected envelope's energy at |f| above it (both "
                + "tails of its spectrum about 0 Hz); optimistic for real probes, the instrument's anti-alias filter "
                + "decides what aliases; a fraction below 1e-20 is reported as 1e-20 (the model means nothing there); "
                + "only with bandwidth_percent", example = "4.7e-17")
        Double energyAboveNyquistFraction,

        @Schema(description = "Classic sine bound: a peak sampled n times per period (at the rate that decides "
                + "amplitude) is read low by at most -20 log10(cos(pi/n)) dB; null for n <= 2 and for signal "
                + "ENVELOPE", example = "1.8408", types = {"number", "null"})
        Optional<Double> sineAmplitudeLossDb,

        @Schema(description = "Worst case over the sampling phase of the Gaussian pulse model's sampled peak, dB (RF "
                + "read as peak_reading says, or the sampled envelope); a model value; null for RF at 2 or fewer "
                + "samples per carrier period; only with bandwidth_percent", example = "1.9525",
                types = {"number", "null"})
        Optional<Double> pulseAmplitudeLossDb,

        @Schema(description = "Worst-case error of an instant read at a sample, dt/2, ns", example = "20")
        double timingErrorNs,

        @Schema(description = "Standard uncertainty of an instant read at a sample, dt/sqrt(12) (rectangular, GUM "
                + "4.3.7), ns", example = "11.547")
        double timingStandardUncertaintyNs,

        @Schema(description = "Samples per period for the sine bound to stay within amplitude_tolerance_db, "
                + "pi/arccos(10^(-X/20)) (continuous); only with amplitude_tolerance_db",
                example = "6.674")
        Double requiredSamplesPerPeriod,

        @Schema(description = "The raw sampling frequency to set (same decimation) for the sine bound at the "
                + "nominal frequency to stay within amplitude_tolerance_db, MHz; only with amplitude_tolerance_db",
                example = "33.37")
        Double requiredSamplingFrequencyMhz,

        @Schema(description = "The raw sampling frequency to set (same decimation) above which every rate keeps "
                + "pulse_amplitude_loss_db within amplitude_tolerance_db, MHz (the pulse loss is not monotonic for "
                + "narrow bands: a warning says when slower rates also pass); solved to 1e-6 relative; null with a "
                + "warning when the search reaches its work bound or no finite rate meets the tolerance; only with "
                + "amplitude_tolerance_db and bandwidth_percent (at least 1 % for signal RF)",
                example = "34.2", types = {"number", "null"})
        Optional<Double> requiredSamplingFrequencyPulseMhz,

        @Schema(description = "Derived model (the code's own amplitude-fidelity check on a reference reflector "
                + "governs): worst-case loss of the TFM depth step, dB; RF image -20 log10(cos(2 pi dz/lambda)) plus, "
                + "with bandwidth_percent, 6 (dz/w)^2; ENVELOPE image 6 (dz/w)^2; null for an RF image with "
                + "dz >= lambda/4; only with tfm_grid_spacing", example = "1.285",
                types = {"number", "null"})
        Optional<Double> tfmGridAmplitudeLossDb,

        @Schema(description = "Derived model (the code's own amplitude-fidelity check on a reference reflector "
                + "governs): the largest TFM depth step within amplitude_tolerance_db, mm; only with "
                + "tfm_grid_spacing and amplitude_tolerance_db", example = "0.0887")
        Double tfmMaxGridSpacingMm,

        @Schema(description = "Derived model (the code's own amplitude-fidelity check on a reference reflector "
                + "governs): worst-case loss of the TFM lateral step, 6 (dx/w_lat)^2 with the paraxial -6 dB width "
                + "w_lat = 0.8845 lambda z/A, dB; only with tfm_lateral_grid_spacing, tfm_aperture and tfm_depth",
                example = "0.35")
        Double tfmLateralAmplitudeLossDb,

        @Schema(description = "Each figure compared with a tolerance or requirement of the request: "
                + "sine_amplitude_loss_db, pulse_amplitude_loss_db, tfm_grid_amplitude_loss_db and "
                + "tfm_lateral_amplitude_loss_db at most amplitude_tolerance_db; only with amplitude_tolerance_db")
        List<ToleranceCheck> toleranceChecks,

        @Schema(description = "The normalised request (lengths in mm, velocity in m/s), with every default that has "
                + "an effect; itself a valid request that reproduces this answer")
        SamplingAssessmentRequest inputs,

        @Schema(description = "The velocity used; only when a velocity was given (TFM grid figures)")
        VelocitySourceView velocitySource,

        List<WarningView> warnings,
        List<ReferenceView> references,
        @Schema(description = "Inch mirrors of the length results: each x_mm result as x_in = x_mm / 25.4 (the "
                + "inch is 25.4 mm exactly), a speed x_mm_per_s as x_in_per_s; each present when its mm field is, "
                + "null when it is null; omitted when the answer has no length result")
        InInches inInches) {

    /** Inch mirrors of the length results, each the mm result / 25.4. */
    @Schema(name = "SamplingAssessmentInInches", description = "Inch mirrors of the length "
            + "results (the inch is 25.4 mm exactly)")
    record InInches(
            @Schema(description = "tfm_max_grid_spacing_mm / 25.4, in", format = "double")
            Double tfmMaxGridSpacingIn) {

        /** The mirrors, or null (omitted) when the answer has no length result. */
        static InInches of(Double tfmMaxGridSpacingIn) {
            return tfmMaxGridSpacingIn == null ? null
                    : new InInches(tfmMaxGridSpacingIn);
        }
    }
}
