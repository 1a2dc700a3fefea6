package utdigit.core.timing;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.function.UnaryOperator;
import java.util.stream.Stream;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.EnumSource;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.params.provider.ValueSource;
import utdigit.core.common.CalculationError;
import utdigit.core.common.CalculationException;
import utdigit.core.common.Warning;

class TimeOfFlightCalculatorTest {

    static final double ALLOWED_ERROR_NS = 1e-12;
    static final double ALLOWED_ERROR_MM = 1e-12;
    static final double ALLOWED_ERROR_US = 1e-12;
    /** Looser tolerance for values typed with seven significant digits from a hand calculation. */
    static final double HAND_WORKED_MM = 1e-7;

    /** Steel-like longitudinal velocity of our examples, m/s (5.9 mm/us). */
    static final double V_M_PER_S = 5900.0;

    static TimeOfFlightInput.Builder pulseEcho(double fsMhz) {
        return TimeOfFlightInput.builder(fsMhz, V_M_PER_S);
    }

    /** TOFD with PCS 60 mm (S = 30 mm) at 100 MHz: the hand-worked geometry of TofdGeometryTest. */
    static TimeOfFlightInput.Builder tofd() {
        return TimeOfFlightInput.builder(100.0, V_M_PER_S).technique(Technique.TOFD).probeCentreSeparationMm(60.0);
    }

    static boolean hasWarning(TimeOfFlightResult r, String code) {
        return r.warnings().stream().map(Warning::code).anyMatch(code::equals);
    }

    @Test
    @DisplayName("pulse-echo sound path per sample is v dt/2 (definition: one way of a round trip)")
    void pulseEchoSoundPathIsHalfOfVelocityTimesInterval() {
        // 100 MHz: dt = 10 ns = 0.01 us; v dt / 2 = 5.9 x 0.01 / 2 = 0.0295 mm.
        TimeOfFlightResult r = TimeOfFlightCalculator.compute(TimeOfFlightInput.of(100.0, V_M_PER_S));
        assertThat(r.timeResolutionNs()).isCloseTo(10.0, within(ALLOWED_ERROR_NS));
        assertThat(r.soundPathResolutionMm()).isCloseTo(0.0295, within(ALLOWED_ERROR_MM));
        assertThat(r.depthResolutionMm()).isNull();
        assertThat(r.surfaceDistanceResolutionMm()).isNull();
        assertThat(r.lateralWaveTimeUs()).isNull();
    }

    @Test
    @DisplayName("through-transmission sound path per sample is v dt (definition)")
    void throughTransmissionSoundPathIsVelocityTimesInterval() {
        TimeOfFlightResult r = TimeOfFlightCalculator.compute(
                pulseEcho(100.0).technique(Technique.THROUGH_TRANSMISSION).build());
        assertThat(r.soundPathResolutionMm()).isCloseTo(0.059, within(ALLOWED_ERROR_MM));
    }

    @Test
    @DisplayName("TOFD sound path per sample is v dt over both legs (definition)")
    void tofdSoundPathIsVelocityTimesInterval() {
        assertThat(TimeOfFlightCalculator.compute(tofd().build()).soundPathResolutionMm())
                .isCloseTo(0.059, within(ALLOWED_ERROR_MM));
    }

    @Test
    @DisplayName("decimation by 4 of 100 MHz gives dt = 40 ns and four times the path (dt = m/fs, definition)")
    void decimationMultipliesTheInterval() {
        TimeOfFlightResult r = TimeOfFlightCalculator.compute(pulseEcho(100.0).decimationFactor(4).build());
        assertThat(r.decimationFactor()).isEqualTo(4);
        assertThat(r.timeResolutionNs()).isCloseTo(40.0, within(ALLOWED_ERROR_NS));
        assertThat(r.soundPathResolutionMm()).isCloseTo(4 * 0.0295, within(ALLOWED_ERROR_MM));
    }

    @Test
    @DisplayName("timing from the trigger: worst case dt/2, standard uncertainty dt/sqrt(12) (GUM 4.3.7, half-width a/sqrt(3))")
    void triggerTimingIsOneQuantizedInstant() {
        TimeOfFlightResult r = TimeOfFlightCalculator.compute(TimeOfFlightInput.of(100.0, V_M_PER_S));
        assertThat(r.timeReference()).isEqualTo(TimeReference.TRIGGER);
        assertThat(r.timingErrorNs()).isCloseTo(5.0, within(ALLOWED_ERROR_NS));
        assertThat(r.timingStandardUncertaintyNs()).isCloseTo(5.0 / Math.sqrt(3.0), within(ALLOWED_ERROR_NS));
    }

