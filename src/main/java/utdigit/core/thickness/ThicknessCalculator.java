package utdigit.core.thickness;

import java.util.ArrayList;
import java.util.List;
import utdigit.core.common.CalculationException;
import utdigit.core.common.Checks;
import utdigit.core.common.Reference;
import utdigit.core.common.Sources;
import utdigit.core.common.Units;
import utdigit.core.common.Warning;
import utdigit.core.pulse.CentreFrequencyConvention;
import utdigit.core.sampling.DecimationMode;
import utdigit.core.sampling.SampleClock;

/**
 * Thickness resolution and uncertainty (POST /api/thickness-resolutions).
 *
 * <p>The thickness d = v t / (2m) is read from the time t between echoes m round trips apart (m = 1:
 * the first echo from the trigger). One sample of the stored time base dt is a thickness of
 * v dt / (2m). The standard uncertainty combines the velocity's and the sampling's standard
 * uncertainties by JCGM 100:2008 (GUM) eq. 10.
 *
 * <p>Defaults: decimation_factor 1, measurement FIRST_ECHO, echo_spacing 1, coverage_factor 2,
 * velocity uncertainty 0 (with a warning). The timing figures follow the effective rate fs/m
 * whatever the decimation mode, so the mode is not an input.
 */
public final class ThicknessCalculator {
    private ThicknessCalculator() {}

    /** The nominal thickness is below the axial resolution v tau(-6 dB)/2: wall echoes overlap. */
    public static final String THICKNESS_BELOW_AXIAL_RESOLUTION = "THICKNESS_BELOW_AXIAL_RESOLUTION";

    /** Default decimation factor: no decimation. */
    public static final int DEFAULT_DECIMATION_FACTOR = 1;
    /** Default measurement. */
    public static final Measurement DEFAULT_MEASUREMENT = Measurement.FIRST_ECHO;
    /** Default echo spacing: one round trip. */
    public static final int DEFAULT_ECHO_SPACING = 1;
    /** Default coverage factor k (coverage probability not stated). */
    public static final double DEFAULT_COVERAGE_FACTOR = 2.0;
    /** Level of the envelope duration that defines the spatial pulse length, dB. */
    public static final double PULSE_LENGTH_LEVEL_DB = 6.0;
    /** Centre-frequency convention of the pulse model for the pulse length (not an option here). */
    public static final CentreFrequencyConvention PULSE_MODEL_CONVENTION = CentreFrequencyConvention.ARITHMETIC;
    /**
     * Relative margin before "coarser than required" is warned, so that a rate set to exactly
     * {@code required_sampling_frequency_mhz} does not warn by rounding.
     */
    static final double REQUIRED_RESOLUTION_RELATIVE_MARGIN = 1e-12;

