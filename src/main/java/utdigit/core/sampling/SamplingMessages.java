package utdigit.core.sampling;

import static utdigit.core.common.MessageNumbers.rounded;
import static utdigit.core.sampling.SamplingCalculator.BANDWIDTH_ABOVE_100_PERCENT;
import static utdigit.core.sampling.SamplingCalculator.BAND_ALIASING;
import static utdigit.core.sampling.SamplingCalculator.COMPRESSED_DATA_ALIASING;
import static utdigit.core.sampling.SamplingCalculator.NYQUIST_LEVEL_ABOVE_MINUS_40_DB;
import static utdigit.core.sampling.SamplingCalculator.NYQUIST_LEVEL_WARNING_DB;
import static utdigit.core.sampling.SamplingCalculator.PEAK_PRESERVING_POSITIVE_PEAK;
import static utdigit.core.sampling.SamplingCalculator.PULSE_LOSS_NOT_DEFINED;
import static utdigit.core.sampling.SamplingCalculator.SAMPLES_PER_PERIOD_AT_MOST_2;
import static utdigit.core.sampling.SamplingCalculator.SEARCH_BOUND_REACHED;
import static utdigit.core.sampling.SamplingCalculator.SINE_BOUND_NOT_APPLICABLE;
import static utdigit.core.sampling.SamplingCalculator.SLOWER_RATES_ALSO_PASS;
import static utdigit.core.sampling.SamplingCalculator.TFM_ENVELOPE_TERM_OMITTED;
import static utdigit.core.sampling.SamplingCalculator.TFM_GRID_STEP_AT_OR_ABOVE_QUARTER_WAVELENGTH;
import static utdigit.core.sampling.SamplingCalculator.TFM_STEP_NOT_BELOW_RESPONSE_WIDTH;

import java.util.Locale;
import utdigit.core.common.Warning;

/** Every warning and failure text of the sampling assessment, one factory per condition. */
final class SamplingMessages {
    private SamplingMessages() {}

    static Warning samplesPerPeriodAtMost2(double samplesPerPeriod, boolean sineBoundWithoutValue) {
        return Warning.of(SAMPLES_PER_PERIOD_AT_MOST_2, String.format(Locale.ROOT,
                "samples_per_period is %s: 2 or fewer samples per period of frequency_mhz undersample the "
                        + "carrier (an echo can be missed or read at an alias)%s",
                rounded(samplesPerPeriod),
                sineBoundWithoutValue
                        ? "; sine_amplitude_loss_db is null: the sine bound has no value at n <= 2" : ""));
    }

    static Warning sineBoundNotApplicable() {
        return Warning.of(SINE_BOUND_NOT_APPLICABLE,
                "sine_amplitude_loss_db is null: with signal ENVELOPE the envelope is sampled, not the carrier, "
                        + "so the sine bound does not apply (see pulse_amplitude_loss_db, which needs "
                        + "bandwidth_percent); required_samples_per_period and required_sampling_frequency_mhz "
                        + "stay the sine model's figures for comparison with code rules");
    }

    static Warning bandwidthAbove100Percent() {
        return Warning.of(BANDWIDTH_ABOVE_100_PERCENT,
                "bandwidth_percent is above 100: the real pulse's negative-frequency image moves the lower "
                        + "band edge of the one-sided model; pulse figures are less reliable");
    }

    static Warning envelopeAliasing(double amplitudeMhz, double envelopeEdgeMhz) {
        return Warning.of(BAND_ALIASING, String.format(Locale.ROOT,
                "the rate that decides amplitude (%s MHz) is at or below twice the -6 dB edge of the "
                        + "detected envelope's spectrum (%s MHz, centred at 0 Hz): the envelope aliases",
                rounded(amplitudeMhz), rounded(envelopeEdgeMhz)));
    }

    static Warning bandAliasing(double amplitudeMhz, double upperMhz) {
        return Warning.of(BAND_ALIASING, String.format(Locale.ROOT,
                "the rate that decides amplitude (%s MHz) is at or below twice the upper -6 dB band edge "
                        + "(%s MHz): the probe's band aliases", rounded(amplitudeMhz), rounded(upperMhz)));
    }

    static Warning nyquistLevelAboveLimit(double spectralLevelAtNyquistDb, boolean envelope) {
        return Warning.of(NYQUIST_LEVEL_ABOVE_MINUS_40_DB, String.format(Locale.ROOT,
                "spectral_level_at_nyquist_db is %s, above %s dB: the pulse model%s has significant energy "
                        + "at the Nyquist frequency (a model value; the anti-alias filter decides)",
                rounded(spectralLevelAtNyquistDb), rounded(NYQUIST_LEVEL_WARNING_DB),
                envelope ? "'s detected envelope" : ""));
    }

