package utdigit.core.timing;

import static utdigit.core.common.MessageNumbers.rounded;
import static utdigit.core.timing.TofdSetupCalculator.DEPTH_UNCERTAINTY_PARTIAL;
import static utdigit.core.timing.TofdSetupCalculator.GATE_MISSES_WALL;
import static utdigit.core.timing.TofdSetupCalculator.NO_GATE_MARGIN;
import static utdigit.core.timing.TofdSetupCalculator.TIP_AT_SURFACE;

import java.util.Locale;
import utdigit.core.common.CalculationException;
import utdigit.core.common.MessageNumbers;
import utdigit.core.common.Warning;

/**
 * Every warning and failure text of the time-of-flight resolution and of the TOFD set-up check,
 * one factory per condition. The resolution quotes lengths to 4 significant digits, the set-up
 * check times and lengths to 5.
 */
final class TimingMessages {
    private TimingMessages() {}

    // Time-of-flight resolution.

    static CalculationException depthBelowThickness(double depthMm, double thicknessMm) {
        return CalculationException.impossible(
                "depth (" + mm(depthMm) + ") lies below the back wall: it exceeds thickness ("
                        + mm(thicknessMm) + ")",
                "depth", "thickness");
    }

    /** The topic of the reference that quotes the depth's sensitivity to the probe separation. */
    static String separationErrorTopic(double ratio) {
        return String.format(Locale.ROOT,
                "probe centre separation error: dd/dS = -S/d = %s here, an error e in 2S moves the"
                        + " depth by %s e", MessageNumbers.rounded(ratio), MessageNumbers.rounded(ratio / 2.0));
    }

    static Warning depthInDeadZone(double depthMm, double deadZoneDepthMm) {
        return Warning.of("DEPTH_IN_DEAD_ZONE",
                "depth (" + mm(depthMm) + ") lies inside the near-surface dead zone ("
                        + mm(deadZoneDepthMm) + "): its tip signal arrives within the pulse"
                        + " duration of the lateral wave and is hidden by it");
    }

    static Warning wholeThicknessDead(double thicknessMm) {
        return Warning.of("WHOLE_THICKNESS_DEAD",
                "the back-wall signal less the pulse duration falls at or before the lateral wave:"
                        + " the back-wall dead zone covers the whole thickness (" + mm(thicknessMm)
                        + "); a shorter pulse or a smaller probe_centre_separation widens the window between"
                        + " the lateral wave and the back wall");
    }

    static Warning deadZonesCoverThickness(double deadZoneDepthMm, double zoneMm, double thicknessMm) {
        return Warning.of("DEAD_ZONES_COVER_THICKNESS",
                "the near-surface dead zone (" + mm(deadZoneDepthMm) + ") and the back-wall dead zone ("
                        + mm(zoneMm) + ") together cover the whole thickness (" + mm(thicknessMm) + ")");
    }

    static Warning depthInBackwallDeadZone(double depthMm, double zoneMm) {
        return Warning.of("DEPTH_IN_BACKWALL_DEAD_ZONE",
                "depth (" + mm(depthMm) + ") lies inside the back-wall dead zone (the last " + mm(zoneMm)
                        + " above the back wall): its tip signal arrives within the pulse duration before"
                        + " the back-wall signal and is hidden by it");
    }

    // TOFD set-up check.

    static CalculationException gateEndsBeforeStart(double startUs, double endUs) {
        return CalculationException.impossible("gate_end_us (" + MessageNumbers.exact(endUs) + " us) must be after gate_start_us ("
                + MessageNumbers.exact(startUs) + " us)", "gate_end_us", "gate_start_us");
    }

    static CalculationException measuredTimeOutsideWall(double timeUs, double lateralUs, double backwallUs) {
        return CalculationException.impossible("measured_time_us (" + MessageNumbers.exact(timeUs) + " us) lies outside the wall: "
                + "between the lateral wave (" + rounded(lateralUs) + " us) and the back wall (" + rounded(backwallUs)
                + " us) for this separation, thickness and velocity", "measured_time_us");
    }

    static CalculationException depthBelowBackWall(double depthMm, double thicknessMm) {
        return CalculationException.impossible("depth (" + rounded(depthMm) + " mm) is below the back wall (thickness "
                + rounded(thicknessMm) + " mm)", "depth", "thickness");
    }

    static Warning noGateMargin() {
        return Warning.of(NO_GATE_MARGIN, "without pulse_duration_us the gate is checked with no margin: "
                + "a signal that starts inside the gate can still end outside it");
    }

    static Warning gateMissesWall(double startUs, double endUs, double lateralUs, double backwallUs, double marginUs,
            double requiredStartUs, double requiredEndUs) {
        return Warning.of(GATE_MISSES_WALL, "the gate " + rounded(startUs) + "-" + rounded(endUs)
                + " us does not span the lateral wave (" + rounded(lateralUs) + " us) to the back wall ("
                + rounded(backwallUs) + " us) with a margin of " + rounded(marginUs) + " us: set it from "
                + rounded(requiredStartUs) + " to " + rounded(requiredEndUs) + " us at least");
    }

    static Warning tipAtSurface() {
        return Warning.of(TIP_AT_SURFACE, "a tip at the surface arrives with the lateral wave, where the "
                + "depth changes infinitely fast with time and separation: the depth uncertainties are null");
    }

    static Warning depthUncertaintyPartial(boolean withTiming, boolean withSeparation) {
        return Warning.of(DEPTH_UNCERTAINTY_PARTIAL, "the depth uncertainty holds the "
                + (withTiming && withSeparation ? "sampling and the probe separation"
                : withTiming ? "sampling alone" : "probe separation alone")
                + "; the velocity's uncertainty, a tip off the centre line and the reading of the signal are not "
                + "in it");
    }

    /** A length of the resolution's messages: 4 significant digits and its unit. */
    private static String mm(double lengthMm) {
        return MessageNumbers.rounded(lengthMm) + " mm";
    }
}
