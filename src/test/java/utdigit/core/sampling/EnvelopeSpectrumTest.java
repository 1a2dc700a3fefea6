package utdigit.core.sampling;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.transform.DftNormalization;
import org.apache.commons.math3.transform.FastFourierTransformer;
import org.apache.commons.math3.transform.TransformType;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * With signal ENVELOPE the sampled spectrum is the detected envelope's, centred at 0 Hz, not the
 * carrier band. The spectral figures are checked against the spectrum of the envelope computed
 * numerically here: the envelope exp(-a t^2) of the scipy.signal.gausspulse parameterisation sampled
 * finely and transformed with Apache Commons Math 3.6.1 FastFourierTransformer.
 */
class EnvelopeSpectrumTest {

    /** Fine sampling of the envelope for the FFT, MHz, and the number of points (a power of 2). */
    private static final double FFT_RATE_MHZ = 100.0;
    private static final int FFT_POINTS = 1 << 16;

    /** |E(f)|^2 of the envelope on the FFT's frequency grid (index i at i FFT_RATE/FFT_POINTS MHz). */
    private static double[] envelopePowerSpectrum(double fcMhz, double bandwidth) {
        double a = BruteForcePulseScan.envelopeRatePerUs2(fcMhz, bandwidth);
        double[] samples = new double[FFT_POINTS];
        double dt = 1.0 / FFT_RATE_MHZ;
        for (int i = 0; i < FFT_POINTS; i++) {
            int k = i < FFT_POINTS / 2 ? i : i - FFT_POINTS; // centred at t = 0, wrapped
            double t = k * dt;
            samples[i] = Math.exp(-a * t * t);
        }
        Complex[] spectrum = new FastFourierTransformer(DftNormalization.STANDARD).transform(samples, TransformType.FORWARD);
        double[] power = new double[FFT_POINTS];
        for (int i = 0; i < FFT_POINTS; i++) {
            power[i] = spectrum[i].abs() * spectrum[i].abs();
        }
        return power;
    }

    /**
     * Fraction of the energy at |f| > f0 (both sides of 0 Hz), by summing the FFT bins, each bin
     * standing for a cell one bin wide about its frequency (the cell that straddles f0 counts in part).
     */
    private static double fractionAbove(double[] power, double f0Mhz) {
        double binMhz = FFT_RATE_MHZ / FFT_POINTS;
        double total = 0;
        double above = 0;
        for (int i = 0; i < FFT_POINTS; i++) {
            int k = i < FFT_POINTS / 2 ? i : i - FFT_POINTS;
            double f = Math.abs(k * binMhz);
            total += power[i];
            above += power[i] * Math.min(1.0, Math.max(0.0, (f + binMhz / 2 - f0Mhz) / binMhz));
        }
        return above / total;
    }

    @Test
    @DisplayName("5 MHz, 60 %, envelope sampled at 8 MHz: 9.3e-6 of the energy above 4 MHz and -42.7 dB there, "
            + "no band aliasing (the carrier band's 0.866 and -2.67 dB do not apply)")
    void envelopeAtEightMegahertz() {
        SamplingResult r = SamplingCalculator.compute(SamplingInput.builder(8.0, 5.0).bandwidthPercent(60.0)
                .signal(SampledSignal.ENVELOPE).build());
        double[] power = envelopePowerSpectrum(5.0, 0.6);
        double numeric = fractionAbove(power, 4.0);
        assertThat(numeric).isCloseTo(9.3e-6, within(0.05e-6));
        assertThat(r.energyAboveNyquistFraction()).isCloseTo(numeric, within(0.005 * numeric));
        // level at 4 MHz relative to 0 Hz (4 MHz falls between bins: interpolate in dB)
        double binMhz = FFT_RATE_MHZ / FFT_POINTS;
        int below = (int) Math.floor(4.0 / binMhz);
        double fraction = 4.0 / binMhz - below;
        double levelDb = 10 * Math.log10(power[below] / power[0]) * (1 - fraction)
                + 10 * Math.log10(power[below + 1] / power[0]) * fraction;
        assertThat(r.spectralLevelAtNyquistDb()).isCloseTo(levelDb, within(0.01));
        assertThat(r.spectralLevelAtNyquistDb()).isCloseTo(-42.67, within(0.01));
        assertThat(r.hasWarning(SamplingCalculator.BAND_ALIASING)).isFalse();
        assertThat(r.hasWarning(SamplingCalculator.NYQUIST_LEVEL_ABOVE_MINUS_40_DB)).isFalse();
        // The same rate for RF: the carrier band is cut near its middle.
        SamplingResult rf = SamplingCalculator.compute(SamplingInput.builder(8.0, 5.0).bandwidthPercent(60.0).build());
        assertThat(rf.energyAboveNyquistFraction()).isCloseTo(0.866, within(0.001));
        assertThat(rf.hasWarning(SamplingCalculator.BAND_ALIASING)).isTrue();
    }

    @ParameterizedTest(name = "envelope of {1} MHz, {2} % sampled at {0} MHz")
    @CsvSource({"8, 5, 60", "4, 5, 60", "3, 5, 60", "5, 10, 30", "2, 2.25, 100", "20, 10, 100"})
    @DisplayName("ENVELOPE: energy above fs/2 and the level there match the FFT of the sampled envelope")
    void envelopeFiguresMatchTheFft(double fsMhz, double fMhz, double bandwidthPercent) {
        SamplingResult r = SamplingCalculator.compute(SamplingInput.builder(fsMhz, fMhz)
                .bandwidthPercent(bandwidthPercent)
                .signal(SampledSignal.ENVELOPE).build());
        double[] power = envelopePowerSpectrum(fMhz, bandwidthPercent / 100.0);
        double numeric = fractionAbove(power, fsMhz / 2.0);
        // the bin width (0.0015 MHz) limits the FFT's own accuracy: 0.5 % relative or 1e-9 absolute
        assertThat(r.energyAboveNyquistFraction()).isCloseTo(numeric, within(1e-9 + 0.005 * numeric));
        double binMhz = FFT_RATE_MHZ / FFT_POINTS;
        int bin = (int) Math.round(fsMhz / 2.0 / binMhz);
        double levelDb = 10 * Math.log10(power[bin] / power[0]);
        double levelAtBinDb = r.spectralLevelAtNyquistDb() * Math.pow(bin * binMhz / (fsMhz / 2.0), 2);
        assertThat(levelAtBinDb).isCloseTo(levelDb, within(0.01 + 1e-4 * Math.abs(levelDb)));
    }

    @Test
    @DisplayName("ENVELOPE aliasing warning at twice the envelope's -6 dB edge bw fc/2 (5 MHz, 60 %: 3 MHz), not at 2 fu")
    void envelopeBandAliasingFollowsTheEnvelopeSpectrum() {
        assertThat(envelopeAt(3.0).hasWarning(SamplingCalculator.BAND_ALIASING)).isTrue();
        assertThat(envelopeAt(3.001).hasWarning(SamplingCalculator.BAND_ALIASING)).isFalse();
        // 12 MHz would alias the RF band (fu = 6.5 MHz) but not the envelope
        assertThat(envelopeAt(12.0).hasWarning(SamplingCalculator.BAND_ALIASING)).isFalse();
    }

    private static SamplingResult envelopeAt(double fsMhz) {
        return SamplingCalculator.compute(SamplingInput.builder(fsMhz, 5.0).bandwidthPercent(60.0)
                .signal(SampledSignal.ENVELOPE).build());
    }
}
