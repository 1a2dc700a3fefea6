package utdigit.core.waveform;

import org.apache.commons.math3.transform.DftNormalization;
import org.apache.commons.math3.transform.FastFourierTransformer;
import org.apache.commons.math3.transform.TransformType;

/**
 * The discrete Fourier transforms of this package, by Apache Commons Math 3.6.1
 * {@link FastFourierTransformer} (radix 2, pure-Java arithmetic, so the same bits on every platform).
 * Forward transforms are unnormalised, X_k = sum_j x_j exp(-2 pi i jk/N) (the convention of
 * numpy.fft.fft); inverse transforms divide by N (numpy.fft.ifft).
 */
final class Fft {
    private Fft() {}

    /** The smallest power of two at or above {@code n} (n >= 1). */
    static int powerOfTwoAtLeast(int n) {
        int p = 1;
        while (p < n) {
            p <<= 1;
        }
        return p;
    }

    /** The transform of {@code x} zero-padded to {@code length} (a power of two): {re, im}. */
    static double[][] forward(double[] x, int length) {
        double[][] ri = new double[2][length];
        System.arraycopy(x, 0, ri[0], 0, Math.min(x.length, length));
        FastFourierTransformer.transformInPlace(ri, DftNormalization.STANDARD, TransformType.FORWARD);
        return ri;
    }

    /** The inverse transform in place of {re, im} (length a power of two), divided by the length. */
    static void inverseInPlace(double[][] ri) {
        FastFourierTransformer.transformInPlace(ri, DftNormalization.STANDARD, TransformType.INVERSE);
    }
}