    @Test
    @DisplayName("timing from the lateral wave: worst case dt, standard uncertainty dt/sqrt(6) (GUM 4.3.9, half-width a/sqrt(6))")
    void lateralWaveTimingIsADifferenceOfTwoInstants() {
        TimeOfFlightResult r = TimeOfFlightCalculator.compute(tofd().timeReference(TimeReference.LATERAL_WAVE).build());
        assertThat(r.timingErrorNs()).isCloseTo(10.0, within(ALLOWED_ERROR_NS));
        assertThat(r.timingStandardUncertaintyNs()).isCloseTo(10.0 / Math.sqrt(6.0), within(ALLOWED_ERROR_NS));
        // The sound path per sample does not depend on where time is measured from.
        assertThat(r.soundPathResolutionMm()).isCloseTo(0.059, within(ALLOWED_ERROR_MM));
    }

    @ParameterizedTest(name = "{0} deg")
    @CsvSource({"0, 1.0, 0.0", "45, 0.70710678118654752, 0.70710678118654752", "60, 0.5, 0.86602540378443865",
        "70, 0.34202014332566873, 0.93969262078590838"})
    @DisplayName("angle beam splits the per-sample path x into x cos(theta) depth and x sin(theta) surface distance (geometry)")
    void angleBeamSplitsThePathIntoDepthAndSurfaceDistance(double angleDeg, double cosine, double sine) {
        // cos and sin of the angles typed from tables (cos 60 = 1/2, sin 60 = sqrt(3)/2, ...).
        TimeOfFlightResult r = TimeOfFlightCalculator.compute(pulseEcho(100.0).refractedAngleDeg(angleDeg).build());
        assertThat(r.depthResolutionMm()).isCloseTo(0.0295 * cosine, within(ALLOWED_ERROR_MM));
        assertThat(r.surfaceDistanceResolutionMm()).isCloseTo(0.0295 * sine, within(ALLOWED_ERROR_MM));
    }

    @Test
    @DisplayName("TOFD with a depth of 16 mm under PCS 60 mm gives the hand-worked times and depth step")
    void tofdAtSixteenMillimetresGivesTheHandWorkedGeometry() {
        // Charlesworth & Temple 2.3.4 geometry (read second-hand), hand-worked: S = 30, d = 16 -> R = 34 mm;
        // t = 2 x 34 / 5.9 = 11.5254237 us; lateral wave 60 / 5.9 = 10.1694915 us;
        // depth step d(t + dt) - d = sqrt(34.0295^2 - 900) - 16 = 0.0625923 mm (see TofdGeometryTest).
        TimeOfFlightResult r = TimeOfFlightCalculator.compute(tofd().depthMm(16.0).build());
        assertThat(r.lateralWaveTimeUs()).isCloseTo(60.0 / 5.9, within(ALLOWED_ERROR_US));
        assertThat(r.timeOfFlightUs()).isCloseTo(68.0 / 5.9, within(ALLOWED_ERROR_US));
        assertThat(r.depthResolutionMm()).isCloseTo(Math.sqrt(34.0295 * 34.0295 - 900.0) - 16.0, within(1e-10));
        assertThat(r.surfaceDistanceResolutionMm()).isNull();
        // Without a pulse duration no dead zone or pulse-limited figure.
        assertThat(r.pulseDurationUsedUs()).isNull();
        assertThat(r.deadZoneDepthMm()).isNull();
        assertThat(r.pulseLimitedDepthResolutionMm()).isNull();
        assertThat(r.backwallDeadZoneMm()).isNull();
    }

    @Test
    @DisplayName("TOFD with pulse_duration_us 0.2 and thickness 40 mm gives the hand-worked dead zones")
    void tofdWithPulseDurationGivesTheHandWorkedDeadZones() {
        // Hand-worked in TofdGeometryTest: dead zone sqrt(35.7481) = 5.9789715 mm, pulse-limited at 16 mm
        // sqrt(296.4681) - 16 = 1.2182490 mm, back wall 40 - sqrt(1541.3481) = 0.7399936 mm.
        TimeOfFlightResult r = TimeOfFlightCalculator.compute(
                tofd().depthMm(16.0).thicknessMm(40.0).pulseDurationUs(0.2).build());
        assertThat(r.pulseDurationUsedUs()).isEqualTo(0.2);
        assertThat(r.deadZoneDepthMm()).isCloseTo(5.9789715, within(HAND_WORKED_MM));
        assertThat(r.pulseLimitedDepthResolutionMm()).isCloseTo(1.2182490, within(HAND_WORKED_MM));
        assertThat(r.backwallDeadZoneMm()).isCloseTo(0.7399936, within(HAND_WORKED_MM));
        assertThat(r.warnings()).isEmpty();
    }

