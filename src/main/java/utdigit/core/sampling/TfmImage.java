package utdigit.core.sampling;

/**
 * What a TFM image holds at each grid point, deciding how a depth step dz loses amplitude
 * (derived model; the code's own amplitude-fidelity check on a reference reflector governs).
 */
public enum TfmImage {
    /**
     * The RF (signed) image: in pulse-echo it repeats every lambda/2 in depth, so a step dz loses
     * -20 log10(cos(2 pi dz / lambda)) from the carrier, plus 6 (dz/w)^2 from the envelope when the
     * bandwidth is known (w the depth response's -6 dB width). No bound exists for dz >= lambda/4.
     */
    RF,
    /**
     * The envelope (magnitude) image: a step dz loses only 6 (dz/w)^2 dB from the envelope, w the
     * depth response's -6 dB width v tau(-6 dB)/2; needs the bandwidth.
     */
    ENVELOPE
}