    /**
     * Computes the resolution and uncertainty of {@code in}.
     *
     * @throws CalculationException NOT_APPLICABLE (400) for echo_spacing other than 1 with
     *     FIRST_ECHO, for both velocity uncertainties, for frequency_mhz without bandwidth_percent or
     *     the reverse; INVALID_INPUT (400) for a value outside a formula's domain (echo_spacing 0,
     *     non-positive lengths or factors, a negative uncertainty, NaN)
     */
    public static ThicknessResult compute(ThicknessInput in) {
        Measurement measurement = in.measurement() == null ? DEFAULT_MEASUREMENT : in.measurement();
        int echoSpacing = Checks.atLeastOne("echo_spacing",
                in.echoSpacing() == null ? DEFAULT_ECHO_SPACING : in.echoSpacing());
        if (measurement == Measurement.FIRST_ECHO && echoSpacing != 1) {
            throw CalculationException.notApplicable("echo_spacing",
                    "echo_spacing other than 1 applies only to measurement ECHO_TO_ECHO: FIRST_ECHO times one"
                            + " round trip from the trigger");
        }
        int decimationFactor = in.decimationFactor() == null ? DEFAULT_DECIMATION_FACTOR : in.decimationFactor();
        SampleClock clock = SampleClock.of(in.samplingFrequencyMhz(), decimationFactor, DecimationMode.DROP);
        double velocityMPerS = Checks.positive("velocity", in.velocityMPerS());
        double thicknessMm = Checks.positive("nominal_thickness", in.nominalThicknessMm());
        double coverageFactor = in.coverageFactor() == null
                ? DEFAULT_COVERAGE_FACTOR
                : Checks.positive("coverage_factor", in.coverageFactor());
        Double requiredResolutionMm = in.requiredResolutionMm() == null
                ? null
                : Checks.positive("required_resolution", in.requiredResolutionMm());
        checkPulseInputs(in);

        List<Warning> warnings = new ArrayList<>();
        List<Reference> references = new ArrayList<>();
        double velocityUncertaintyMPerS = velocityUncertaintyMPerS(in, velocityMPerS, warnings, references);

        double velocityMmPerUs = Units.mPerSToMmPerUs(velocityMPerS);
        double velocityUncertaintyMmPerUs = Units.mPerSToMmPerUs(velocityUncertaintyMPerS);
        double samplingIntervalUs = clock.samplingIntervalUs();

        double thicknessResolutionMm = velocityMmPerUs * samplingIntervalUs / (2.0 * echoSpacing);
        double roundTripTimeUs = 2.0 * thicknessMm / velocityMmPerUs;
        double samplesAcrossThickness = roundTripTimeUs * clock.effectiveSamplingFrequencyMhz();
        double relativeResolutionPercent = thicknessResolutionMm / thicknessMm * 100.0;
        references.add(Reference.of("thickness resolution", Sources.DEFINITIONS));

        boolean echoToEcho = measurement == Measurement.ECHO_TO_ECHO;
        SampleClock.Timing timing = clock.timing(echoToEcho);
        references.add(Reference.of(echoToEcho ? "timing, echo to echo" : "timing, first echo", timing.source()));
        Uncertainty u = uncertainty(measurement, echoSpacing, coverageFactor, roundTripTimeUs, velocityMmPerUs,
                velocityUncertaintyMmPerUs, timing, warnings, references);

        Double requiredSamplingFrequencyMhz = null;
        if (requiredResolutionMm != null) {
            requiredSamplingFrequencyMhz = requiredSamplingFrequencyMhz(echoSpacing, velocityMmPerUs,
                    requiredResolutionMm, thicknessResolutionMm, clock, warnings, references);
        }
        if (in.frequencyMhz() != null) {
            checkPulseLength(in, thicknessMm, velocityMmPerUs, warnings, references);
        }

        return new ThicknessResult(measurement, echoSpacing, decimationFactor, coverageFactor,
                velocityUncertaintyMPerS, thicknessResolutionMm, Units.mmToIn(thicknessResolutionMm),
                roundTripTimeUs, samplesAcrossThickness, relativeResolutionPercent, timing.standardUncertaintyNs(),
                timing.worstCaseNs(), u.standardMm(), u.expandedMm(), requiredSamplingFrequencyMhz,
                warnings, references);
    }

    /** The combined standard and the expanded uncertainty of the thickness. */
    private record Uncertainty(double standardMm, double expandedMm) {}

    /**
     * JCGM 100:2008 eq. 10 for d = v t / (2m): c_v = t / (2m), c_t = v / (2m), t = m round trips;
     * warns when the (not normal) sampling term dominates.
     */
    private static Uncertainty uncertainty(Measurement measurement, int echoSpacing, double coverageFactor,
            double roundTripTimeUs, double velocityMmPerUs, double velocityUncertaintyMmPerUs,
            SampleClock.Timing timing, List<Warning> warnings, List<Reference> references) {
        double timingStandardUncertaintyNs = timing.standardUncertaintyNs();
        double timingWorstCaseErrorNs = timing.worstCaseNs();
        double measuredTimeUs = echoSpacing * roundTripTimeUs;
        double velocityTermMm = measuredTimeUs / (2.0 * echoSpacing) * velocityUncertaintyMmPerUs;
        double samplingTermMm = velocityMmPerUs / (2.0 * echoSpacing) * (timingStandardUncertaintyNs / 1000.0);
        double standardUncertaintyMm = StrictMath.sqrt(velocityTermMm * velocityTermMm + samplingTermMm * samplingTermMm);
        double expandedUncertaintyMm = coverageFactor * standardUncertaintyMm;
        references.add(Reference.of("combined standard uncertainty", Sources.GUM_PROPAGATION));
        references.add(Reference.of("expanded uncertainty", Sources.GUM_EXPANDED));
        if (samplingTermMm * samplingTermMm > velocityTermMm * velocityTermMm) {
            double worstCaseMm = velocityMmPerUs / (2.0 * echoSpacing) * (timingWorstCaseErrorNs / 1000.0);
            double coveragePercent = 100.0 * samplingAloneCoverageFraction(
                    measurement, coverageFactor, timingStandardUncertaintyNs, timingWorstCaseErrorNs);
            warnings.add(ThicknessMessages.samplingTermDominates(measurement, coverageFactor, coveragePercent,
                    worstCaseMm));
        }
        return new Uncertainty(standardUncertaintyMm, expandedUncertaintyMm);
    }

