package utdigit.core.timing;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import utdigit.core.common.CalculationException;
import utdigit.core.common.Checks;
import utdigit.core.common.Reference;
import utdigit.core.common.Sources;
import utdigit.core.common.Units;
import utdigit.core.common.Warning;
import utdigit.core.sampling.DecimationMode;
import utdigit.core.sampling.SampleClock;

/**
 * TOFD set-up check (POST /api/tofd-setups): the lateral-wave and back-wall arrival times, whether a
 * gate opens before the lateral wave and closes after the back wall with a margin, the depth of a
 * measured tip time, and the depth uncertainty from the sampling and from the probe separation,
 * combined by the law of propagation of uncertainty (JCGM 100:2008, eq. 10). The geometry's formulas
 * are those of {@link TofdGeometry}; this class adds only the sensitivity to time.
 */
public final class TofdSetupCalculator {
    private TofdSetupCalculator() {}

    public static final String NO_GATE_MARGIN = "NO_GATE_MARGIN";
    public static final String GATE_MISSES_WALL = "GATE_MISSES_WALL";
    public static final String TIP_AT_SURFACE = "TIP_AT_SURFACE";
    public static final String DEPTH_UNCERTAINTY_PARTIAL = "DEPTH_UNCERTAINTY_PARTIAL";
    public static final double DEFAULT_COVERAGE_FACTOR = 2.0;

    /**
     * @throws CalculationException notApplicable (400) for half a gate, for both depth and measured
     *     time, for a time reference or decimation without a sampling frequency; impossible (422) for
     *     a gate closing before it opens, a depth below the back wall or a measured time before the
     *     lateral wave or after the back wall
     */
    public static TofdSetupResult compute(TofdSetupInput in) {
        Objects.requireNonNull(in, "input");
        double velocityMmPerUs = Units.mPerSToMmPerUs(Checks.positive("velocity", in.velocityMPerS()));
        double halfSeparationMm = Checks.positive("probe_centre_separation", in.probeCentreSeparationMm()) / 2.0;
        double thicknessMm = Checks.positive("thickness", in.thicknessMm());
        checkApplicable(in);
        TimeReference reference = in.timeReference() == null ? TimeReference.TRIGGER : in.timeReference();
        double k = in.coverageFactor() == null ? DEFAULT_COVERAGE_FACTOR
                : Checks.positive("coverage_factor", in.coverageFactor());

        List<Warning> warnings = new ArrayList<>();
        List<Reference> references = new ArrayList<>();
        double lateralUs = TofdGeometry.lateralWaveTimeUs(halfSeparationMm, velocityMmPerUs);
        double backwallUs = TofdGeometry.timeOfFlightUs(halfSeparationMm, thicknessMm, velocityMmPerUs);
        references.add(Reference.of("TOFD arrival times", Sources.TOFD_GEOMETRY));

        double marginUs = in.pulseDurationUs() == null ? 0.0 : Checks.positive("pulse_duration_us", in.pulseDurationUs());
        double requiredStartUs = lateralUs - marginUs;
        double requiredEndUs = backwallUs + marginUs;
        GateCheck gate = GateCheck.NONE;
        if (in.gateStartUs() != null) {
            gate = gateCheck(in, lateralUs, backwallUs, marginUs, requiredStartUs, requiredEndUs, warnings,
                    references);
        }
        Tip tip = tip(in, halfSeparationMm, thicknessMm, velocityMmPerUs, lateralUs, backwallUs);
        Double timingUncertaintyNs = timingUncertaintyNs(in, reference, references);
        Double separationUncertaintyMm = in.probeCentreSeparationUncertaintyMm() == null ? null
                : Checks.nonNegative("probe_centre_separation_uncertainty", in.probeCentreSeparationUncertaintyMm());
        DepthUncertainty u = DepthUncertainty.NONE;
        boolean atDepth = !Double.isNaN(tip.depthMm());
        if (atDepth && (timingUncertaintyNs != null || separationUncertaintyMm != null)) {
            u = depthUncertainty(halfSeparationMm, velocityMmPerUs, tip, timingUncertaintyNs,
                    separationUncertaintyMm, k, warnings, references);
        }
        return new TofdSetupResult(reference, k, lateralUs, backwallUs, marginUs, requiredStartUs, requiredEndUs,
                gate.startMarginUs(), gate.endMarginUs(), gate.spans(), tip.depthFromTimeMm(), tip.timeOfFlightUs(),
                timingUncertaintyNs, u.timing(), u.separation(), u.combined(), u.expanded(), warnings, references);
    }

