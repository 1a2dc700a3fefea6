package utdigit.core.pulse;

import utdigit.core.common.Checks;
import utdigit.core.common.Decibels;

/**
 * Gaussian-modulated cosine model of a broadband UT pulse.
 *
 * <p>s(t) = exp(-a t^2) cos(2 pi fc t), carrier phase 0, with
 * a = -(pi fc bw)^2 / (4 ln r), r = 10^(-6/20), so that the one-sided spectrum
 * exp(-pi^2 (f - fc)^2 / a) is exactly -6 dB at fc +/- bw fc / 2. This is the parameterisation of
 * scipy.signal.gausspulse (read: its source and documentation). Units: fc in MHz, t in us, a in
 * 1/us^2. The edges are those of the one-sided model; for bw near or above 100 % the negative
 * frequency image of the real pulse moves the real lower edge (callers warn above 100 %).
 *
 * @param carrierMhz carrier frequency fc of the model, MHz (> 0)
 * @param fractionalBandwidth -6 dB fractional bandwidth bw of the model (0.6 for 60 %), > 0
 * @param envelopeRatePerUs2 the envelope constant a, 1/us^2
 */
public record GaussianPulse(double carrierMhz, double fractionalBandwidth, double envelopeRatePerUs2) {

    /** The reference level of the bandwidth: -6 dB as an amplitude ratio, 10^(-6/20). */
    public static final double BANDWIDTH_REFERENCE_RATIO = Decibels.toRatio(-6.0);

    /** The model of carrier {@code carrierMhz} and -6 dB fractional bandwidth. */
    public static GaussianPulse of(double carrierMhz, double fractionalBandwidth) {
        Checks.positive("carrier_mhz", carrierMhz);
        Checks.positive("fractional_bandwidth", fractionalBandwidth);
        double x = StrictMath.PI * carrierMhz * fractionalBandwidth;
        double a = -(x * x) / (4.0 * StrictMath.log(BANDWIDTH_REFERENCE_RATIO));
        return new GaussianPulse(carrierMhz, fractionalBandwidth, a);
    }

    /** The pulse s(t) at time {@code timeUs} from its peak. */
    public double amplitude(double timeUs) {
        return envelope(timeUs) * StrictMath.cos(2.0 * StrictMath.PI * carrierMhz * timeUs);
    }

    /** The envelope exp(-a t^2) at time {@code timeUs} from the peak. */
    public double envelope(double timeUs) {
        return StrictMath.exp(-envelopeRatePerUs2 * timeUs * timeUs);
    }

    /**
     * Offset in MHz from the carrier at which the model's spectrum is {@code levelDb} below its
     * peak: (bw fc / 2) sqrt(L / 6) for L = |levelDb|.
     */
    public double edgeOffsetMhz(double levelDb) {
        double l = StrictMath.abs(levelDb);
        return carrierMhz * fractionalBandwidth / 2.0 * StrictMath.sqrt(l / 6.0);
    }

    /** Lower frequency, MHz, where the spectrum is {@code levelDb} below its peak; may be <= 0. */
    public double lowerEdgeMhz(double levelDb) {
        return carrierMhz - edgeOffsetMhz(levelDb);
    }

    /** Upper frequency, MHz, where the spectrum is {@code levelDb} below its peak. */
    public double upperEdgeMhz(double levelDb) {
        return carrierMhz + edgeOffsetMhz(levelDb);
    }

    /**
     * Full envelope duration in us between the points where the envelope is {@code levelDb}
     * below its peak: 2 sqrt(-ln r_t / a), r_t = 10^(-L/20).
     */
    public double envelopeDurationUs(double levelDb) {
        double r = Decibels.toRatio(-StrictMath.abs(levelDb));
        return 2.0 * StrictMath.sqrt(-StrictMath.log(r) / envelopeRatePerUs2);
    }

    /** Number of carrier cycles within the envelope duration at {@code levelDb}. */
    public double cycles(double levelDb) {
        return envelopeDurationUs(levelDb) * carrierMhz;
    }

    /**
     * Spectral level in dB (<= 0) of the model at {@code frequencyMhz}:
     * -6 ((f - fc) / (bw fc / 2))^2.
     */
    public double spectralLevelDb(double frequencyMhz) {
        double u = (frequencyMhz - carrierMhz) / (fractionalBandwidth * carrierMhz / 2.0);
        return -6.0 * u * u;
    }

    /**
     * Spectral level in dB (<= 0) of the model's envelope exp(-a t^2) at {@code frequencyMhz}: the
     * detected envelope's spectrum is the carrier band moved to 0 Hz, -6 (f / (bw fc / 2))^2.
     */
    public double envelopeSpectralLevelDb(double frequencyMhz) {
        return spectralLevelDb(carrierMhz + frequencyMhz);
    }

    /**
     * Standard deviation in MHz of the model's power spectrum (a Gaussian in f about fc, and of the
     * envelope's about 0 Hz): sigma_f = sqrt(a) / (2 pi).
     */
    public double powerSpectrumSigmaMhz() {
        return StrictMath.sqrt(envelopeRatePerUs2) / (2.0 * StrictMath.PI);
    }
}
