package utdigit.core.coverage;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.special.BesselJ;
import org.junit.jupiter.api.Test;
import utdigit.core.common.CalculationError;
import utdigit.core.common.CalculationException;

class ScanCoverageCalculatorTest {

    /**
     * Brute force in the test: a Gaussian main lobe whose two-way level is exactly -6 dB at +/- w/2
     * (level(x) = -24 (x/w)^2 dB); a reflector anywhere between two positions dx apart is read by the
     * nearer beam; the worst reading over 100 001 reflector positions is the loss.
     */
    private static double bruteForceLossDb(double stepMm, double widthMm) {
        double worst = 0;
        for (int i = 0; i <= 100_000; i++) {
            double u = stepMm * i / 100_000.0;
            double nearest = Math.min(u, stepMm - u);
            worst = Math.max(worst, 24.0 * (nearest / widthMm) * (nearest / widthMm));
        }
        return worst;
    }

    @Test
    void stepLossesMatchABruteForceScanOfReflectorPositions() {
        ScanCoverageResult r = ScanCoverageCalculator.compute(ScanCoverageInput.builder().beamWidth6dbMm(8.0)
                .scanIncrementMm(2.0).indexStepMm(5.0).soundPathMm(50.0).angularStepDeg(1.0).build());
        assertThat(r.beamWidth6dbMm()).hasValue(8.0);
        assertThat(r.scanIncrementLossDb().orElseThrow()).isCloseTo(bruteForceLossDb(2.0, 8.0), within(1e-9));
        assertThat(r.indexStepLossDb().orElseThrow()).isCloseTo(bruteForceLossDb(5.0, 8.0), within(1e-9));
        // An angular step of 1 deg at 50 mm moves the beam 50 x pi/180 mm (arc length, definition).
        assertThat(r.angularStepLossDb().orElseThrow())
                .isCloseTo(bruteForceLossDb(50.0 * Math.PI / 180.0, 8.0), within(1e-9));
        assertThat(r.scanIncrementWithinTolerance()).isNull();
    }

    @Test
    void theLargestStepForATolerancesLosesExactlyTheTolerance() {
        ScanCoverageResult r = ScanCoverageCalculator.compute(ScanCoverageInput.builder().beamWidth6dbMm(8.0)
                .scanIncrementMm(2.0).indexStepMm(5.0).soundPathMm(50.0).amplitudeToleranceDb(1.0).build());
        double maxStep = r.maxStepMm().orElseThrow();
        // The brute-force loss at the largest step is the tolerance; 1 % more step is over it.
        assertThat(bruteForceLossDb(maxStep, 8.0)).isCloseTo(1.0, within(1e-6));
        assertThat(bruteForceLossDb(1.01 * maxStep, 8.0)).isGreaterThan(1.0);
        assertThat(r.maxAngularStepDeg().orElseThrow()).isCloseTo(Math.toDegrees(maxStep / 50.0), within(1e-12));
        assertThat(r.scanIncrementWithinTolerance()).hasValue(true); // 6 (2/8)^2 = 0.375 dB
        assertThat(r.indexStepWithinTolerance()).hasValue(false); // 6 (5/8)^2 = 2.34 dB
        assertThat(r.hasWarning(ScanCoverageCalculator.STEP_OVER_TOLERANCE)).isTrue();
    }

    /** k solving (2 J1(x)/x)^2 = 10^(-6/20), by Commons Math BesselJ and BrentSolver in the test. */
    private static double pistonTwoWay6dbConstant() {
        double r = Math.pow(10, -6.0 / 20);
        double x = new BrentSolver(1e-14).solve(200, t -> {
            double d = 2 * BesselJ.value(1, t) / t;
            return d * d - r;
        }, 1e-6, 3.8);
        return x / Math.PI;
    }

    @Test
    void aRoundProbesBeamWidthAndTheGaussianModelAgainstThePistonDirectivity() {
        // Our own case: 5 MHz, 10 mm element, steel 5920 m/s (lambda 1.184 mm, near field 21.1 mm), 200 mm path.
        double lambda = 1.184;
        double k = pistonTwoWay6dbConstant();
        double width = 2 * 200 * Math.tan(Math.asin(k * lambda / 10.0));
        double step = width / 2;
        ScanCoverageResult r = ScanCoverageCalculator.compute(
                ScanCoverageInput.builder().frequencyMhz(5.0).velocityMPerS(5920.0).elementDiameterMm(10.0)
                        .soundPathMm(200.0).scanIncrementMm(step).build());
        assertThat(r.beamWidth6dbMm().orElseThrow()).isCloseTo(width, within(1e-9));
        // The Gaussian model (1.5 dB at half the width) against the real two-way piston directivity
        // (2 J1(x)/x)^2 (Commons Math BesselJ) at the reflector midway, step/2 off the axis at 200 mm:
        // the model's error is below 0.1 dB there (its approximation of the main lobe).
        double sine = Math.sin(Math.atan(step / 2 / 200));
        double x = Math.PI * 10.0 * sine / lambda;
        double pistonLossDb = -20 * Math.log10(Math.pow(2 * BesselJ.value(1, x) / x, 2));
        assertThat(r.scanIncrementLossDb().orElseThrow()).isCloseTo(1.5, within(1e-9));
        assertThat(r.scanIncrementLossDb().orElseThrow()).isCloseTo(pistonLossDb, within(0.1));
    }

    @Test
    void insideTheNearFieldTheBeamWidthIsNotKnown() {
        // Near field 10^2 / (4 x 1.184) = 21.1 mm; 15 mm lies inside it.
        ScanCoverageResult r = ScanCoverageCalculator.compute(
                ScanCoverageInput.builder().frequencyMhz(5.0).velocityMPerS(5920.0).elementDiameterMm(10.0)
                        .soundPathMm(15.0).scanIncrementMm(1.0).amplitudeToleranceDb(1.0).build());
        assertThat(r.beamWidth6dbMm()).isEmpty();
        assertThat(r.scanIncrementLossDb()).isEmpty();
        assertThat(r.maxStepMm()).isEmpty();
        assertThat(r.scanIncrementWithinTolerance()).isEmpty();
        assertThat(r.hasWarning(ScanCoverageCalculator.BEAM_WIDTH_UNKNOWN)).isTrue();
    }

    @Test
    void aBeamWidthGivenTwiceOrAnAngularStepWithoutSoundPathIsRefused() {
        assertThatThrownBy(() -> ScanCoverageCalculator.compute(
                ScanCoverageInput.builder().beamWidth6dbMm(8.0).frequencyMhz(5.0).build()))
                .isInstanceOfSatisfying(CalculationException.class,
                        e -> assertThat(e.error()).isEqualTo(CalculationError.NOT_APPLICABLE));
        assertThatThrownBy(() -> ScanCoverageCalculator.compute(ScanCoverageInput.builder().beamWidth6dbMm(8.0)
                .angularStepDeg(1.0).build()))
                .isInstanceOfSatisfying(CalculationException.class,
                        e -> assertThat(e.fields()).containsExactly("angular_step_deg"));
    }
}
