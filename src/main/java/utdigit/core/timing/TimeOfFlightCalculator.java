package utdigit.core.timing;

import java.util.ArrayList;
import java.util.List;
import utdigit.core.common.CalculationException;
import utdigit.core.common.Checks;
import utdigit.core.common.Reference;
import utdigit.core.common.Sources;
import utdigit.core.common.Units;
import utdigit.core.common.Warning;
import utdigit.core.pulse.CentreFrequencyConvention;
import utdigit.core.pulse.GaussianPulse;
import utdigit.core.sampling.DecimationMode;
import utdigit.core.sampling.SampleClock;

/**
 * Time-of-flight resolution (POST /api/time-of-flight-resolutions): what one sample of the stored
 * time base is worth in time and in millimetres of sound path, depth and surface distance, and for
 * TOFD the geometry of {@link TofdGeometry} at the caller's depth and thickness.
 *
 * <p>Defaults: decimation_factor 1, technique PULSE_ECHO, time_reference TRIGGER. The timing
 * figures follow the effective rate fs/m whatever the decimation mode, so the mode is not an input.
 */
public final class TimeOfFlightCalculator {
    private TimeOfFlightCalculator() {}

    /** Default decimation factor: no decimation. */
    public static final int DEFAULT_DECIMATION_FACTOR = 1;
    /** Default technique. */
    public static final Technique DEFAULT_TECHNIQUE = Technique.PULSE_ECHO;
    /** Default time reference. */
    public static final TimeReference DEFAULT_TIME_REFERENCE = TimeReference.TRIGGER;
    /** Level of the envelope duration taken as the TOFD pulse duration from frequency and bandwidth, dB. */
    public static final double TOFD_PULSE_DURATION_LEVEL_DB = 20.0;
    /** Centre-frequency convention of the pulse model for the TOFD pulse duration (not an option here). */
    public static final CentreFrequencyConvention PULSE_MODEL_CONVENTION = CentreFrequencyConvention.ARITHMETIC;

    /**
     * Computes the resolution of {@code in}.
     *
     * @throws CalculationException NOT_APPLICABLE (400) for an input that does not belong to the
     *     technique, for TOFD without probe_centre_separation, for two pulse-duration sources or an
     *     incomplete one; INVALID_INPUT (400) for a value outside a formula's domain (angle of 90 deg
     *     or more, non-positive lengths, NaN); IMPOSSIBLE_COMBINATION (422) for a depth below the
     *     thickness
     */
    public static TimeOfFlightResult compute(TimeOfFlightInput in) {
        Technique technique = in.technique() == null ? DEFAULT_TECHNIQUE : in.technique();
        TimeReference timeReference = in.timeReference() == null ? DEFAULT_TIME_REFERENCE : in.timeReference();
        int decimationFactor = in.decimationFactor() == null ? DEFAULT_DECIMATION_FACTOR : in.decimationFactor();
        SampleClock clock = SampleClock.of(in.samplingFrequencyMhz(), decimationFactor, DecimationMode.DROP);
        double velocityMmPerUs = Units.mPerSToMmPerUs(Checks.positive("velocity", in.velocityMPerS()));

        checkApplicable(in, technique, timeReference);

        List<Warning> warnings = new ArrayList<>();
        List<Reference> references = new ArrayList<>();
        references.add(Reference.of("time resolution", Sources.DEFINITIONS));

        boolean fromLateralWave = timeReference == TimeReference.LATERAL_WAVE;
        SampleClock.Timing timing = clock.timing(fromLateralWave);
        double timingErrorNs = timing.worstCaseNs();
        double timingStandardUncertaintyNs = timing.standardUncertaintyNs();
        references.add(Reference.of(fromLateralWave ? "timing from the lateral wave" : "timing from the trigger",
                timing.source()));

        double samplingIntervalUs = clock.samplingIntervalUs();
        double soundPathResolutionMm = soundPathResolutionMm(technique, velocityMmPerUs, samplingIntervalUs);
        Geometry g = switch (technique) {
            case PULSE_ECHO -> pulseEcho(in, soundPathResolutionMm, references);
            case THROUGH_TRANSMISSION -> {
                references.add(Reference.of("sound path per sample, through-transmission", Sources.DEFINITIONS));
                yield Geometry.NONE;
            }
            case TOFD -> tofd(in, velocityMmPerUs, samplingIntervalUs, warnings, references);
        };

        return new TimeOfFlightResult(technique, timeReference, decimationFactor,
                clock.samplingIntervalNs(), timingErrorNs, timingStandardUncertaintyNs, soundPathResolutionMm,
                g.depthResolutionMm(), g.surfaceDistanceResolutionMm(), g.lateralWaveTimeUs(), g.timeOfFlightUs(),
                g.pulseLimitedDepthResolutionMm(), g.deadZoneDepthMm(), g.backwallDeadZoneMm(),
                g.pulseDurationUsedUs(), warnings, references);
    }

