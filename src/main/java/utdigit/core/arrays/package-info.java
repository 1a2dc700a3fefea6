/**
 * Linear phased arrays: the rectangular active aperture's near field and beam spread (sinc
 * directivity) and element pitch against grating lobes over the steering range used.
 */
package utdigit.core.arrays;