    /** The raw sampling frequency whose sample is worth the required resolution, warned when not met. */
    private static double requiredSamplingFrequencyMhz(int echoSpacing, double velocityMmPerUs,
            double requiredResolutionMm, double thicknessResolutionMm, SampleClock clock, List<Warning> warnings,
            List<Reference> references) {
        double effectiveRateMhz = velocityMmPerUs / (2.0 * echoSpacing * requiredResolutionMm);
        double requiredSamplingFrequencyMhz = effectiveRateMhz * clock.decimationFactor();
        references.add(Reference.of("required sampling frequency", Sources.DEFINITIONS));
        if (thicknessResolutionMm > requiredResolutionMm * (1.0 + REQUIRED_RESOLUTION_RELATIVE_MARGIN)) {
            warnings.add(ThicknessMessages.resolutionCoarserThanRequired(thicknessResolutionMm,
                    requiredResolutionMm, requiredSamplingFrequencyMhz));
        }
        return requiredSamplingFrequencyMhz;
    }

    /**
     * Probability that the sampling error alone lies within +/- k u_t: for FIRST_ECHO (rectangular,
     * half-width a = dt/2) min(1, k u_t / a); for ECHO_TO_ECHO (triangular, half-width a = dt)
     * 1 - (1 - k u_t / a)^2 when k u_t &lt; a, else 1 (JCGM 100:2008 (GUM) 4.3.7 and 4.3.9 give the
     * distributions; the integrals are elementary).
     */
    static double samplingAloneCoverageFraction(
            Measurement measurement, double coverageFactor, double standardUncertaintyNs, double worstCaseNs) {
        double ratio = coverageFactor * standardUncertaintyNs / worstCaseNs;
        if (ratio >= 1.0) {
            return 1.0;
        }
        return measurement == Measurement.ECHO_TO_ECHO ? 1.0 - (1.0 - ratio) * (1.0 - ratio) : ratio;
    }

    /** The standard uncertainty of the velocity from its one source, m/s; 0 with a warning when none. */
    private static double velocityUncertaintyMPerS(
            ThicknessInput in, double velocityMPerS, List<Warning> warnings, List<Reference> references) {
        if (in.velocityUncertaintyMPerS() != null && in.velocityUncertaintyPercent() != null) {
            throw CalculationException.notApplicable("velocity_uncertainty_percent",
                    "give velocity_uncertainty_m_per_s or velocity_uncertainty_percent, not both");
        }
        double uncertaintyMPerS;
        if (in.velocityUncertaintyMPerS() != null) {
            uncertaintyMPerS = Checks.nonNegative("velocity_uncertainty_m_per_s", in.velocityUncertaintyMPerS());
            references.add(Reference.of("velocity uncertainty", Sources.VELOCITY_UNCERTAINTY));
        } else if (in.velocityUncertaintyPercent() != null) {
            uncertaintyMPerS = Checks.nonNegative("velocity_uncertainty_percent", in.velocityUncertaintyPercent())
                    / 100.0 * velocityMPerS;
            references.add(Reference.of("velocity uncertainty", Sources.VELOCITY_UNCERTAINTY));
        } else {
            uncertaintyMPerS = 0.0;
        }
        if (uncertaintyMPerS == 0.0) {
            warnings.add(ThicknessMessages.velocityUncertaintyZero());
        }
        return uncertaintyMPerS;
    }

    private static void checkPulseInputs(ThicknessInput in) {
        if (in.frequencyMhz() != null && in.bandwidthPercent() == null) {
            throw CalculationException.notApplicable("bandwidth_percent",
                    "bandwidth_percent is required with frequency_mhz for the pulse length");
        }
        if (in.bandwidthPercent() != null && in.frequencyMhz() == null) {
            throw CalculationException.notApplicable("frequency_mhz",
                    "frequency_mhz is required with bandwidth_percent for the pulse length");
        }
        if (in.frequencyMhz() != null) {
            Checks.positive("frequency_mhz", in.frequencyMhz());
            Checks.positive("bandwidth_percent", in.bandwidthPercent());
        }
    }

    /**
     * Warns when the nominal thickness is below the axial resolution v tau(-6 dB) / 2 of the model:
     * successive wall echoes are 2d/v apart, so they overlap (at their -6 dB points) when 2d/v is
     * below tau, that is when d is below v tau / 2, not below v tau.
     */
    private static void checkPulseLength(ThicknessInput in, double thicknessMm, double velocityMmPerUs,
            List<Warning> warnings, List<Reference> references) {
        double durationUs = PULSE_MODEL_CONVENTION
                .pulseModel(in.frequencyMhz(), in.bandwidthPercent() / 100.0)
                .envelopeDurationUs(PULSE_LENGTH_LEVEL_DB);
        double axialResolutionMm = velocityMmPerUs * durationUs / 2.0;
        references.add(Reference.of("wall-echo overlap", Sources.PULSE_LENGTH));
        if (thicknessMm < axialResolutionMm) {
            warnings.add(ThicknessMessages.thicknessBelowAxialResolution(thicknessMm, axialResolutionMm));
        }
    }
}
