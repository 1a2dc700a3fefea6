package utdigit.core.pulse;

import utdigit.core.common.CalculationException;
import utdigit.core.common.Checks;

/**
 * The inputs of the pulse-parameters calculation (POST /api/pulse-parameters), normalised by the
 * caller: lengths in mm, velocities in m/s, frequencies in MHz, angles in degrees. Every optional
 * input is a nullable boxed value, null meaning "not given"; build with {@link #builder}.
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
        return builder(frequencyMhz, velocityMPerS).build();
    }

    /** A builder with the two required inputs; every other input starts as "not given". */
    public static Builder builder(double frequencyMhz, double velocityMPerS) {
        return new Builder(frequencyMhz, velocityMPerS);
    }

    /** A builder that starts from this input's values. */
    public Builder toBuilder() {
        return new Builder(frequencyMhz, velocityMPerS)
                .bandwidthPercent(bandwidthPercent)
                .centreFrequencyConvention(centreFrequencyConvention)
                .elementDiameterMm(elementDiameterMm)
                .distanceMm(distanceMm)
                .wedgePathMm(wedgePathMm)
                .wedgeVelocityMPerS(wedgeVelocityMPerS)
                .incidentAngleDeg(incidentAngleDeg);
    }

    /** Collects the optional inputs; null leaves an input "not given". Not thread-safe. */
    public static final class Builder {
        private final double frequencyMhz;
        private final double velocityMPerS;
        private Double bandwidthPercent;
        private CentreFrequencyConvention centreFrequencyConvention;
        private Double elementDiameterMm;
        private Double distanceMm;
        private Double wedgePathMm;
        private Double wedgeVelocityMPerS;
        private Double incidentAngleDeg;

        private Builder(double frequencyMhz, double velocityMPerS) {
            this.frequencyMhz = frequencyMhz;
            this.velocityMPerS = velocityMPerS;
        }

        public Builder bandwidthPercent(Double value) {
            this.bandwidthPercent = value;
            return this;
        }

        public Builder centreFrequencyConvention(CentreFrequencyConvention value) {
            this.centreFrequencyConvention = value;
            return this;
        }

        public Builder elementDiameterMm(Double value) {
            this.elementDiameterMm = value;
            return this;
        }

        public Builder distanceMm(Double value) {
            this.distanceMm = value;
            return this;
        }

        public Builder wedgePathMm(Double value) {
            this.wedgePathMm = value;
            return this;
        }

        public Builder wedgeVelocityMPerS(Double value) {
            this.wedgeVelocityMPerS = value;
            return this;
        }

        public Builder incidentAngleDeg(Double value) {
            this.incidentAngleDeg = value;
            return this;
        }

        public PulseInput build() {
            return new PulseInput(frequencyMhz, velocityMPerS, bandwidthPercent, centreFrequencyConvention,
                    elementDiameterMm, distanceMm, wedgePathMm, wedgeVelocityMPerS, incidentAngleDeg);
        }
    }
}
