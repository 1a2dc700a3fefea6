package utdigit.core.common;

/**
 * Decibels of amplitude ratios. The project's convention: -X dB means exactly 10^(-X/20) (so
 * "-6 dB" is 0.501187, not 0.5). Computed with {@link StrictMath} for platform-independent bits.
 */
public final class Decibels {
    private Decibels() {}

    /** Amplitude ratio of a level in dB: 10^(levelDb/20). */
    public static double toRatio(double levelDb) {
        return StrictMath.pow(10.0, levelDb / 20.0);
    }

    /** Level in dB of an amplitude ratio: 20 log10(ratio); ratio must be > 0. */
    public static double fromRatio(double ratio) {
        return 20.0 * StrictMath.log10(ratio);
    }
}
