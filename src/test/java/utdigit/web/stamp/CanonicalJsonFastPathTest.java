package utdigit.web.stamp;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.function.DoubleSupplier;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The fast path of {@link CanonicalJson#number} (Schubfach digits, corrected where ECMA-262
 * differs) gives the same text as the BigDecimal reference path (the definition of ECMA-262
 * 7.1.12.1: fewest digits that read back, then the closest, then the even), on a million seeded
 * doubles and on values where Java 17's Double.toString is not the shortest form.
 */
class CanonicalJsonFastPathTest {
    private static final long SEED = 20261201L;

    @Test
    @DisplayName("fast path equals the reference path on 1,000,000 seeded random doubles")
    void fastPathEqualsReferenceOnAMillionDoubles() {
        SplittableRandom random = new SplittableRandom(SEED);
        List<String> mismatches = new ArrayList<>();
        // every finite bit pattern, both signs
        check(250_000, () -> finiteBits(random), mismatches);
        // magnitudes of typical answers, log-uniform over 1e-7..1e9
        check(400_000, () -> sign(random) * StrictMath.pow(10.0, -7.0 + 16.0 * random.nextDouble()), mismatches);
        // short decimals such as inputs and their mirrors (5920, 0.2, 25.4, 1.5e-3)
        check(200_000, () -> sign(random) * random.nextLong(1, 10_000_000) / StrictMath.pow(10.0, random.nextInt(0, 12)),
                mismatches);
        // neighbours of short decimals and of powers of two (asymmetric gaps, near ties)
        check(150_000, () -> {
            double base = random.nextBoolean()
                    ? random.nextLong(1, 100_000) / StrictMath.pow(10.0, random.nextInt(0, 8))
                    : StrictMath.scalb(1.0, random.nextInt(-60, 80));
            long steps = random.nextLong(-3, 4);
            return Double.longBitsToDouble(Double.doubleToRawLongBits(base) + steps);
        }, mismatches);
        assertThat(mismatches).isEmpty();
    }

    @Test
    @DisplayName("short-decimal path equals the reference path on 3,000,000 seeded doubles, and takes most short decimals")
    void shortDecimalPathEqualsReference() {
        SplittableRandom random = new SplittableRandom(SEED + 1);
        List<String> mismatches = new ArrayList<>();
        int[] taken = new int[1];
        DoubleSupplier[] kinds = {
            // short decimals: m / 10^q with m of 1 to 17 digits, q from 0 to 20
            () -> sign(random) * random.nextLong(1, StrictMath.round(StrictMath.pow(10.0, random.nextInt(1, 18))))
                    / StrictMath.pow(10.0, random.nextInt(0, 21)),
            // integers up to and past 2^53, and their neighbours
            () -> Double.longBitsToDouble(Double.doubleToRawLongBits(
                    (double) random.nextLong(1, 1L << random.nextInt(1, 60))) + random.nextLong(-2, 3)),
            // neighbours of short decimals (one to three ulps away: long forms next to short ones)
            () -> Double.longBitsToDouble(Double.doubleToRawLongBits(random.nextLong(1, 1_000_000)
                    / StrictMath.pow(10.0, random.nextInt(0, 12))) + random.nextLong(-3, 4)),
            // results of arithmetic on short decimals, as answers hold them (v / f, mm / 25.4, 1 / fs)
            () -> random.nextLong(1, 100_000) / 10.0 / (random.nextLong(1, 10_000) / 100.0),
            // magnitudes of typical answers, log-uniform over 1e-8..1e17, and powers of ten around the bounds
            () -> sign(random) * StrictMath.pow(10.0, -8.0 + 25.0 * random.nextDouble()),
            () -> Double.longBitsToDouble(Double.doubleToRawLongBits(StrictMath.pow(10.0, random.nextInt(-8, 18)))
                    + random.nextLong(-2, 3)),
        };
        for (int i = 0; i < 3_000_000; i++) {
            double x = kinds[i % kinds.length].getAsDouble();
            if (!Double.isFinite(x) || x == 0.0) {
                continue;
            }
            StringBuilder out = new StringBuilder();
            if (CanonicalJson.appendShortDecimal(x, out)) {
                taken[0]++;
                String reference = CanonicalJson.referenceNumber(x);
                if (!out.toString().equals(reference) && mismatches.size() < 20) {
                    mismatches.add(x + " (bits " + Long.toHexString(Double.doubleToRawLongBits(x)) + "): short "
                            + out + ", reference " + reference);
                }
            }
        }
        assertThat(mismatches).isEmpty();
        assertThat(taken[0]).as("values the short-decimal path took").isGreaterThan(500_000);
    }

