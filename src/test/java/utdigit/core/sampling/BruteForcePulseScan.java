package utdigit.core.sampling;

/**
 * An independent brute-force check of the sampled-peak loss of the Gaussian pulse, for tests only.
 * It uses no property of the pulse (no symmetry, no closed-form bound, no log-concavity): the pulse
 * exp(-a t^2) cos(2 pi fc t) is written here from the scipy.signal.gausspulse definition
 * (a = -(pi fc bw)^2 / (4 ln 10^(-6/20))), evaluated with {@link Math}, and the worst phase is found
 * on a grid over the whole interval [0, dt), then on a fine grid around every grid phase within the
 * grid's error bound.
 */
final class BruteForcePulseScan {
    private BruteForcePulseScan() {}

    static final int COARSE_PHASES = 50_000;
    static final int FINE_PHASES = 1_001;

    /** The scipy.signal.gausspulse envelope constant a, 1/us^2, for fc in MHz. */
    static double envelopeRatePerUs2(double fcMhz, double bandwidthFraction) {
        double x = Math.PI * fcMhz * bandwidthFraction;
        return -(x * x) / (4.0 * Math.log(Math.pow(10.0, -6.0 / 20.0)));
    }

    /** Worst-case loss in dB over the sampling phase, by brute force. */
    static double lossDb(double fcMhz, double bandwidthFraction, double samplesPerPeriod, boolean absolute) {
        double a = envelopeRatePerUs2(fcMhz, bandwidthFraction);
        double dt = 1.0 / (samplesPerPeriod * fcMhz);
        // Samples whose envelope is below 1e-3 (-60 dB) cannot hold a read peak for losses below 60 dB.
        int kMax = (int) Math.ceil(Math.sqrt(Math.log(1e3) / a) / dt) + 2;
        double h = dt / COARSE_PHASES;
        double[] read = new double[COARSE_PHASES];
        double coarseMin = Double.POSITIVE_INFINITY;
        for (int i = 0; i < COARSE_PHASES; i++) {
            read[i] = read(a, fcMhz, dt, kMax, i * h, absolute);
            coarseMin = Math.min(coarseMin, read[i]);
        }
        // |d read/d phi| <= |ds/dt| <= 2 pi fc + sqrt(2 a): the true minimum lies within slope * h of a grid value.
        double slope = 2.0 * Math.PI * fcMhz + Math.sqrt(2.0 * a);
        double best = coarseMin;
        for (int i = 0; i < COARSE_PHASES; i++) {
            if (read[i] <= coarseMin + slope * h) {
                for (int j = 0; j < FINE_PHASES; j++) {
                    double phi = i * h - h + 2.0 * h * j / (FINE_PHASES - 1);
                    best = Math.min(best, read(a, fcMhz, dt, kMax, phi, absolute));
                }
            }
        }
        return -20.0 * Math.log10(best);
    }

    private static double read(double a, double fcMhz, double dt, int kMax, double phi, boolean absolute) {
        double max = Double.NEGATIVE_INFINITY;
        for (int k = -kMax; k <= kMax; k++) {
            double t = k * dt + phi;
            double s = Math.exp(-a * t * t) * Math.cos(2.0 * Math.PI * fcMhz * t);
            max = Math.max(max, absolute ? Math.abs(s) : s);
        }
        return max;
    }
}
