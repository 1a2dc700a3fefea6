package utdigit.core.timing;

/** Where a time of flight is measured from; decides how the sampling quantizes it. */
public enum TimeReference {
    /**
     * From the trigger, synchronous with the sampling clock: one quantized instant, worst-case
     * error dt/2, standard uncertainty dt/sqrt(12) (rectangular, JCGM 100:2008 (GUM) 4.3.7).
     */
    TRIGGER,
    /**
     * TOFD only: from the lateral wave, itself read at a sample. A difference of two quantized
     * instants: worst-case error dt, standard uncertainty dt/sqrt(6) (triangular, JCGM 100:2008
     * (GUM) 4.3.9).
     */
    LATERAL_WAVE
}