    /** The inputs that go together or apply only with another (all 400). */
    private static void checkApplicable(TofdSetupInput in) {
        if ((in.gateStartUs() == null) != (in.gateEndUs() == null)) {
            throw CalculationException.notApplicable(in.gateStartUs() == null ? "gate_start_us" : "gate_end_us",
                    "give the gate whole: gate_start_us and gate_end_us together");
        }
        if (in.depthMm() != null && in.measuredTimeUs() != null) {
            throw CalculationException.notApplicable("measured_time_us",
                    "give depth or measured_time_us for the depth uncertainty, not both");
        }
        if (in.samplingFrequencyMhz() == null) {
            if (in.timeReference() != null) {
                throw CalculationException.notApplicable("time_reference",
                        "time_reference applies only with sampling_frequency_mhz");
            }
            if (in.decimationFactor() != null) {
                throw CalculationException.notApplicable("decimation_factor",
                        "decimation_factor applies only with sampling_frequency_mhz");
            }
        }
    }

    /** The gate's margins before the lateral wave and after the back wall, and whether it spans the wall. */
    private record GateCheck(Double startMarginUs, Double endMarginUs, Boolean spans) {
        static final GateCheck NONE = new GateCheck(null, null, null);
    }

    private static GateCheck gateCheck(TofdSetupInput in, double lateralUs, double backwallUs, double marginUs,
            double requiredStartUs, double requiredEndUs, List<Warning> warnings, List<Reference> references) {
        double startUs = Checks.nonNegative("gate_start_us", in.gateStartUs());
        double endUs = Checks.nonNegative("gate_end_us", in.gateEndUs());
        if (!(endUs > startUs)) {
            throw TimingMessages.gateEndsBeforeStart(startUs, endUs);
        }
        double startMargin = lateralUs - startUs;
        double endMargin = endUs - backwallUs;
        boolean spans = startMargin >= marginUs && endMargin >= marginUs;
        references.add(Reference.of("TOFD gate", Sources.TOFD_GATE));
        if (in.pulseDurationUs() == null) {
            warnings.add(TimingMessages.noGateMargin());
        }
        if (!spans) {
            warnings.add(TimingMessages.gateMissesWall(startUs, endUs, lateralUs, backwallUs, marginUs,
                    requiredStartUs, requiredEndUs));
        }
        return new GateCheck(startMargin, endMargin, spans);
    }

    /**
     * The tip the uncertainty is taken at: from a measured time (its depth) or from a depth (its
     * time); NaN depth and time when neither is given.
     */
    private record Tip(double depthMm, double timeUs, Double depthFromTimeMm, Double timeOfFlightUs) {}

    private static Tip tip(TofdSetupInput in, double halfSeparationMm, double thicknessMm, double velocityMmPerUs,
            double lateralUs, double backwallUs) {
        if (in.measuredTimeUs() != null) {
            double timeUs = Checks.positive("measured_time_us", in.measuredTimeUs());
            if (timeUs < lateralUs || timeUs > backwallUs) {
                throw TimingMessages.measuredTimeOutsideWall(timeUs, lateralUs, backwallUs);
            }
            double depthMm = StrictMath.min(thicknessMm, TofdGeometry.depthMm(halfSeparationMm, timeUs, velocityMmPerUs));
            return new Tip(depthMm, timeUs, depthMm, null);
        } else if (in.depthMm() != null) {
            double depthMm = Checks.positive("depth", in.depthMm());
            if (depthMm > thicknessMm) {
                throw TimingMessages.depthBelowBackWall(depthMm, thicknessMm);
            }
            double timeUs = TofdGeometry.timeOfFlightUs(halfSeparationMm, depthMm, velocityMmPerUs);
            return new Tip(depthMm, timeUs, null, timeUs);
        }
        return new Tip(Double.NaN, Double.NaN, null, null);
    }