    /** The figures of the technique's geometry; null where the technique or its inputs give none. */
    private record Geometry(Double depthResolutionMm, Double surfaceDistanceResolutionMm, Double lateralWaveTimeUs,
            Double timeOfFlightUs, Double pulseLimitedDepthResolutionMm, Double deadZoneDepthMm,
            Double backwallDeadZoneMm, Double pulseDurationUsedUs) {
        static final Geometry NONE = new Geometry(null, null, null, null, null, null, null, null);
    }

    /** Pulse-echo: with a refracted angle, the depth and surface distance of one sample's sound path. */
    private static Geometry pulseEcho(TimeOfFlightInput in, double soundPathResolutionMm,
            List<Reference> references) {
        references.add(Reference.of("sound path per sample, pulse-echo", Sources.DEFINITIONS));
        if (in.refractedAngleDeg() == null) {
            return Geometry.NONE;
        }
        double angleDeg = Checks.inRangeHalfOpen("refracted_angle_deg", in.refractedAngleDeg(), 0.0, 90.0);
        double angleRad = StrictMath.toRadians(angleDeg);
        double depthResolutionMm = soundPathResolutionMm * StrictMath.cos(angleRad);
        double surfaceDistanceResolutionMm = soundPathResolutionMm * StrictMath.sin(angleRad);
        references.add(Reference.of("angle beam", Sources.DEFINITIONS));
        return new Geometry(depthResolutionMm, surfaceDistanceResolutionMm, null, null, null, null, null, null);
    }

    /** TOFD: the lateral wave, and at a depth its time and depth step; with a pulse duration the dead zones. */
    private static Geometry tofd(TimeOfFlightInput in, double velocityMmPerUs, double samplingIntervalUs,
            List<Warning> warnings, List<Reference> references) {
        references.add(Reference.of("sound path per sample, TOFD", Sources.DEFINITIONS));
        double halfSeparationMm = Checks.positive("probe_centre_separation", in.probeCentreSeparationMm()) / 2.0;
        Double depthMm = in.depthMm() == null ? null : Checks.positive("depth", in.depthMm());
        Double thicknessMm = in.thicknessMm() == null ? null : Checks.positive("thickness", in.thicknessMm());
        if (depthMm != null && thicknessMm != null && depthMm > thicknessMm) {
            throw TimingMessages.depthBelowThickness(depthMm, thicknessMm);
        }
        Double pulseDurationUsedUs = pulseDurationUs(in, references);

        double lateralWaveTimeUs = TofdGeometry.lateralWaveTimeUs(halfSeparationMm, velocityMmPerUs);
        references.add(Reference.of("TOFD geometry", Sources.TOFD_GEOMETRY));
        references.add(Reference.of("flaw off the centre line", Sources.TOFD_GEOMETRY));

        Double timeOfFlightUs = null;
        Double depthResolutionMm = null;
        if (depthMm != null) {
            timeOfFlightUs = TofdGeometry.timeOfFlightUs(halfSeparationMm, depthMm, velocityMmPerUs);
            depthResolutionMm = TofdGeometry.depthStepMm(
                    halfSeparationMm, depthMm, samplingIntervalUs, velocityMmPerUs);
            references.add(Reference.of("TOFD depth step per sample", Sources.TOFD_GEOMETRY));
            double ratio = TofdGeometry.depthPerHalfSeparationRatio(halfSeparationMm, depthMm);
            references.add(Reference.of(TimingMessages.separationErrorTopic(ratio), Sources.TOFD_GEOMETRY));
        }
        Double pulseLimitedDepthResolutionMm = null;
        Double deadZoneDepthMm = null;
        Double backwallDeadZoneMm = null;
        if (pulseDurationUsedUs != null) {
            deadZoneDepthMm = TofdGeometry.deadZoneDepthMm(halfSeparationMm, pulseDurationUsedUs, velocityMmPerUs);
            references.add(Reference.of("TOFD near-surface dead zone", Sources.TOFD_GEOMETRY));
            if (depthMm != null) {
                pulseLimitedDepthResolutionMm = TofdGeometry.pulseLimitedDepthResolutionMm(
                        halfSeparationMm, depthMm, pulseDurationUsedUs, velocityMmPerUs);
                references.add(Reference.of("TOFD pulse-limited depth resolution", Sources.TOFD_GEOMETRY));
                if (depthMm < deadZoneDepthMm) {
                    warnings.add(TimingMessages.depthInDeadZone(depthMm, deadZoneDepthMm));
                }
            }
            if (thicknessMm != null) {
                backwallDeadZoneMm = backwallDeadZone(halfSeparationMm, thicknessMm, depthMm,
                        pulseDurationUsedUs, velocityMmPerUs, deadZoneDepthMm, warnings, references);
            }
        }
        return new Geometry(depthResolutionMm, null, lateralWaveTimeUs, timeOfFlightUs,
                pulseLimitedDepthResolutionMm, deadZoneDepthMm, backwallDeadZoneMm, pulseDurationUsedUs);
    }

