package utdigit.core.waveform;

import static utdigit.core.common.MessageNumbers.rounded;
import static utdigit.core.waveform.WaveformAnalyzer.CUT_LEVEL_DB;
import static utdigit.core.waveform.WaveformAnalyzer.ECHO_CUT_BY_RECORD;
import static utdigit.core.waveform.WaveformAnalyzer.EDGE_20DB_NOT_FOUND;
import static utdigit.core.waveform.WaveformAnalyzer.ENVELOPE_LEVEL_NOT_REACHED;
import static utdigit.core.waveform.WaveformAnalyzer.MODEL_NOT_AVAILABLE;
import static utdigit.core.waveform.WaveformAnalyzer.MODEL_OPTIMISTIC;
import static utdigit.core.waveform.WaveformAnalyzer.PULSE_LOSS_NOT_DEFINED;
import static utdigit.core.waveform.WaveformAnalyzer.RECORD_ENERGY_NEAR_NYQUIST;
import static utdigit.core.waveform.WaveformAnalyzer.TUKEY_FRACTION;

import java.util.Locale;
import utdigit.core.common.CalculationException;
import utdigit.core.common.Warning;
import utdigit.core.sampling.SamplingCalculator;

/** Every warning and failure text of the waveform analysis, one factory per condition. */
final class WaveformMessages {
    private WaveformMessages() {}

    static Warning echoCut() {
        return Warning.of(ECHO_CUT_BY_RECORD, String.format(Locale.ROOT,
                "the envelope at an end of the record is within %s dB of its peak: the echo is cut by the record, "
                        + "so the spectrum is taken through a Tukey window (%s %% tapered) and its figures are "
                        + "approximate; record the whole echo", rounded(CUT_LEVEL_DB), rounded(100 * TUKEY_FRACTION)));
    }

    static CalculationException recordAliased(double near, double nearLimitMhz, double fsRec) {
        return CalculationException.impossible(String.format(Locale.ROOT,
                "the record holds %s of its spectral energy above %s MHz (0.8 of its own Nyquist frequency, "
                        + "record_sampling_frequency_mhz %s): it is sampled too slowly for its pulse (or the "
                        + "rate is wrong), so its spectrum may be aliased; record it at a higher rate",
                rounded(near), rounded(nearLimitMhz), rounded(fsRec)),
                "samples", "record_sampling_frequency_mhz");
    }

    static Warning energyNearNyquist(double near, double recordNyquistMhz) {
        return Warning.of(RECORD_ENERGY_NEAR_NYQUIST, String.format(Locale.ROOT,
                "the record holds %s of its spectral energy above 0.8 of its own Nyquist frequency (%s MHz): "
                        + "noise or an under-sampled record; the measured figures may be affected",
                rounded(near), rounded(recordNyquistMhz)));
    }

    static Warning edge20NotFound(boolean lowerMissing) {
        return Warning.of(EDGE_20DB_NOT_FOUND, "the spectrum does not fall 20 dB below its peak "
                + (lowerMissing ? "above 0 Hz" : "below the record's Nyquist frequency")
                + ": that -20 dB edge is null");
    }

    static Warning envelopeLevelNotReached(boolean sixMissing) {
        return Warning.of(ENVELOPE_LEVEL_NOT_REACHED, "the envelope does not fall "
                + (sixMissing ? "6" : "20") + " dB below its peak on both sides inside the record: "
                + (sixMissing ? "pulse_duration_6db_us, cycles_6db and pulse_duration_20db_us are null"
                : "pulse_duration_20db_us is null"));
    }

    static Warning modelNotAvailable() {
        return Warning.of(MODEL_NOT_AVAILABLE, "the measured bandwidth is 200 % or more: no Gaussian "
                + "pulse model of it is formed, so the model_ figures are null");
    }

    static Warning pulseLossTooFewSamples(double amplitudeMhz, double centreMhz) {
        return Warning.of(PULSE_LOSS_NOT_DEFINED, String.format(Locale.ROOT,
                "pulse_amplitude_loss_db is null: the rate that decides amplitude (%s MHz) gives 2 or fewer "
                        + "samples per period of the measured centre frequency (%s MHz)",
                rounded(amplitudeMhz), rounded(centreMhz)));
    }

    static Warning lossSearchBound(long limit) {
        return Warning.of(SamplingCalculator.SEARCH_BOUND_REACHED, String.format(Locale.ROOT,
                "pulse_amplitude_loss_db is null: the search over the sampling phase reached its bound "
                        + "of %d values of the reconstructed record", limit));
    }

    static Warning noSampleAboveZero() {
        return Warning.of(PULSE_LOSS_NOT_DEFINED, "pulse_amplitude_loss_db is null: at some "
                + "sampling phase no sample reads above zero");
    }

    static Warning rateSearchBound(long limit) {
        return Warning.of(SamplingCalculator.SEARCH_BOUND_REACHED, String.format(Locale.ROOT,
                "required_sampling_frequency_pulse_mhz is null: the search for the record's rate reached "
                        + "its bound of %d values of the reconstructed record (amplitude_tolerance_db too "
                        + "small to resolve on this record)", limit));
    }

    static Warning modelRateNotSearched() {
        return Warning.of(MODEL_NOT_AVAILABLE, "model_required_sampling_frequency_pulse_mhz is "
                + "null: the model's rate search covers bandwidths of 1 % and above");
    }

    /** A warning of the Gaussian model's sampling assessment, marked as the model's. */
    static Warning ofModel(Warning w) {
        return Warning.of(w.code(), "Gaussian model: " + w.message());
    }

    static Warning modelOptimistic(double lossDb, double modelLossDb) {
        return Warning.of(MODEL_OPTIMISTIC, String.format(Locale.ROOT,
                "the record loses %s dB at this rate, the Gaussian model of its band %s dB: the model is "
                        + "optimistic for this probe; judge the setting on the record",
                rounded(lossDb), rounded(modelLossDb)));
    }
}
