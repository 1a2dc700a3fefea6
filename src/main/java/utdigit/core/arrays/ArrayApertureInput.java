package utdigit.core.arrays;

/**
 * Inputs of an array aperture assessment, in the contract's units (lengths in mm, velocity in m/s,
 * frequency in MHz, angles in degrees). Optional inputs are null when not given.
 *
 * @param frequencyMhz nominal probe frequency, MHz
 * @param velocityMPerS velocity of the wave mode in the medium where the beam is formed and steered
 *     (the part for a contact array; the wedge for an array on a wedge whose steering angles are
 *     given in the wedge), m/s
 * @param elementPitchMm centre-to-centre distance p of neighbouring elements, mm
 * @param activeElements number n of elements fired together; the active aperture is n p; or give
 *     activeApertureMm instead (not both); null with both null: no aperture figures
 * @param activeApertureMm active aperture length L in the steering plane, mm
 * @param elementLengthMm element length in the passive plane (the array's width), mm; null: no
 *     passive-plane figures
 * @param maxSteeringAngleDeg largest steering angle used, either side of the aperture's normal,
 *     0 to below 90 deg; null: 0 (no steering)
 */
public record ArrayApertureInput(
        double frequencyMhz,
        double velocityMPerS,
        double elementPitchMm,
        Integer activeElements,
        Double activeApertureMm,
        Double elementLengthMm,
        Double maxSteeringAngleDeg) {

    /** A builder with the three required inputs; every other input starts as "not given". */
    public static Builder builder(double frequencyMhz, double velocityMPerS, double elementPitchMm) {
        return new Builder(frequencyMhz, velocityMPerS, elementPitchMm);
    }

    /** Collects the optional inputs; null leaves an input "not given". Not thread-safe. */
    public static final class Builder {
        private final double frequencyMhz;
        private final double velocityMPerS;
        private final double elementPitchMm;
        private Integer activeElements;
        private Double activeApertureMm;
        private Double elementLengthMm;
        private Double maxSteeringAngleDeg;

        private Builder(double frequencyMhz, double velocityMPerS, double elementPitchMm) {
            this.frequencyMhz = frequencyMhz;
            this.velocityMPerS = velocityMPerS;
            this.elementPitchMm = elementPitchMm;
        }

        public Builder activeElements(Integer value) {
            this.activeElements = value;
            return this;
        }

        public Builder activeApertureMm(Double value) {
            this.activeApertureMm = value;
            return this;
        }

        public Builder elementLengthMm(Double value) {
            this.elementLengthMm = value;
            return this;
        }

        public Builder maxSteeringAngleDeg(Double value) {
            this.maxSteeringAngleDeg = value;
            return this;
        }

        public ArrayApertureInput build() {
            return new ArrayApertureInput(frequencyMhz, velocityMPerS, elementPitchMm, activeElements,
                    activeApertureMm, elementLengthMm, maxSteeringAngleDeg);
        }
    }
}
