package utdigit.core.materials;

/** The bulk wave mode whose velocity a calculation uses. */
public enum WaveMode {
    /** Compression wave, particle motion along the propagation direction. */
    LONGITUDINAL,
    /** Transverse wave; does not propagate in liquids. */
    SHEAR
}
