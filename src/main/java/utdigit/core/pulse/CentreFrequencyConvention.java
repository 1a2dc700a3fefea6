package utdigit.core.pulse;

import utdigit.core.common.Checks;

/**
 * How the probe's centre frequency relates to its -6 dB band edges fl and fu. In both conventions
 * the fractional bandwidth is BW = (fu - fl) / fc.
 */
public enum CentreFrequencyConvention {
    /**
     * fc = (fl + fu) / 2, so fl,u = fc (1 -/+ bw/2) (src/docs/methods.md 2.1). The pulse model's
     * carrier is the nominal frequency itself.
     */
    ARITHMETIC {
        @Override
        public double[] bandEdgesMhz(double centreMhz, double fractionalBandwidth) {
            double half = centreMhz * fractionalBandwidth / 2.0;
            return new double[] {centreMhz - half, centreMhz + half};
        }

        @Override
        public double centreFromEdgesMhz(double lowerMhz, double upperMhz) {
            return (lowerMhz + upperMhz) / 2.0;
        }
    },
    /**
     * fc = sqrt(fl fu) (src/docs/methods.md 2.1), so with B = bw fc:
     * fl,u = (-/+B + sqrt(B^2 + 4 fc^2)) / 2. The pulse model is then centred on (fl + fu)/2 with
     * fractional bandwidth B / ((fl + fu)/2).
     */
    GEOMETRIC {
        @Override
        public double[] bandEdgesMhz(double centreMhz, double fractionalBandwidth) {
            double b = fractionalBandwidth * centreMhz;
            double root = StrictMath.sqrt(b * b + 4.0 * centreMhz * centreMhz);
            return new double[] {(-b + root) / 2.0, (b + root) / 2.0};
        }

        @Override
        public double centreFromEdgesMhz(double lowerMhz, double upperMhz) {
            return StrictMath.sqrt(lowerMhz * upperMhz);
        }
    };

    /**
     * The -6 dB band edges {lower, upper} in MHz of a probe of nominal centre {@code centreMhz}
     * and fractional -6 dB bandwidth {@code fractionalBandwidth} (0.6 for 60 %).
     */
    public abstract double[] bandEdgesMhz(double centreMhz, double fractionalBandwidth);

    /**
     * The centre frequency, MHz, of measured -6 dB band edges {@code lowerMhz} < {@code upperMhz}
     * (both > 0) by this convention: the inverse of {@link #bandEdgesMhz}. The fractional bandwidth
     * is then (fu - fl) / fc.
     */
    public abstract double centreFromEdgesMhz(double lowerMhz, double upperMhz);

    /**
     * The Gaussian pulse model whose -6 dB edges are this convention's band edges: carrier at the
     * arithmetic middle of the edges, fractional bandwidth (fu - fl) / carrier.
     */
    public GaussianPulse pulseModel(double centreMhz, double fractionalBandwidth) {
        Checks.positive("frequency_mhz", centreMhz);
        Checks.positive("bandwidth", fractionalBandwidth);
        double[] edges = bandEdgesMhz(centreMhz, fractionalBandwidth);
        double carrier = (edges[0] + edges[1]) / 2.0;
        return GaussianPulse.of(carrier, (edges[1] - edges[0]) / carrier);
    }
}