    @Test
    @DisplayName("pulse duration from 5 MHz and 60 % is the -20 dB envelope of the scipy gausspulse model: 2 ln10 sqrt(1.2)/(pi f bw)")
    void pulseDurationFromFrequencyIsTheModelsTwentyDecibelEnvelope() {
        // scipy.signal.gausspulse: a = -(pi f bw)^2 / (4 ln 10^(-6/20)) = (pi f bw)^2 / (1.2 ln 10);
        // the envelope exp(-a t^2) is -20 dB (1/10) at t = sqrt(ln 10 / a), so the full duration is
        // 2 sqrt(1.2 (ln 10)^2) / (pi f bw) = 2 ln 10 sqrt(1.2) / (pi x 5 x 0.6) = 5.044682 / 9.424778 = 0.535260 us.
        double expectedUs = 2.0 * Math.log(10.0) * Math.sqrt(1.2) / (Math.PI * 5.0 * 0.6);
        TimeOfFlightResult r = TimeOfFlightCalculator.compute(tofd().frequencyMhz(5.0).bandwidthPercent(60.0).build());
        assertThat(r.pulseDurationUsedUs()).isCloseTo(expectedUs, within(1e-12));
        assertThat(r.pulseDurationUsedUs()).isCloseTo(0.535260, within(1e-6));
        // Dead zone with that duration: sqrt((S + v tp/2)^2 - S^2).
        double h = 5.9 * expectedUs / 2.0;
        assertThat(r.deadZoneDepthMm()).isCloseTo(Math.sqrt((30.0 + h) * (30.0 + h) - 900.0), within(1e-9));
        assertThat(r.references()).anyMatch(ref -> ref.id().equals("gaussian-pulse-model"));
    }

    @Test
    @DisplayName("a depth inside the near-surface dead zone is warned")
    void depthInsideTheDeadZoneIsWarned() {
        TimeOfFlightResult r = TimeOfFlightCalculator.compute(tofd().depthMm(3.0).pulseDurationUs(0.2).build());
        assertThat(r.deadZoneDepthMm()).isGreaterThan(3.0);
        assertThat(hasWarning(r, "DEPTH_IN_DEAD_ZONE")).isTrue();
        assertThat(r.depthResolutionMm()).isNotNull();
    }

    @Test
    @DisplayName("a depth inside the back-wall dead zone is warned")
    void depthInsideTheBackwallDeadZoneIsWarned() {
        // Back-wall dead zone of T = 40 mm is 0.74 mm: 39.5 mm lies in it.
        TimeOfFlightResult r = TimeOfFlightCalculator.compute(
                tofd().depthMm(39.5).thicknessMm(40.0).pulseDurationUs(0.2).build());
        assertThat(hasWarning(r, "DEPTH_IN_BACKWALL_DEAD_ZONE")).isTrue();
        assertThat(hasWarning(r, "DEPTH_IN_DEAD_ZONE")).isFalse();
    }

    @Test
    @DisplayName("a thin wall whose back wall is within one pulse of the lateral wave is dead throughout: T with a warning")
    void thinWallIsDeadThroughout() {
        // T = 4 mm under S = 30: R_T - S = 0.2655 mm < v tp/2 = 0.59 mm (TofdGeometryTest).
        TimeOfFlightResult r = TimeOfFlightCalculator.compute(tofd().thicknessMm(4.0).pulseDurationUs(0.2).build());
        assertThat(r.backwallDeadZoneMm()).isEqualTo(4.0);
        assertThat(hasWarning(r, "WHOLE_THICKNESS_DEAD")).isTrue();
    }

    @Test
    @DisplayName("near-surface and back-wall dead zones that meet are warned")
    void deadZonesThatMeetAreWarned() {
        // T = 8 mm: R_T - S = sqrt(964) - 30 = 1.048 mm > 0.59 mm, so not dead by the back wall alone,
        // but the 5.98 mm near-surface zone plus the back-wall zone exceed 8 mm.
        TimeOfFlightResult r = TimeOfFlightCalculator.compute(tofd().thicknessMm(8.0).pulseDurationUs(0.2).build());
        assertThat(hasWarning(r, "WHOLE_THICKNESS_DEAD")).isFalse();
        assertThat(r.deadZoneDepthMm() + r.backwallDeadZoneMm()).isGreaterThanOrEqualTo(8.0);
        assertThat(hasWarning(r, "DEAD_ZONES_COVER_THICKNESS")).isTrue();
    }

