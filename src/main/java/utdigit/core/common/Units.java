package utdigit.core.common;

/**
 * Unit conversions, in one place. Each constant states its definition.
 */
public final class Units {
    private Units() {}

    /** Millimetres per inch: 25.4 exactly (international yard and pound agreement, 1959). */
    public static final double MM_PER_IN = 25.4;

    /** 1 in/us = 25.4 mm/us = 25 400 m/s exactly. */
    public static final double M_PER_S_PER_IN_PER_US = 25_400.0;

    public static double inToMm(double lengthIn) {
        return lengthIn * MM_PER_IN;
    }

    public static double mmToIn(double lengthMm) {
        return lengthMm / MM_PER_IN;
    }

    public static double inPerUsToMPerS(double velocityInPerUs) {
        return velocityInPerUs * M_PER_S_PER_IN_PER_US;
    }

    public static double mPerSToInPerUs(double velocityMPerS) {
        return velocityMPerS / M_PER_S_PER_IN_PER_US;
    }

    /** m/s to mm/us: 1 m/s = 1e-3 mm/us. */
    public static double mPerSToMmPerUs(double velocityMPerS) {
        return velocityMPerS * 1e-3;
    }
}
