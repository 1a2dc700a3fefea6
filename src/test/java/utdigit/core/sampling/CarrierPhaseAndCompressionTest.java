package utdigit.core.sampling;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * What the fixed carrier phase and PEAK_PRESERVING compression leave out of the pulse figures.
 * The carrier-phase figures the reference text states are checked here by brute force: the
 * Gaussian echo exp(-a t^2) cos(2 pi fc t + psi) (scipy.signal.gausspulse parameterisation, written
 * out) sampled on grids of sampling phase and carrier phase, read as the largest |sample| against
 * its own true peak max|s| (found on a fine time grid).
 */
class CarrierPhaseAndCompressionTest {

    /** Worst loss over the sampling phase for carrier phase psi, dB, against the echo's own peak. */
    private static double bruteLossDb(double bandwidth, double samplesPerPeriod, double psi) {
        double fc = 1.0;
        double a = BruteForcePulseScan.envelopeRatePerUs2(fc, bandwidth);
        double dt = 1.0 / (samplesPerPeriod * fc);
        double truePeak = 0;
        for (int i = -20000; i <= 20000; i++) {
            double t = i * 1e-4 / fc;
            truePeak = Math.max(truePeak, Math.abs(Math.exp(-a * t * t) * Math.cos(2 * Math.PI * fc * t + psi)));
        }
        int reach = (int) Math.ceil(Math.sqrt(Math.log(1e4) / a) / dt) + 2;
        double worst = Double.POSITIVE_INFINITY;
        int phases = 600;
        for (int p = 0; p < phases; p++) {
            double phi = dt * p / phases;
            double read = 0;
            for (int k = -reach; k <= reach; k++) {
                double t = k * dt + phi;
                read = Math.max(read, Math.abs(Math.exp(-a * t * t) * Math.cos(2 * Math.PI * fc * t + psi)));
            }
            worst = Math.min(worst, read);
        }
        return -20 * Math.log10(worst / truePeak);
    }

    /** The largest extra loss of any carrier phase (a grid of 24 over [0, pi)) over carrier phase 0. */
    private static double extraCostOfCarrierPhaseDb(double bandwidth, double samplesPerPeriod) {
        double atZero = bruteLossDb(bandwidth, samplesPerPeriod, 0.0);
        double extra = 0;
        for (int j = 1; j < 24; j++) {
            extra = Math.max(extra, bruteLossDb(bandwidth, samplesPerPeriod, Math.PI * j / 24) - atZero);
        }
        return extra;
    }

    @ParameterizedTest(name = "{0} bandwidth, {1} samples per period")
    @CsvSource({"0.4, 5", "0.6, 5", "0.8, 6", "1.0, 7", "0.6, 8", "0.4, 10"})
    @DisplayName("40-100 % at 5 or more samples per period: other carrier phases cost at most about 0.05 dB (as the reference says)")
    void broadbandCarrierPhaseCostIsSmall(double bandwidth, double samplesPerPeriod) {
        assertThat(extraCostOfCarrierPhaseDb(bandwidth, samplesPerPeriod)).isLessThan(0.055);
    }

    @Test
    @DisplayName("narrow bands and fewer samples cost more: 20 % at 5.3 (about 0.2 dB), 40 % at 2.8 (about 0.8 dB)")
    void narrowBandsAndFewSamplesCostMore() {
        assertThat(extraCostOfCarrierPhaseDb(0.2, 5.3)).isBetween(0.15, 0.3);
        assertThat(extraCostOfCarrierPhaseDb(0.4, 2.8)).isBetween(0.6, 0.9);
        assertThat(SamplingCalculator.compute(SamplingInput.builder(25.0, 5.0).bandwidthPercent(30.0)
                .build()).references())
                .anySatisfy(ref -> assertThat(ref.id()).isEqualTo(utdigit.core.common.Sources.PULSE_SAMPLING_LOSS.id()));
        assertThat(utdigit.core.common.Sources.PULSE_SAMPLING_LOSS.checkNote())
                .contains("carrier phase", "0.05 dB", "0.3 dB", "0.8 dB");
    }

    @Test
    @DisplayName("PEAK_PRESERVING: processing of the compressed data aliases above fs/(2m); warned when the band's upper -6 dB edge reaches it")
    void compressedDataAliasingIsWarned() {
        // 5 MHz, 60 %: fu = 6.5 MHz. 100 MHz / 8 = 12.5 MHz, aliasing above 6.25 MHz < 6.5 MHz: warned,
        // though the amplitude figures (at the raw 100 MHz) are fine.
        SamplingInput base = SamplingInput.builder(100.0, 5.0).bandwidthPercent(60.0).build();
        SamplingResult eight = SamplingCalculator.compute(base.toBuilder().decimationFactor(8)
                .decimationMode(DecimationMode.PEAK_PRESERVING).build());
        assertThat(eight.hasWarning(SamplingCalculator.COMPRESSED_DATA_ALIASING)).isTrue();
        assertThat(eight.hasWarning(SamplingCalculator.BAND_ALIASING)).isFalse();
        assertThat(eight.warnings()).filteredOn(w -> w.code().equals(SamplingCalculator.COMPRESSED_DATA_ALIASING))
                .singleElement().satisfies(w -> assertThat(w.message()).contains("6.25 MHz", "6.5 MHz"));
        // 100 MHz / 7 = 14.29 MHz, aliasing above 7.14 MHz: the -6 dB band stays below it
        assertThat(SamplingCalculator.compute(base.toBuilder().decimationFactor(7)
                .decimationMode(DecimationMode.PEAK_PRESERVING).build())
                .hasWarning(SamplingCalculator.COMPRESSED_DATA_ALIASING)).isFalse();
        // DROP by 8 says it through BAND_ALIASING (every figure follows fs/m), not this warning
        SamplingResult drop = SamplingCalculator.compute(base.toBuilder().decimationFactor(8)
                .decimationMode(DecimationMode.DROP).build());
        assertThat(drop.hasWarning(SamplingCalculator.COMPRESSED_DATA_ALIASING)).isFalse();
        assertThat(drop.hasWarning(SamplingCalculator.BAND_ALIASING)).isTrue();
        // without a bandwidth the nominal frequency decides: 100 / 24 = 4.17 MHz, aliasing above 2.08 MHz < 5 MHz
        assertThat(SamplingCalculator.compute(SamplingInput.builder(100.0, 5.0).decimationFactor(24)
                .decimationMode(DecimationMode.PEAK_PRESERVING)
                .build()).hasWarning(SamplingCalculator.COMPRESSED_DATA_ALIASING)).isTrue();
        // ENVELOPE: the envelope's own -6 dB edge bw fc/2 = 1.5 MHz decides: 100 / 32 = 3.125 MHz passes, 100 / 34 warns
        SamplingInput envelope = base.toBuilder().signal(SampledSignal.ENVELOPE).build();
        assertThat(SamplingCalculator.compute(envelope.toBuilder().decimationFactor(32)
                .decimationMode(DecimationMode.PEAK_PRESERVING).build())
                .hasWarning(SamplingCalculator.COMPRESSED_DATA_ALIASING)).isFalse();
        assertThat(SamplingCalculator.compute(envelope.toBuilder().decimationFactor(34)
                .decimationMode(DecimationMode.PEAK_PRESERVING).build())
                .hasWarning(SamplingCalculator.COMPRESSED_DATA_ALIASING)).isTrue();
    }
}
