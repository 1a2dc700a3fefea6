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

    /** Pitch only: the grating-lobe check at zero steering. */
    public static ArrayApertureInput of(double frequencyMhz, double velocityMPerS, double elementPitchMm) {
        return new ArrayApertureInput(frequencyMhz, velocityMPerS, elementPitchMm, null, null, null, null);
    }

    public ArrayApertureInput withActiveElements(Integer n) {
        return new ArrayApertureInput(frequencyMhz, velocityMPerS, elementPitchMm, n, activeApertureMm,
                elementLengthMm, maxSteeringAngleDeg);
    }

    public ArrayApertureInput withActiveApertureMm(Double lengthMm) {
        return new ArrayApertureInput(frequencyMhz, velocityMPerS, elementPitchMm, activeElements, lengthMm,
                elementLengthMm, maxSteeringAngleDeg);
    }

    public ArrayApertureInput withElementLengthMm(Double lengthMm) {
        return new ArrayApertureInput(frequencyMhz, velocityMPerS, elementPitchMm, activeElements, activeApertureMm,
                lengthMm, maxSteeringAngleDeg);
    }

    public ArrayApertureInput withMaxSteeringAngleDeg(Double angleDeg) {
        return new ArrayApertureInput(frequencyMhz, velocityMPerS, elementPitchMm, activeElements, activeApertureMm,
                elementLengthMm, angleDeg);
    }
}