    @Test
    @DisplayName("a depth equal to the thickness (a tip at the back wall) is accepted")
    void depthEqualToThicknessIsAccepted() {
        TimeOfFlightResult r = TimeOfFlightCalculator.compute(tofd().depthMm(40.0).thicknessMm(40.0).build());
        assertThat(r.timeOfFlightUs()).isCloseTo(100.0 / 5.9, within(ALLOWED_ERROR_US));
    }

    @Test
    @DisplayName("references cite the TOFD geometry derivation, the off-centre reading and dd/dS = -S/d at the depth")
    void referencesCiteTheGeometryAndTheSeparationSensitivity() {
        TimeOfFlightResult r = TimeOfFlightCalculator.compute(tofd().depthMm(16.0).build());
        assertThat(r.references()).anyMatch(ref -> ref.id().equals("tofd-geometry"));
        assertThat(r.references()).anyMatch(ref -> ref.topic().equals("flaw off the centre line"));
        // -S/d = -30/16 = -1.875; an error e in 2S moves the depth by -0.9375 e.
        assertThat(r.references()).anyMatch(ref -> ref.topic().contains("-S/d = -1.875")
                && ref.topic().contains("-0.9375 e"));
    }

    @Test
    @DisplayName("defaults: PULSE_ECHO, TRIGGER, decimation 1")
    void defaultsAreEchoed() {
        TimeOfFlightResult r = TimeOfFlightCalculator.compute(TimeOfFlightInput.of(50.0, V_M_PER_S));
        assertThat(r.technique()).isEqualTo(Technique.PULSE_ECHO);
        assertThat(r.timeReference()).isEqualTo(TimeReference.TRIGGER);
        assertThat(r.decimationFactor()).isEqualTo(1);
    }

    @ParameterizedTest
    @EnumSource(Technique.class)
    @DisplayName("an explicit TRIGGER reference is accepted with every technique (it is the default)")
    void explicitTriggerIsAcceptedWithEveryTechnique(Technique technique) {
        TimeOfFlightResult r = TimeOfFlightCalculator.compute(tofd().technique(technique)
                .probeCentreSeparationMm(technique == Technique.TOFD ? 60.0 : null)
                .timeReference(TimeReference.TRIGGER).build());
        assertThat(r.timingErrorNs()).isCloseTo(5.0, within(ALLOWED_ERROR_NS));
    }

    @Test
    @DisplayName("a bit-identical answer for the same input (StrictMath only)")
    void sameInputGivesBitIdenticalAnswer() {
        TimeOfFlightInput in = tofd().depthMm(12.5).thicknessMm(25.0).frequencyMhz(5.0).bandwidthPercent(60.0).build();
        assertThat(TimeOfFlightCalculator.compute(in)).isEqualTo(TimeOfFlightCalculator.compute(in.toBuilder().build()));
    }

    @Nested
    class Failures {

        static Stream<Arguments> tofdOnlyInputs() {
            return Stream.of(
                    Arguments.of("probe_centre_separation", (UnaryOperator<TimeOfFlightInput.Builder>) b -> b.probeCentreSeparationMm(60.0)),
                    Arguments.of("depth", (UnaryOperator<TimeOfFlightInput.Builder>) b -> b.depthMm(10.0)),
                    Arguments.of("thickness", (UnaryOperator<TimeOfFlightInput.Builder>) b -> b.thicknessMm(20.0)),
                    Arguments.of("pulse_duration_us", (UnaryOperator<TimeOfFlightInput.Builder>) b -> b.pulseDurationUs(0.2)),
                    Arguments.of("frequency_mhz", (UnaryOperator<TimeOfFlightInput.Builder>) b -> b.frequencyMhz(5.0)),
                    Arguments.of("bandwidth_percent", (UnaryOperator<TimeOfFlightInput.Builder>) b -> b.bandwidthPercent(60.0)),
                    Arguments.of("time_reference", (UnaryOperator<TimeOfFlightInput.Builder>) b -> b.timeReference(TimeReference.LATERAL_WAVE)));
        }

        @ParameterizedTest(name = "{0} with PULSE_ECHO")
        @MethodSource("tofdOnlyInputs")
        void tofdInputWithPulseEchoIsNotApplicable(String field, UnaryOperator<TimeOfFlightInput.Builder> set) {
            assertFails(set.apply(pulseEcho(100.0)).build(), CalculationError.NOT_APPLICABLE, field);
        }

