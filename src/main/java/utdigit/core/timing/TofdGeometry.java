package utdigit.core.timing;

import utdigit.core.common.CalculationException;
import utdigit.core.common.Checks;

/**
 * Geometry of time-of-flight diffraction with a transmitter and a receiver symmetric about the
 * flaw tip: half the probe centre separation S (PCS = 2S), tip depth d below the scanning surface,
 * velocity v of the wave mode used. Times are in the part (wedge delays excluded), from emission
 * to reception.
 *
 * <p>Units throughout: lengths in mm, times in us, velocities in mm/us (1 m/s = 1e-3 mm/us).
 *
 * <p>Every depth change is computed from R = v t / 2 (the one-leg path) without subtracting two
 * nearly equal square roots: a change h of the one-leg path moves the depth from d to
 * sqrt(d^2 + h (2R + h)), so the change is h (2R + h) / (d + sqrt(d^2 + h (2R + h))), algebraically
 * identical to sqrt(((R + h))^2 - S^2) - d and free of cancellation (derived).
 */
public final class TofdGeometry {
    private TofdGeometry() {}

    /**
     * Time of the lateral wave, which runs just below the surface from probe to probe:
     * t_L = 2S / v, us (Charlesworth &amp; Temple, Engineering Applications of Ultrasonic
     * Time-of-Flight Diffraction, 2nd ed., 2.3.4, read second-hand).
     *
     * @param halfSeparationMm S, half the probe centre separation, mm (&gt; 0)
     * @param velocityMmPerUs v, mm/us (&gt; 0)
     */
    public static double lateralWaveTimeUs(double halfSeparationMm, double velocityMmPerUs) {
        Checks.positive("probe_centre_separation", halfSeparationMm);
        Checks.positive("velocity", velocityMmPerUs);
        return 2.0 * halfSeparationMm / velocityMmPerUs;
    }

    /**
     * Time of flight of the diffracted signal from a tip midway between the probes:
     * t = 2 sqrt(S^2 + d^2) / v, us (Charlesworth &amp; Temple, 2nd ed., 2.3.4, read second-hand).
     *
     * @param halfSeparationMm S, mm (&gt; 0)
     * @param depthMm d, mm (&gt;= 0)
     * @param velocityMmPerUs v, mm/us (&gt; 0)
     */
    public static double timeOfFlightUs(double halfSeparationMm, double depthMm, double velocityMmPerUs) {
        Checks.positive("probe_centre_separation", halfSeparationMm);
        Checks.nonNegative("depth", depthMm);
        Checks.positive("velocity", velocityMmPerUs);
        return 2.0 * onePathMm(halfSeparationMm, depthMm) / velocityMmPerUs;
    }

    /**
     * Depth of a tip midway between the probes from its time of flight:
     * d = sqrt((v t / 2)^2 - S^2), mm (Charlesworth &amp; Temple, 2nd ed., 2.3.4, read second-hand).
     * Valid for t at or after the lateral wave (t &gt;= 2S / v).
     *
     * @throws CalculationException INVALID_INPUT when t is before the lateral wave
     */
    public static double depthMm(double halfSeparationMm, double timeUs, double velocityMmPerUs) {
        Checks.positive("probe_centre_separation", halfSeparationMm);
        Checks.positive("velocity", velocityMmPerUs);
        double onePathMm = velocityMmPerUs * Checks.nonNegative("time_us", timeUs) / 2.0;
        if (onePathMm < halfSeparationMm) {
            throw CalculationException.invalid("time_us", timeUs, "must not be before the lateral wave 2S/v");
        }
        return StrictMath.sqrt((onePathMm - halfSeparationMm) * (onePathMm + halfSeparationMm));
    }

    /**
     * Depth step of one sample at depth d: the exact forward difference d(t + dt) - d(t), mm, with
     * t = t(d) (derived from the geometry of Charlesworth &amp; Temple 2.3.4). Not the linearised
     * slope dt v sqrt(S^2 + d^2) / (2d), which overestimates it (d(t) is concave) and is infinite
     * at d = 0.
     *
     * @param samplingIntervalUs dt, us (&gt; 0)
     */
    public static double depthStepMm(
            double halfSeparationMm, double depthMm, double samplingIntervalUs, double velocityMmPerUs) {
        Checks.positive("sampling_interval_us", samplingIntervalUs);
        Checks.positive("velocity", velocityMmPerUs);
        return depthChangeMm(halfSeparationMm, depthMm, velocityMmPerUs * samplingIntervalUs / 2.0);
    }

