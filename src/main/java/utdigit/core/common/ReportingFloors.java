package utdigit.core.common;

/**
 * Floors below which a model's level or fraction means nothing to a reader: the Gaussian pulse
 * model's spectrum falls without limit (-1573 dB, 7.8e-160 of the energy), while any real probe,
 * instrument noise and the converter's own range end tens of dB higher. Such values are reported at
 * the floor: a level of at most {@link #LEVEL_FLOOR_DB} dB as that level, a fraction of at most
 * {@link #FRACTION_FLOOR} as that fraction (common practice, no published source: -200 dB is far
 * below the dynamic range of any digitizer of 32 bits, 193 dB).
 */
public final class ReportingFloors {
    private ReportingFloors() {}

    /** The lowest level reported, dB. */
    public static final double LEVEL_FLOOR_DB = -200.0;
    /** The smallest fraction reported. */
    public static final double FRACTION_FLOOR = 1e-20;

    /** A level, at most down to the floor; null stays null. */
    public static Double level(Double levelDb) {
        return levelDb == null ? null : Math.max(levelDb, LEVEL_FLOOR_DB);
    }

    /** A fraction, at least the floor; null stays null. */
    public static Double fraction(Double fraction) {
        return fraction == null ? null : Math.max(fraction, FRACTION_FLOOR);
    }
}
