package utdigit.core.timing;

import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import utdigit.core.common.CalculationException;
import utdigit.core.common.Checks;
import utdigit.core.common.MessageNumbers;
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

    private static final MathContext DIGITS = new MathContext(5);

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
        Double startMargin = null;
        Double endMargin = null;
        Boolean spans = null;
        if (in.gateStartUs() != null) {
            double startUs = Checks.nonNegative("gate_start_us", in.gateStartUs());
            double endUs = Checks.nonNegative("gate_end_us", in.gateEndUs());
            if (!(endUs > startUs)) {
                throw CalculationException.impossible("gate_end_us (" + fmt(endUs) + " us) must be after gate_start_us ("
                        + fmt(startUs) + " us)", "gate_end_us", "gate_start_us");
            }
            startMargin = lateralUs - startUs;
            endMargin = endUs - backwallUs;
            spans = startMargin >= marginUs && endMargin >= marginUs;
            references.add(Reference.of("TOFD gate", Sources.TOFD_GATE));
            if (in.pulseDurationUs() == null) {
                warnings.add(Warning.of(NO_GATE_MARGIN, "without pulse_duration_us the gate is checked with no margin: "
                        + "a signal that starts inside the gate can still end outside it"));
            }
            if (!spans) {
                warnings.add(Warning.of(GATE_MISSES_WALL, "the gate " + fmt(startUs) + "-" + fmt(endUs)
                        + " us does not span the lateral wave (" + fmt(lateralUs) + " us) to the back wall ("
                        + fmt(backwallUs) + " us) with a margin of " + fmt(marginUs) + " us: set it from "
                        + fmt(requiredStartUs) + " to " + fmt(requiredEndUs) + " us at least"));
            }
        }

        Double depthFromTimeMm = null;
        Double timeOfFlightUs = null;
        double depthMm = Double.NaN;
        double timeUs = Double.NaN;
        if (in.measuredTimeUs() != null) {
            timeUs = Checks.positive("measured_time_us", in.measuredTimeUs());
            if (timeUs < lateralUs || timeUs > backwallUs) {
                throw CalculationException.impossible("measured_time_us (" + fmt(timeUs) + " us) lies outside the wall: "
                        + "between the lateral wave (" + fmt(lateralUs) + " us) and the back wall (" + fmt(backwallUs)
                        + " us) for this separation, thickness and velocity", "measured_time_us");
            }
            depthMm = StrictMath.min(thicknessMm, TofdGeometry.depthMm(halfSeparationMm, timeUs, velocityMmPerUs));
            depthFromTimeMm = depthMm;
        } else if (in.depthMm() != null) {
            depthMm = Checks.positive("depth", in.depthMm());
            if (depthMm > thicknessMm) {
                throw CalculationException.impossible("depth (" + fmt(depthMm) + " mm) is below the back wall (thickness "
                        + fmt(thicknessMm) + " mm)", "depth", "thickness");
            }
            timeUs = TofdGeometry.timeOfFlightUs(halfSeparationMm, depthMm, velocityMmPerUs);
            timeOfFlightUs = timeUs;
        }

        Double timingUncertaintyNs = null;
        if (in.samplingFrequencyMhz() != null) {
            int m = in.decimationFactor() == null ? 1 : Checks.atLeastOne("decimation_factor", in.decimationFactor());
            SampleClock clock = SampleClock.of(Checks.positive("sampling_frequency_mhz", in.samplingFrequencyMhz()), m,
                    DecimationMode.DROP);
            timingUncertaintyNs = reference == TimeReference.LATERAL_WAVE
                    ? clock.differenceStandardUncertaintyNs() : clock.singleInstantStandardUncertaintyNs();
            references.add(Reference.of("timing standard uncertainty", Sources.TIMING));
        }
        Double separationUncertaintyMm = in.probeCentreSeparationUncertaintyMm() == null ? null
                : Checks.nonNegative("probe_centre_separation_uncertainty", in.probeCentreSeparationUncertaintyMm());

        Optional<Double> timingDepth = null;
        Optional<Double> separationDepth = null;
        Optional<Double> combined = null;
        Optional<Double> expanded = null;
        boolean atDepth = !Double.isNaN(depthMm);
        if (atDepth && (timingUncertaintyNs != null || separationUncertaintyMm != null)) {
            boolean surface = !(depthMm > 0.0);
            if (surface) {
                warnings.add(Warning.of(TIP_AT_SURFACE, "a tip at the surface arrives with the lateral wave, where the "
                        + "depth changes infinitely fast with time and separation: the depth uncertainties are null"));
            }
            double d = depthMm;
            double t = timeUs;
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
            warnings.add(Warning.of(DEPTH_UNCERTAINTY_PARTIAL, "the depth uncertainty holds the "
                    + (timingUncertaintyNs != null && separationUncertaintyMm != null ? "sampling and the probe separation"
                    : timingUncertaintyNs != null ? "sampling alone" : "probe separation alone")
                    + "; the velocity's uncertainty, a tip off the centre line and the reading of the signal are not "
                    + "in it"));
        }
        return new TofdSetupResult(reference, k, lateralUs, backwallUs, marginUs, requiredStartUs, requiredEndUs,
                startMargin, endMargin, spans, depthFromTimeMm, timeOfFlightUs, timingUncertaintyNs, timingDepth,
                separationDepth, combined, expanded, warnings, references);
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

    private static String fmt(double x) {
        return MessageNumbers.plain(x, DIGITS);
    }
}