    /**
     * Pulse-limited depth resolution at depth d: the depth range hidden behind a signal of
     * duration tp, sqrt((v (t + tp) / 2)^2 - S^2) - d, mm (derived from the geometry of
     * Charlesworth &amp; Temple 2.3.4).
     *
     * @param pulseDurationUs tp, us (&gt; 0)
     */
    public static double pulseLimitedDepthResolutionMm(
            double halfSeparationMm, double depthMm, double pulseDurationUs, double velocityMmPerUs) {
        Checks.positive("pulse_duration_us", pulseDurationUs);
        Checks.positive("velocity", velocityMmPerUs);
        return depthChangeMm(halfSeparationMm, depthMm, velocityMmPerUs * pulseDurationUs / 2.0);
    }

    /**
     * Near-surface dead zone: the depths whose tip signal arrives within tp of the lateral wave,
     * sqrt((S + v tp / 2)^2 - S^2), mm (derived in src/docs/methods.md 5.2).
     */
    public static double deadZoneDepthMm(double halfSeparationMm, double pulseDurationUs, double velocityMmPerUs) {
        return pulseLimitedDepthResolutionMm(halfSeparationMm, 0.0, pulseDurationUs, velocityMmPerUs);
    }

    /**
     * Whether the back-wall signal's time minus tp falls at or before the lateral wave
     * (t_T - tp &lt;= t_L): then the back-wall dead zone covers the whole thickness.
     */
    public static boolean backwallPulseReachesLateralWave(
            double halfSeparationMm, double thicknessMm, double pulseDurationUs, double velocityMmPerUs) {
        Checks.positive("probe_centre_separation", halfSeparationMm);
        Checks.positive("thickness", thicknessMm);
        Checks.positive("pulse_duration_us", pulseDurationUs);
        Checks.positive("velocity", velocityMmPerUs);
        double h = velocityMmPerUs * pulseDurationUs / 2.0;
        return onePathMm(halfSeparationMm, thicknessMm) - h <= halfSeparationMm;
    }

    /**
     * Back-wall dead zone: the depths above the back wall T whose tip signal arrives within tp
     * before the back-wall signal, T - sqrt((v (t_T - tp) / 2)^2 - S^2) with t_T = 2 sqrt(S^2 + T^2) / v,
     * mm (derived in src/docs/methods.md 5.2). When t_T - tp falls at or
     * before the lateral wave the whole thickness is dead: T.
     *
     * @param thicknessMm T, mm (&gt; 0)
     */
    public static double backwallDeadZoneMm(
            double halfSeparationMm, double thicknessMm, double pulseDurationUs, double velocityMmPerUs) {
        if (backwallPulseReachesLateralWave(halfSeparationMm, thicknessMm, pulseDurationUs, velocityMmPerUs)) {
            return thicknessMm;
        }
        double h = velocityMmPerUs * pulseDurationUs / 2.0;
        double rMm = onePathMm(halfSeparationMm, thicknessMm);
        // (R - h)^2 - S^2 = T^2 - h (2R - h); the zone is T - sqrt(that), written without cancellation.
        double hiddenSquareMm2 = h * (2.0 * rMm - h);
        double upperEdgeMm = StrictMath.sqrt(thicknessMm * thicknessMm - hiddenSquareMm2);
        return hiddenSquareMm2 / (thicknessMm + upperEdgeMm);
    }

    /**
     * Sensitivity of the depth read at a fixed time to half the probe separation: from
     * d = sqrt((v t / 2)^2 - S^2), dd/dS = -S / d (derivation), mm per mm; an error of e in the
     * full separation 2S moves the depth by -S e / (2d).
     *
     * @param depthMm d, mm (&gt; 0)
     */
    public static double depthPerHalfSeparationRatio(double halfSeparationMm, double depthMm) {
        Checks.positive("probe_centre_separation", halfSeparationMm);
        Checks.positive("depth", depthMm);
        return -halfSeparationMm / depthMm;
    }

    /**
     * sqrt(d^2 + h (2R + h)) - d for a change h &gt; 0 of the one-leg path R = sqrt(S^2 + d^2), mm
     * (callers have checked that h is a positive product of positive factors).
     */
    private static double depthChangeMm(double halfSeparationMm, double depthMm, double onePathChangeMm) {
        Checks.positive("probe_centre_separation", halfSeparationMm);
        Checks.nonNegative("depth", depthMm);
        double rMm = onePathMm(halfSeparationMm, depthMm);
        double addedSquareMm2 = onePathChangeMm * (2.0 * rMm + onePathChangeMm);
        return addedSquareMm2 / (depthMm + StrictMath.sqrt(depthMm * depthMm + addedSquareMm2));
    }

    /** One leg of the path, probe index to tip: sqrt(S^2 + d^2), mm. */
    private static double onePathMm(double halfSeparationMm, double depthMm) {
        return StrictMath.sqrt(halfSeparationMm * halfSeparationMm + depthMm * depthMm);
    }
}
