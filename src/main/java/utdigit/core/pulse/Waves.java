package utdigit.core.pulse;

import utdigit.core.common.Checks;
import utdigit.core.common.Units;

/**
 * Period, wavelength and pulse length of a wave: the one implementation of these definitions,
 * shared by every calculation.
 */
public final class Waves {
    private Waves() {}

    /**
     * Period of a wave: T = 1 / f.
     *
     * <p>Reference: definition.
     *
     * @param frequencyMhz frequency f, MHz, finite and > 0
     * @return the period in us
     */
    public static double periodUs(double frequencyMhz) {
        Checks.positive("frequency_mhz", frequencyMhz);
        return 1.0 / frequencyMhz;
    }

    /**
     * Wavelength of a wave of velocity v and frequency f: lambda = v / f (v in mm/us, 1 m/s = 1e-3 mm/us;
     * f in MHz; lambda in mm).
     *
     * <p>Reference: definition.
     *
     * @param velocityMPerS velocity v, m/s, finite and > 0
     * @param frequencyMhz frequency f, MHz, finite and > 0
     * @return the wavelength in mm
     */
    public static double wavelengthMm(double velocityMPerS, double frequencyMhz) {
        Checks.positive("velocity_m_per_s", velocityMPerS);
        Checks.positive("frequency_mhz", frequencyMhz);
        return Units.mPerSToMmPerUs(velocityMPerS) / frequencyMhz;
    }

    /**
     * Spatial pulse length: the length in the material of a pulse of duration tau, v tau (v in
     * mm/us, tau in us, result in mm). Used with the -6 dB envelope duration.
     *
     * <p>Reference: common practice, no published source.
     *
     * @param velocityMPerS velocity v, m/s, finite and > 0
     * @param pulseDurationUs duration tau, us, finite and > 0
     * @return the spatial pulse length in mm
     */
    public static double spatialPulseLengthMm(double velocityMPerS, double pulseDurationUs) {
        Checks.positive("velocity_m_per_s", velocityMPerS);
        Checks.positive("pulse_duration_us", pulseDurationUs);
        return Units.mPerSToMmPerUs(velocityMPerS) * pulseDurationUs;
    }

    /**
     * Axial (range) resolution in pulse-echo: about half the spatial pulse length, because the echo
     * travels the path twice. Two reflectors closer than this along the beam merge into one echo.
     *
     * <p>Reference: common practice, no published source.
     *
     * @param spatialPulseLengthMm spatial pulse length v tau(-6 dB), mm, finite and > 0
     * @return the axial resolution in mm
     */
    public static double axialResolutionMm(double spatialPulseLengthMm) {
        Checks.positive("spatial_pulse_length_mm", spatialPulseLengthMm);
        return spatialPulseLengthMm / 2.0;
    }
}
