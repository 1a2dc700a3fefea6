/**
 * Time-of-flight resolution: what one sample of the time base is worth in millimetres of sound
 * path for pulse-echo (straight and angle beam), through-transmission and TOFD, and the TOFD
 * geometry (depth from time, depth step per sample, pulse-limited resolution, dead zones).
 */
package utdigit.core.timing;
