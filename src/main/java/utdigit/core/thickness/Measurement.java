package utdigit.core.thickness;

/** How the thickness is timed; decides how the sampling quantizes the measured time. */
public enum Measurement {
    /**
     * From the trigger, synchronous with the sampling clock, to the first back-wall echo (one
     * round trip): one quantized instant, standard uncertainty dt/sqrt(12) (rectangular, JCGM
     * 100:2008 (GUM) 4.3.7), worst case dt/2.
     */
    FIRST_ECHO,
    /**
     * Between two back-wall echoes m round trips apart (echo_spacing m): a difference of two
     * quantized instants, standard uncertainty dt/sqrt(6) (triangular, JCGM 100:2008 (GUM)
     * 4.3.9), worst case dt; excludes the couplant, wedge or delay-line time.
     */
    ECHO_TO_ECHO
}
