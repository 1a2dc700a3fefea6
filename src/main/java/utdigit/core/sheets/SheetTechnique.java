package utdigit.core.sheets;

/** The technique of a technique sheet. */
public enum SheetTechnique {
    /** Conventional single-element pulse-echo (straight or angle beam). */
    PULSE_ECHO,
    /** Phased array with focal laws (sectorial or linear scans). */
    PHASED_ARRAY,
    /** Time-of-flight diffraction with a transmitter-receiver pair. */
    TOFD,
    /** Full matrix capture with total focusing method imaging. */
    TFM
}