    /** The timing standard uncertainty of the sampling, with a sampling frequency; null without. */
    private static Double timingUncertaintyNs(TofdSetupInput in, TimeReference reference,
            List<Reference> references) {
        if (in.samplingFrequencyMhz() == null) {
            return null;
        }
        int m = in.decimationFactor() == null ? 1 : Checks.atLeastOne("decimation_factor", in.decimationFactor());
        SampleClock clock = SampleClock.of(Checks.positive("sampling_frequency_mhz", in.samplingFrequencyMhz()), m,
                DecimationMode.DROP);
        double timingUncertaintyNs = reference == TimeReference.LATERAL_WAVE
                ? clock.differenceStandardUncertaintyNs() : clock.singleInstantStandardUncertaintyNs();
        references.add(Reference.of("timing standard uncertainty", Sources.TIMING));
        return timingUncertaintyNs;
    }

    /** The depth uncertainty from the timing and from the separation, combined and expanded. */
    private record DepthUncertainty(Optional<Double> timing, Optional<Double> separation, Optional<Double> combined,
            Optional<Double> expanded) {
        static final DepthUncertainty NONE = new DepthUncertainty(null, null, null, null);
    }

    /**
     * The law of propagation of uncertainty (JCGM 100:2008, eq. 10) for the depth of the tip, with the
     * sensitivities to time and to half the separation; a tip at the surface has none.
     */
    private static DepthUncertainty depthUncertainty(double halfSeparationMm, double velocityMmPerUs, Tip tip,
            Double timingUncertaintyNs, Double separationUncertaintyMm, double k, List<Warning> warnings,
            List<Reference> references) {
        Optional<Double> timingDepth = null;
        Optional<Double> separationDepth = null;
        Optional<Double> combined;
        Optional<Double> expanded;
        boolean surface = !(tip.depthMm() > 0.0);
        if (surface) {
            warnings.add(TimingMessages.tipAtSurface());
        }
        double d = tip.depthMm();
        double t = tip.timeUs();
        if (timingUncertaintyNs != null) {
            double uTUs = timingUncertaintyNs / 1000.0;
            timingDepth = surface ? Optional.empty()
                    : Optional.of(StrictMath.abs(depthPerTimeMmPerUs(halfSeparationMm, d, t, velocityMmPerUs)) * uTUs);
        }
        if (separationUncertaintyMm != null) {
            double uS = separationUncertaintyMm / 2.0;
            separationDepth = surface ? Optional.empty()
                    : Optional.of(StrictMath.abs(TofdGeometry.depthPerHalfSeparationRatio(halfSeparationMm, d)) * uS);
        }
        if (surface) {
            combined = Optional.empty();
            expanded = Optional.empty();
        } else {
            double a = timingDepth == null ? 0.0 : timingDepth.get();
            double b = separationDepth == null ? 0.0 : separationDepth.get();
            double u = StrictMath.hypot(a, b);
            combined = Optional.of(u);
            expanded = Optional.of(k * u);
        }
        references.add(Reference.of("TOFD depth uncertainty", Sources.TOFD_DEPTH_UNCERTAINTY));
        warnings.add(TimingMessages.depthUncertaintyPartial(timingUncertaintyNs != null,
                separationUncertaintyMm != null));
        return new DepthUncertainty(timingDepth, separationDepth, combined, expanded);
    }

    /**
     * Sensitivity of the depth to the time at a fixed separation: from d = sqrt((v t / 2)^2 - S^2),
     * dd/dt = v^2 t / (4 d), mm per us (derivation); d &gt; 0.
     */
    public static double depthPerTimeMmPerUs(double halfSeparationMm, double depthMm, double timeUs,
                                             double velocityMmPerUs) {
        Checks.positive("probe_centre_separation", halfSeparationMm);
        Checks.positive("depth", depthMm);
        Checks.positive("time_us", timeUs);
        Checks.positive("velocity", velocityMmPerUs);
        return velocityMmPerUs * velocityMmPerUs * timeUs / (4.0 * depthMm);
    }
}
