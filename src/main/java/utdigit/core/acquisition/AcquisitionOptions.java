package utdigit.core.acquisition;

/**
 * The options an acquisition budget used, defaults applied, so that the web layer can echo the
 * defaults that had an effect. A field that did not apply to the request is {@code null}.
 *
 * @param decimationFactor the decimation factor m used (default 1)
 * @param focalLaws phased array: the focal laws per position used (default 1); null with a matrix
 *     capture
 * @param capture matrix capture: FMC (default) or HMC; null for phased array
 * @param averaging firings averaged per recorded A-scan (default 1)
 * @param wraparoundDecayFactor decay factor q used (default 1); null without a round trip
 */
public record AcquisitionOptions(
        int decimationFactor, Integer focalLaws, CaptureMode capture, int averaging, Double wraparoundDecayFactor) {}
