package utdigit.core.sampling;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;
import utdigit.core.common.CalculationException;
import utdigit.core.pulse.GaussianPulse;
import utdigit.core.pulse.Waves;

/** The TFM grid formulas: all derived models (src/docs/methods.md 3.7). */
class TfmGridSamplingTest {

    static final double ALLOWED_ROUNDING = 1e-12;

    @Test
    @DisplayName("lateral width factor: sinc(k/2)^2 = 10^(-6/20) with sinc(x) = sin(pi x)/(pi x), about 0.884 (methods.md)")
    void lateralWidthFactorSolvesTheSincLevel() {
        double k = TfmGridSampling.LATERAL_WIDTH_FACTOR;
        double x = k / 2.0;
        double sinc = Math.sin(Math.PI * x) / (Math.PI * x);
        assertThat(sinc * sinc).isCloseTo(Math.pow(10.0, -6.0 / 20.0), within(1e-13));
        assertThat(k).isCloseTo(0.884, within(0.001));
        // scipy.optimize.brentq on numpy.sinc(x)**2 - 10**(-6/20) (run by us): 2x = 0.8844867792518226
        assertThat(k).isCloseTo(0.8844867792518226, within(1e-12));
    }

    @Test
    @DisplayName("wavelength lambda = v/f: 5920 m/s at 5 MHz is 1.184 mm (definition)")
    void wavelengthIsVelocityOverFrequency() {
        assertThat(Waves.wavelengthMm(5920.0, 5.0)).isCloseTo(1.184, within(ALLOWED_ROUNDING));
    }

    @ParameterizedTest
    @CsvSource({"0.05, 1.184", "0.1, 1.184", "0.2, 1.184", "0.29, 1.184", "0.3, 2.0"})
    @DisplayName("carrier depth loss is -20 log10(cos(2 pi dz/lambda)) (RF image repeats every lambda/2)")
    void carrierDepthLossMatchesClosedForm(double stepMm, double wavelengthMm) {
        assertThat(TfmGridSampling.carrierDepthLossDb(stepMm, wavelengthMm))
                .isCloseTo(-20.0 * Math.log10(Math.cos(2.0 * Math.PI * stepMm / wavelengthMm)), within(ALLOWED_ROUNDING));
    }

    @Test
    @DisplayName("carrier depth loss at lambda/8 is the n = 4 sine bound, 3.0103 dB (same cos(pi/4))")
    void carrierDepthLossAtEighthWavelength() {
        assertThat(TfmGridSampling.carrierDepthLossDb(1.0 / 8.0, 1.0)).isCloseTo(3.0103, within(5e-5));
    }

    @Test
    @DisplayName("Gaussian step loss: a response of -6 dB width w read w/2 off its peak (step w) loses 6 dB")
    void gaussianStepLossAtTheWidthIsSixDb() {
        assertThat(TfmGridSampling.gaussianStepLossDb(2.0, 2.0)).isCloseTo(6.0, within(ALLOWED_ROUNDING));
        assertThat(TfmGridSampling.gaussianStepLossDb(0.5, 2.0)).isCloseTo(6.0 / 16.0, within(ALLOWED_ROUNDING));
    }

    @Test
    @DisplayName("depth response width w = v tau(-6 dB)/2, tau = 2 sqrt(ln 10^(6/20) / a) (scipy gausspulse model)")
    void depthResponseWidth() {
        double a = BruteForcePulseScan.envelopeRatePerUs2(5.0, 0.6);
        double tauUs = 2.0 * Math.sqrt(Math.log(Math.pow(10.0, 6.0 / 20.0)) / a);
        assertThat(TfmGridSampling.depthResponseWidthMm(5920.0, GaussianPulse.of(5.0, 0.6)))
                .isCloseTo(5.920 * tauUs / 2.0, within(1e-12));
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.1, 0.5, 1.0, 2.0, 6.0, 20.0})
    @DisplayName("largest RF depth step with the envelope term round-trips: its loss equals the tolerance")
    void maxRfDepthStepRoundTrips(double toleranceDb) {
        double lambda = 1.184;
        double widthMm = 0.8;
        double stepMm = TfmGridSampling.maxRfDepthStepMm(toleranceDb, lambda, widthMm);
        double lossDb = -20.0 * Math.log10(Math.cos(2.0 * Math.PI * stepMm / lambda))
                + 6.0 * (stepMm / widthMm) * (stepMm / widthMm);
        assertThat(lossDb).isCloseTo(toleranceDb, within(1e-9));
        assertThat(stepMm).isLessThan(TfmGridSampling.maxRfDepthStepMm(toleranceDb, lambda, null));
    }

    @Test
    @DisplayName("largest RF depth step without the envelope term: lambda arccos(10^(-X/20))/(2 pi); 3.0103 dB is lambda/8")
    void maxRfDepthStepCarrierOnly() {
        assertThat(TfmGridSampling.maxRfDepthStepMm(10.0 * Math.log10(2.0), 1.0, null)).isCloseTo(0.125, within(1e-12));
    }

    @Test
    @DisplayName("largest Gaussian step: w sqrt(X/6); 6 dB gives the width itself")
    void maxGaussianStep() {
        assertThat(TfmGridSampling.maxGaussianStepMm(6.0, 1.3)).isCloseTo(1.3, within(1e-12));
        assertThat(TfmGridSampling.maxGaussianStepMm(1.5, 2.0)).isCloseTo(1.0, within(1e-12));
    }

    @Test
    @DisplayName("lateral width w_lat = k lambda z / A")
    void lateralWidth() {
        assertThat(TfmGridSampling.lateralWidthMm(1.184, 50.0, 32.0))
                .isCloseTo(TfmGridSampling.LATERAL_WIDTH_FACTOR * 1.184 * 50.0 / 32.0, within(1e-12));
    }

    @Nested
    class Rejects {
        @ParameterizedTest
        @ValueSource(doubles = {0.25, 0.3, 1.0})
        @DisplayName("an RF carrier step at or beyond lambda/4 has no bound")
        void carrierStepAtQuarterWavelength(double stepMm) {
            assertThatThrownBy(() -> TfmGridSampling.carrierDepthLossDb(stepMm, 1.0))
                    .isInstanceOf(CalculationException.class);
        }
    }
}