    static Warning compressedDataAliasing(double effectiveMhz, String what, double bandTopMhz) {
        return Warning.of(COMPRESSED_DATA_ALIASING, String.format(Locale.ROOT,
                "decimation_mode PEAK_PRESERVING keeps each group's largest sample, so the amplitude figures follow "
                        + "the raw rate; but processing of the compressed data (TFM, SAFT, filtering, FFT) sees "
                        + "fs/m = %s MHz and aliases above fs/(2m) = %s MHz, at or below %s (%s MHz)",
                rounded(effectiveMhz), rounded(effectiveMhz / 2.0), what, rounded(bandTopMhz)));
    }

    static Warning pulseLossNotDefined(double amplitudeMhz, double carrierSamples, double carrierMhz) {
        return Warning.of(PULSE_LOSS_NOT_DEFINED, String.format(Locale.ROOT,
                "pulse_amplitude_loss_db is null: the rate that decides amplitude (%s MHz) gives %s samples per "
                        + "period of the pulse model's carrier (%s MHz); at 2 or fewer a sample can fall on every "
                        + "zero crossing and no worst case exists",
                rounded(amplitudeMhz), rounded(carrierSamples), rounded(carrierMhz)));
    }

    static Warning peakPreservingPositivePeak() {
        return Warning.of(PEAK_PRESERVING_POSITIVE_PEAK,
                "decimation_mode PEAK_PRESERVING keeps the largest |sample| of each group of decimation_factor "
                        + "samples: a positive peak can be displaced by a larger negative half-wave of the same group, "
                        + "which pulse_amplitude_loss_db (at the raw rate) does not model");
    }

    static Warning lossSearchBound(long limit) {
        return Warning.of(SEARCH_BOUND_REACHED, String.format(Locale.ROOT,
                "pulse_amplitude_loss_db is null: the search over the sampling phase reached its bound of %d "
                        + "pulse values (the pulse model is close to a continuous wave at this bandwidth and "
                        + "frequency); the closed form cos(pi/n) exp(-a dt^2/4) bounds the loss from above",
                limit));
    }

    static Warning rateSearchBound(long limit) {
        return Warning.of(SEARCH_BOUND_REACHED, String.format(Locale.ROOT,
                "required_sampling_frequency_pulse_mhz is null: no finite rate was found within the search's "
                        + "bound of %d pulse values (amplitude_tolerance_db too small to resolve, or a pulse "
                        + "model too close to a continuous wave); required_sampling_frequency_mhz gives the sine "
                        + "model's rate", limit));
    }

    static Warning slowerRatesAlsoPass(double requiredMhz, double slowerMhz) {
        return Warning.of(SLOWER_RATES_ALSO_PASS, String.format(Locale.ROOT,
                "the pulse loss is not monotonic in the sampling frequency: slower rates than "
                        + "required_sampling_frequency_pulse_mhz (%s MHz) also pass, e.g. %s MHz, but some rates "
                        + "in between do not",
                rounded(requiredMhz), rounded(slowerMhz)));
    }

    static Warning tfmStepAtOrAboveQuarterWavelength(double stepMm, double quarterWavelengthMm) {
        return Warning.of(TFM_GRID_STEP_AT_OR_ABOVE_QUARTER_WAVELENGTH, String.format(Locale.ROOT,
                "tfm_grid_amplitude_loss_db is null: tfm_grid_spacing_mm (%s mm) is at or above a quarter "
                        + "wavelength (%s mm); a grid point can fall on a zero of the RF image, so no bound exists",
                rounded(stepMm), rounded(quarterWavelengthMm)));
    }

    static Warning tfmEnvelopeTermOmitted() {
        return Warning.of(TFM_ENVELOPE_TERM_OMITTED,
                "tfm_grid_amplitude_loss_db holds the carrier term only: without bandwidth_percent the envelope "
                        + "term 6 (dz/w)^2 is omitted and the loss is underestimated");
    }

    static Warning stepNotBelowWidth(String field, double stepMm, double widthMm) {
        return Warning.of(TFM_STEP_NOT_BELOW_RESPONSE_WIDTH, String.format(Locale.ROOT,
                "%s (%s mm) is not below the image response's -6 dB width (%s mm): the quadratic loss 6 (d/w)^2 "
                        + "is a rough model there, and the reflector may be missed",
                field, rounded(stepMm), rounded(widthMm)));
    }
}