    /**
     * Sound path of one sample, mm: v dt / 2 for pulse-echo (one way of a round trip), v dt for
     * through-transmission (one way) and for TOFD (both legs together) (definitions).
     */
    public static double soundPathResolutionMm(Technique technique, double velocityMmPerUs, double samplingIntervalUs) {
        double pathMm = velocityMmPerUs * samplingIntervalUs;
        return technique == Technique.PULSE_ECHO ? pathMm / 2.0 : pathMm;
    }

    private static Double backwallDeadZone(double halfSeparationMm, double thicknessMm, Double depthMm,
            double pulseDurationUs, double velocityMmPerUs, double deadZoneDepthMm,
            List<Warning> warnings, List<Reference> references) {
        double zoneMm = TofdGeometry.backwallDeadZoneMm(halfSeparationMm, thicknessMm, pulseDurationUs, velocityMmPerUs);
        references.add(Reference.of("TOFD back-wall dead zone", Sources.TOFD_GEOMETRY));
        if (TofdGeometry.backwallPulseReachesLateralWave(halfSeparationMm, thicknessMm, pulseDurationUs, velocityMmPerUs)) {
            warnings.add(TimingMessages.wholeThicknessDead(thicknessMm));
            return zoneMm;
        }
        if (deadZoneDepthMm + zoneMm >= thicknessMm) {
            warnings.add(TimingMessages.deadZonesCoverThickness(deadZoneDepthMm, zoneMm, thicknessMm));
        } else if (depthMm != null && depthMm > thicknessMm - zoneMm) {
            warnings.add(TimingMessages.depthInBackwallDeadZone(depthMm, zoneMm));
        }
        return zoneMm;
    }

    /** The TOFD pulse duration from its one source, or null when none is given. */
    private static Double pulseDurationUs(TimeOfFlightInput in, List<Reference> references) {
        if (in.pulseDurationUs() != null) {
            references.add(Reference.of("TOFD pulse duration, as given", Sources.DEFINITIONS));
            return Checks.positive("pulse_duration_us", in.pulseDurationUs());
        }
        if (in.frequencyMhz() == null) {
            return null;
        }
        double frequencyMhz = Checks.positive("frequency_mhz", in.frequencyMhz());
        double bandwidthFraction = Checks.positive("bandwidth_percent", in.bandwidthPercent()) / 100.0;
        GaussianPulse pulse = PULSE_MODEL_CONVENTION.pulseModel(frequencyMhz, bandwidthFraction);
        references.add(Reference.of("TOFD pulse duration, -20 dB envelope of the pulse model", Sources.GAUSSIAN_MODEL));
        return pulse.envelopeDurationUs(TOFD_PULSE_DURATION_LEVEL_DB);
    }

    /** Inputs that do not belong to the chosen technique, and TOFD's required and paired inputs. */
    private static void checkApplicable(TimeOfFlightInput in, Technique technique, TimeReference timeReference) {
        if (technique != Technique.TOFD) {
            onlyTofd("probe_centre_separation", in.probeCentreSeparationMm(), technique);
            onlyTofd("depth", in.depthMm(), technique);
            onlyTofd("thickness", in.thicknessMm(), technique);
            onlyTofd("pulse_duration_us", in.pulseDurationUs(), technique);
            onlyTofd("frequency_mhz", in.frequencyMhz(), technique);
            onlyTofd("bandwidth_percent", in.bandwidthPercent(), technique);
            if (timeReference == TimeReference.LATERAL_WAVE) {
                throw CalculationException.notApplicable("time_reference",
                        "time_reference LATERAL_WAVE applies only to technique TOFD (here " + technique + ")");
            }
        }
        if (technique != Technique.PULSE_ECHO && in.refractedAngleDeg() != null) {
            throw CalculationException.notApplicable("refracted_angle_deg",
                    "refracted_angle_deg applies only to technique PULSE_ECHO (here " + technique + ")"
                            + (technique == Technique.TOFD ? "; the TOFD geometry comes from probe_centre_separation" : ""));
        }
        if (technique == Technique.TOFD) {
            if (in.probeCentreSeparationMm() == null) {
                throw CalculationException.notApplicable("probe_centre_separation",
                        "probe_centre_separation is required for TOFD");
            }
            if (in.pulseDurationUs() != null && (in.frequencyMhz() != null || in.bandwidthPercent() != null)) {
                throw CalculationException.notApplicable("pulse_duration_us",
                        "give the pulse duration by pulse_duration_us or by frequency_mhz with bandwidth_percent,"
                                + " not both");
            }
            if (in.frequencyMhz() != null && in.bandwidthPercent() == null) {
                throw CalculationException.notApplicable("bandwidth_percent",
                        "bandwidth_percent is required with frequency_mhz for the TOFD pulse duration");
            }
            if (in.bandwidthPercent() != null && in.frequencyMhz() == null) {
                throw CalculationException.notApplicable("frequency_mhz",
                        "frequency_mhz is required with bandwidth_percent for the TOFD pulse duration");
            }
        }
    }

    private static void onlyTofd(String field, Double value, Technique technique) {
        if (value != null) {
            throw CalculationException.notApplicable(field,
                    field + " applies only to technique TOFD (here " + technique + ")");
        }
    }
}
