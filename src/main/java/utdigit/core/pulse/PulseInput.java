package utdigit.core.pulse;

import utdigit.core.common.CalculationException;
import utdigit.core.common.Checks;

/**
 * The inputs of the pulse-parameters calculation (POST /api/pulse-parameters), normalised by the
 * caller: lengths in mm, velocities in m/s, frequencies in MHz, angles in degrees. Every optional
 * input is a nullable boxed value, null meaning "not given"; create with {@link #of} and the
 * {@code with...} methods.
 *
 * @param frequencyMhz nominal probe frequency f, MHz, > 0
 * @param velocityMPerS the part's velocity of the chosen wave mode v, m/s, > 0 (resolved by the
 *     caller from velocity_m_per_s, velocity_in_per_us or material + wave_mode)
 * @param bandwidthPercent -6 dB fractional bandwidth, percent, in (0, 200), or null
 * @param centreFrequencyConvention how {@code frequencyMhz} relates to the band edges, or null
 *     (ARITHMETIC when the bandwidth is given; must be null without a bandwidth)
 * @param elementDiameterMm diameter D of the circular element, mm, > 0, or null
 * @param distanceMm distance z in the part at which to give the beam diameter, mm, > 0, or null
 *     (needs the element diameter)
 * @param wedgePathMm sound path w in a wedge or delay line, mm, > 0, or null (needs the wedge
 *     velocity and the element diameter)
 * @param wedgeVelocityMPerS velocity v_w of the wave in the wedge, m/s, > 0, or null (applies to the
 *     wedge path and to the incident angle)
 * @param incidentAngleDeg incident angle in the wedge, degrees, in [0, 90), or null (needs the
 *     wedge velocity)
 */
public record PulseInput(
        double frequencyMhz,
        double velocityMPerS,
        Double bandwidthPercent,
        CentreFrequencyConvention centreFrequencyConvention,
        Double elementDiameterMm,
        Double distanceMm,
        Double wedgePathMm,
        Double wedgeVelocityMPerS,
        Double incidentAngleDeg) {

    /** The bandwidth is below this, exclusive (the contract's range 0-200 %). */
    public static final double MAX_BANDWIDTH_PERCENT_EXCLUSIVE = 200.0;

    public PulseInput {
        Checks.positive("frequency_mhz", frequencyMhz);
        Checks.positive("velocity_m_per_s", velocityMPerS);
        if (bandwidthPercent != null) {
            double percent = Checks.positive("bandwidth_percent", bandwidthPercent);
            if (!(percent < MAX_BANDWIDTH_PERCENT_EXCLUSIVE)) {
                throw CalculationException.invalid("bandwidth_percent", percent, "must be > 0 and < 200");
            }
        }
        if (elementDiameterMm != null) {
            Checks.positive("element_diameter_mm", elementDiameterMm);
        }
        if (distanceMm != null) {
            Checks.positive("distance_mm", distanceMm);
        }
        if (wedgePathMm != null) {
            Checks.positive("wedge_path_mm", wedgePathMm);
        }
        if (wedgeVelocityMPerS != null) {
            Checks.positive("wedge_velocity_m_per_s", wedgeVelocityMPerS);
        }
        if (incidentAngleDeg != null) {
            Checks.inRangeHalfOpen("incident_angle_deg", incidentAngleDeg, 0.0, 90.0);
        }
    }

    /** The required inputs alone: period and wavelength. */
    public static PulseInput of(double frequencyMhz, double velocityMPerS) {
        return new PulseInput(frequencyMhz, velocityMPerS, null, null, null, null, null, null, null);
    }

    /** With a -6 dB bandwidth in percent and the default convention (ARITHMETIC). */
    public PulseInput withBandwidthPercent(Double percent) {
        return new PulseInput(frequencyMhz, velocityMPerS, percent, centreFrequencyConvention,
                elementDiameterMm, distanceMm, wedgePathMm, wedgeVelocityMPerS, incidentAngleDeg);
    }

    /** With a -6 dB bandwidth in percent and an explicit centre-frequency convention. */
    public PulseInput withBandwidthPercent(Double percent, CentreFrequencyConvention convention) {
        return withBandwidthPercent(percent).withCentreFrequencyConvention(convention);
    }

    /** With a centre-frequency convention (applies only with a bandwidth). */
    public PulseInput withCentreFrequencyConvention(CentreFrequencyConvention convention) {
        return new PulseInput(frequencyMhz, velocityMPerS, bandwidthPercent, convention,
                elementDiameterMm, distanceMm, wedgePathMm, wedgeVelocityMPerS, incidentAngleDeg);
    }

    /** With the diameter of the circular element, mm. */
    public PulseInput withElementDiameterMm(Double diameterMm) {
        return new PulseInput(frequencyMhz, velocityMPerS, bandwidthPercent, centreFrequencyConvention,
                diameterMm, distanceMm, wedgePathMm, wedgeVelocityMPerS, incidentAngleDeg);
    }

    /** With the distance in the part for the beam diameter, mm. */
    public PulseInput withDistanceMm(Double distance) {
        return new PulseInput(frequencyMhz, velocityMPerS, bandwidthPercent, centreFrequencyConvention,
                elementDiameterMm, distance, wedgePathMm, wedgeVelocityMPerS, incidentAngleDeg);
    }

    /** With the sound path in a wedge or delay line, mm. */
    public PulseInput withWedgePathMm(Double pathMm) {
        return new PulseInput(frequencyMhz, velocityMPerS, bandwidthPercent, centreFrequencyConvention,
                elementDiameterMm, distanceMm, pathMm, wedgeVelocityMPerS, incidentAngleDeg);
    }

    /** With the wedge's velocity, m/s. */
    public PulseInput withWedgeVelocityMPerS(Double velocity) {
        return new PulseInput(frequencyMhz, velocityMPerS, bandwidthPercent, centreFrequencyConvention,
                elementDiameterMm, distanceMm, wedgePathMm, velocity, incidentAngleDeg);
    }

    /** With the incident angle in the wedge, degrees. */
    public PulseInput withIncidentAngleDeg(Double angleDeg) {
        return new PulseInput(frequencyMhz, velocityMPerS, bandwidthPercent, centreFrequencyConvention,
                elementDiameterMm, distanceMm, wedgePathMm, wedgeVelocityMPerS, angleDeg);
    }

}
