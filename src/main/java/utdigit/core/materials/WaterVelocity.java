package utdigit.core.materials;

import utdigit.core.common.CalculationException;

/**
 * Sound velocity in pure water as a function of temperature.
 *
 * <p>c(T) = 1402.385 + 5.038813 T - 5.799136e-2 T^2 + 3.287156e-4 T^3 - 1.398845e-6 T^4
 * + 2.787860e-9 T^5 in m/s, T in degrees Celsius, valid 0 to 95 C. This is the fifth-order
 * polynomial of W. Marczak, "Water as a standard in the measurements of speed of sound in liquids",
 * J. Acoust. Soc. Am. 102 (1997) 2776 (catalogue id marczak-1997-water; coefficients read in texts that
 * reproduce the paper). It gives 1482.38 m/s at 20 C.
 */
public final class WaterVelocity {
    private WaterVelocity() {}

    /** Lowest temperature of the polynomial's validity, C. */
    public static final double MIN_TEMPERATURE_C = 0.0;
    /** Highest temperature of the polynomial's validity, C. */
    public static final double MAX_TEMPERATURE_C = 95.0;
    /** Temperature used when the caller gives none, C. */
    public static final double DEFAULT_TEMPERATURE_C = 20.0;

    private static final double[] COEFFICIENTS = {
        1402.385, 5.038813, -5.799136e-2, 3.287156e-4, -1.398845e-6, 2.787860e-9
    };

    /** Velocity in m/s at {@code temperatureC} (0 to 95 C). */
    public static double marczakMPerS(double temperatureC) {
        if (!(temperatureC >= MIN_TEMPERATURE_C && temperatureC <= MAX_TEMPERATURE_C)) {
            throw CalculationException.invalid(
                    "temperature_c", temperatureC, "must be within 0 to 95 C for water");
        }
        double sum = 0.0;
        for (int i = COEFFICIENTS.length - 1; i >= 0; i--) {
            sum = sum * temperatureC + COEFFICIENTS[i];
        }
        return sum;
    }
}
