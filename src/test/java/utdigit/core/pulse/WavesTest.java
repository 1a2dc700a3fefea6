package utdigit.core.pulse;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import utdigit.core.common.CalculationError;
import utdigit.core.common.CalculationException;

class WavesTest {

    static final double ALLOWED_RELATIVE_ERROR = 1e-15;

    @Test
    @DisplayName("period is 1/f (definition): 5 MHz gives 0.2 us")
    void periodIsReciprocalOfFrequency() {
        assertThat(Waves.periodUs(5.0)).isCloseTo(0.2, within(0.2 * ALLOWED_RELATIVE_ERROR));
        assertThat(Waves.periodUs(2.25)).isCloseTo(1.0 / 2.25, within(ALLOWED_RELATIVE_ERROR));
    }

    @Test
    @DisplayName("wavelength is v/f (definition): 5920 m/s = 5.92 mm/us at 5 MHz gives 1.184 mm")
    void wavelengthIsVelocityOverFrequency() {
        assertThat(Waves.wavelengthMm(5920.0, 5.0)).isCloseTo(5.92 / 5.0, within(1.184 * ALLOWED_RELATIVE_ERROR));
        // water 1482.3 m/s (Del Grosso & Mader, from memory) at 10 MHz: 0.14823 mm
        assertThat(Waves.wavelengthMm(1482.3, 10.0)).isCloseTo(0.14823, within(1e-15));
    }

    @Test
    @DisplayName("5 MHz longitudinal waves in steel have a wavelength of about 1.2 mm (common practice, no published source)")
    void fiveMegahertzInSteelIsAboutOnePointTwoMillimetres() {
        assertThat(Waves.wavelengthMm(5920.0, 5.0)).isCloseTo(1.2, within(0.05));
        PulseResult r = PulseCalculator.compute(PulseInput.of(5.0, 5920.0));
        assertThat(r.wavelengthMm()).isCloseTo(1.2, within(0.05));
    }

    @Test
    @DisplayName("the inch mirror of the wavelength uses 1 in = 25.4 mm exactly")
    void wavelengthInInchesUsesExactInch() {
        PulseResult r = PulseCalculator.compute(PulseInput.of(5.0, 5920.0));
        assertThat(r.wavelengthIn()).isCloseTo(1.184 / 25.4, within(1e-15));
        assertThat(r.periodUs()).isEqualTo(1.0 / 5.0);
    }

    @Test
    @DisplayName("spatial pulse length is v tau and axial resolution half of it (common practice, no published source)")
    void spatialPulseLengthIsVelocityTimesDuration() {
        // 5920 m/s = 5.92 mm/us over 0.3 us: 1.776 mm; half: 0.888 mm
        assertThat(Waves.spatialPulseLengthMm(5920.0, 0.3)).isCloseTo(1.776, within(1e-12));
        assertThat(Waves.axialResolutionMm(1.776)).isCloseTo(0.888, within(1e-15));
    }

    @Nested
    class RejectsImpossibleValues {
        @Test
        void nanFrequencyIsInvalid() {
            assertThatThrownBy(() -> Waves.periodUs(Double.NaN))
                    .isInstanceOfSatisfying(CalculationException.class,
                            e -> assertThat(e.error()).isEqualTo(CalculationError.INVALID_INPUT));
        }

        @Test
        void zeroVelocityIsInvalid() {
            assertThatThrownBy(() -> Waves.wavelengthMm(0.0, 5.0)).isInstanceOf(CalculationException.class);
        }
    }
}
