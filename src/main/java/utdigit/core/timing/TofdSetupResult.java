package utdigit.core.timing;

import java.util.List;
import java.util.Optional;
import utdigit.core.common.Reference;
import utdigit.core.common.Warning;

/**
 * A TOFD set-up check. A field whose optional inputs were not given is null; an {@link Optional} is
 * empty when the value cannot exist (a tip at the surface has no finite timing sensitivity), with a
 * warning.
 *
 * @param timeReference the time reference used (default TRIGGER)
 * @param coverageFactor the coverage factor used (default 2)
 * @param lateralWaveTimeUs 2S / v, us
 * @param backwallTimeUs 2 sqrt(S^2 + T^2) / v, us
 * @param gateMarginUs the margin required each side: the pulse duration, or 0 without one, us
 * @param requiredGateStartUs t_L - margin, us
 * @param requiredGateEndUs t_BW + margin, us
 * @param gateStartMarginUs with a gate: t_L - gate start, us
 * @param gateEndMarginUs with a gate: gate end - t_BW, us
 * @param gateSpansWall with a gate: both margins at least the required margin
 * @param depthFromTimeMm with a measured time: sqrt((v t / 2)^2 - S^2), mm
 * @param timeOfFlightUs with a depth: 2 sqrt(S^2 + d^2) / v, us
 * @param timingStandardUncertaintyNs with a sampling frequency: dt/sqrt(12) (TRIGGER) or dt/sqrt(6), ns
 * @param timingDepthUncertaintyMm (v^2 t / (4 d)) u_t, mm
 * @param separationDepthUncertaintyMm (S / d) u_S with u_S = u(2S) / 2, mm
 * @param combinedDepthUncertaintyMm root sum of squares of the two, mm
 * @param expandedDepthUncertaintyMm k times the combined, mm
 */
public record TofdSetupResult(
        TimeReference timeReference,
        double coverageFactor,
        double lateralWaveTimeUs,
        double backwallTimeUs,
        double gateMarginUs,
        double requiredGateStartUs,
        double requiredGateEndUs,
        Double gateStartMarginUs,
        Double gateEndMarginUs,
        Boolean gateSpansWall,
        Double depthFromTimeMm,
        Double timeOfFlightUs,
        Double timingStandardUncertaintyNs,
        Optional<Double> timingDepthUncertaintyMm,
        Optional<Double> separationDepthUncertaintyMm,
        Optional<Double> combinedDepthUncertaintyMm,
        Optional<Double> expandedDepthUncertaintyMm,
        List<Warning> warnings,
        List<Reference> references) {

    public TofdSetupResult {
        warnings = List.copyOf(warnings);
        references = List.copyOf(references);
    }

    public boolean hasWarning(String code) {
        return warnings.stream().anyMatch(w -> w.code().equals(code));
    }
}
