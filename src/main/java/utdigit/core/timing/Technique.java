package utdigit.core.timing;

/** The ultrasonic technique whose time base is assessed; each constant states its path per sample. */
public enum Technique {
    /**
     * One probe sends and receives; a sample of round-trip time dt is a one-way sound path of
     * v dt / 2 (definition).
     */
    PULSE_ECHO,
    /** A transmitter and a receiver on opposite sides; one sample is a sound path of v dt (definition). */
    THROUGH_TRANSMISSION,
    /**
     * Time-of-flight diffraction: a transmitter and a receiver symmetric about the flaw, probe
     * centre separation 2S; one sample changes the path over both legs by v dt (definition).
     */
    TOFD
}