        @ParameterizedTest(name = "{0} with THROUGH_TRANSMISSION")
        @MethodSource("tofdOnlyInputs")
        void tofdInputWithThroughTransmissionIsNotApplicable(String field, UnaryOperator<TimeOfFlightInput.Builder> set) {
            assertFails(set.apply(pulseEcho(100.0).technique(Technique.THROUGH_TRANSMISSION)).build(),
                    CalculationError.NOT_APPLICABLE, field);
        }

        @ParameterizedTest
        @EnumSource(value = Technique.class, names = {"THROUGH_TRANSMISSION", "TOFD"})
        void refractedAngleWithoutPulseEchoIsNotApplicable(Technique technique) {
            assertFails(tofd().technique(technique).probeCentreSeparationMm(technique == Technique.TOFD ? 60.0 : null)
                    .refractedAngleDeg(45.0).build(), CalculationError.NOT_APPLICABLE, "refracted_angle_deg");
        }

        @ParameterizedTest(name = "{0} deg")
        @ValueSource(doubles = {90.0, 95.0, -1.0, Double.NaN})
        @DisplayName("an angle of 90 deg or more (or below 0) is rejected by the core too")
        void angleOutsideZeroToBelowNinetyIsInvalid(double angleDeg) {
            assertFails(pulseEcho(100.0).refractedAngleDeg(angleDeg).build(), CalculationError.INVALID_INPUT,
                    "refracted_angle_deg");
        }

        @Test
        void tofdWithoutSeparationIsRejected() {
            CalculationException e = assertFails(tofd().probeCentreSeparationMm(null).build(),
                    CalculationError.NOT_APPLICABLE, "probe_centre_separation");
            assertThat(e.getMessage()).isEqualTo("probe_centre_separation is required for TOFD");
        }

        @Test
        @DisplayName("a depth below the back wall is impossible (422)")
        void depthBelowTheThicknessIsImpossible() {
            CalculationException e = assertFails(tofd().depthMm(41.0).thicknessMm(40.0).build(),
                    CalculationError.IMPOSSIBLE_COMBINATION, "depth");
            assertThat(e.fields()).containsExactly("depth", "thickness");
            assertThat(e.error().category()).isEqualTo(CalculationError.Category.IMPOSSIBLE);
        }

        @ParameterizedTest(name = "depth {0} mm")
        @ValueSource(doubles = {0.0, -1.0, Double.NaN, Double.POSITIVE_INFINITY})
        void nonPositiveDepthIsInvalid(double depthMm) {
            assertFails(tofd().depthMm(depthMm).build(), CalculationError.INVALID_INPUT, "depth");
        }

        @Test
        void bothPulseDurationSourcesAreRejected() {
            assertFails(tofd().pulseDurationUs(0.2).frequencyMhz(5.0).bandwidthPercent(60.0).build(),
                    CalculationError.NOT_APPLICABLE, "pulse_duration_us");
        }

        @Test
        void frequencyWithoutBandwidthIsRejected() {
            assertFails(tofd().frequencyMhz(5.0).build(), CalculationError.NOT_APPLICABLE, "bandwidth_percent");
        }

        @Test
        void bandwidthWithoutFrequencyIsRejected() {
            assertFails(tofd().bandwidthPercent(60.0).build(), CalculationError.NOT_APPLICABLE, "frequency_mhz");
        }

        @Test
        void zeroSeparationIsInvalid() {
            assertFails(tofd().probeCentreSeparationMm(0.0).build(), CalculationError.INVALID_INPUT,
                    "probe_centre_separation");
        }

        @Test
        void notANumberVelocityIsInvalid() {
            assertFails(TimeOfFlightInput.of(100.0, Double.NaN), CalculationError.INVALID_INPUT, "velocity");
        }

        @Test
        void zeroDecimationIsInvalid() {
            assertFails(pulseEcho(100.0).decimationFactor(0).build(), CalculationError.INVALID_INPUT, "decimation_factor");
        }

        @Test
        void zeroSamplingFrequencyIsInvalid() {
            assertFails(TimeOfFlightInput.of(0.0, V_M_PER_S), CalculationError.INVALID_INPUT,
                    "sampling_frequency_mhz");
        }

        private static CalculationException assertFails(TimeOfFlightInput in, CalculationError error, String field) {
            CalculationException[] caught = new CalculationException[1];
            assertThatThrownBy(() -> TimeOfFlightCalculator.compute(in))
                    .isInstanceOfSatisfying(CalculationException.class, e -> {
                        assertThat(e.error()).isEqualTo(error);
                        assertThat(e.fields()).first().isEqualTo(field);
                        caught[0] = e;
                    });
            return caught[0];
        }
    }
}