    @Test
    @DisplayName("plain Schubfach path equals the reference path on 2,000,000 seeded doubles from 1e-4 to 1e8")
    void plainSchubfachPathEqualsReference() {
        SplittableRandom random = new SplittableRandom(SEED + 2);
        List<String> mismatches = new ArrayList<>();
        int taken = 0;
        for (int i = 0; i < 2_000_000; i++) {
            double x = switch (i % 4) {
                case 0 -> sign(random) * StrictMath.pow(10.0, -4.0 + 12.0 * random.nextDouble());
                case 1 -> sign(random) * random.nextLong(1, 100_000) / StrictMath.pow(10.0, random.nextInt(0, 9));
                case 2 -> Double.longBitsToDouble(Double.doubleToRawLongBits(random.nextLong(1, 1_000)
                        / StrictMath.pow(10.0, random.nextInt(0, 7))) + random.nextLong(-3, 4));
                default -> random.nextLong(1, 100_000) / 10.0 / (random.nextLong(1, 10_000) / 100.0);
            };
            StringBuilder out = new StringBuilder();
            if (CanonicalJson.appendPlainSchubfach(x, out)) {
                taken++;
                String reference = CanonicalJson.referenceNumber(x);
                if (!out.toString().equals(reference) && mismatches.size() < 20) {
                    mismatches.add(x + ": plain " + out + ", reference " + reference);
                }
            }
        }
        assertThat(mismatches).isEmpty();
        assertThat(taken).as("values the plain Schubfach path took").isGreaterThan(500_000);
    }

    @ParameterizedTest(name = "{0} -> {1}")
    @DisplayName("where Schubfach writes two digits and one would do, the one-digit form ECMA-262 asks for")
    @CsvSource({
        // Double.MIN_VALUE: Java 19+ and Schubfach write 4.9E-324; JavaScript's (5e-324).toString() is "5e-324"
        // (ECMA-262 7.1.12.1: fewest digits first, then the closest; from memory of V8 and SpiderMonkey output)
        "4.9E-324, 5e-324",
        // 2 x Double.MIN_VALUE = 9.88e-324: one digit, the closest one-digit decimal that reads back
        "1.0E-323, 1e-323",
        // ordinary two-digit values stay two digits: no one-digit decimal reads back
        "2.5, 2.5", "25.0, 25", "0.25, 0.25", "9.5, 9.5", "95.0, 95"})
    void oneDigitWhereOneDigitReadsBack(double x, String expected) {
        assertThat(CanonicalJson.number(x)).isEqualTo(expected);
        assertThat(CanonicalJson.referenceNumber(x)).isEqualTo(expected);
    }

    @ParameterizedTest
    @ValueSource(doubles = {
        // Java 17 writes these with more digits than the shortest (found by comparing the paths):
        1e23, 2e23, 8.41e21, 4.35e-6, 2.82879384806159e17, 1.387364135037754e18, 1.45800632428665e17,
        1.9400994884341945e25, 3.160701594026542e17, 2.4393383966365738e17, 2.2770711729136488e16,
        // limits of the double range and of the fast path, subnormals
        Double.MIN_VALUE, Double.MIN_NORMAL, Double.MAX_VALUE, 1e-300, 1e300, 9.999999999999999e299,
        // plain/exponent switch points of ECMA-262 (1e-7, 1e21) and their neighbours
        1e-7, 9.999999999999999e-8, 1e21, 9.999999999999999e20, 1.0000000000000001e21,
        // powers of two and their neighbours
        0.5, 1.0, 2.0, 1024.0, 9007199254740992.0, 9007199254740994.0, 0.1, 0.2, 0.30000000000000004,
        5920.0, 25.4, 1.184, 0.046614173228346455, 333333333.3333333})
    void fastPathEqualsReferenceOnHardCases(double x) {
        for (double y : new double[] {x, -x, Math.nextUp(x), Math.nextDown(x)}) {
            if (Double.isFinite(y)) {
                assertThat(CanonicalJson.number(y)).as("%s", y).isEqualTo(CanonicalJson.referenceNumber(y));
            }
        }
    }

    private static void check(int count, DoubleSupplier values, List<String> mismatches) {
        for (int i = 0; i < count; i++) {
            double x = values.getAsDouble();
            if (!Double.isFinite(x)) {
                continue;
            }
            String fast = CanonicalJson.number(x);
            String reference = CanonicalJson.referenceNumber(x);
            if (!fast.equals(reference) && mismatches.size() < 20) {
                mismatches.add(Double.toString(x) + " (bits " + Long.toHexString(Double.doubleToRawLongBits(x))
                        + "): fast " + fast + ", reference " + reference);
            }
        }
    }

    private static double finiteBits(SplittableRandom random) {
        while (true) {
            double x = Double.longBitsToDouble(random.nextLong());
            if (Double.isFinite(x)) {
                return x;
            }
        }
    }

    private static double sign(SplittableRandom random) {
        return random.nextBoolean() ? 1.0 : -1.0;
    }
}
