package utdigit.core.pulse;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.doubles;

import java.util.List;
import org.apache.commons.math3.special.BesselJ;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import utdigit.core.common.CalculationError;
import utdigit.core.common.CalculationException;
import utdigit.core.common.Reference;
import utdigit.core.common.Warning;

class PulseCalculatorTest {

    static final double ALLOWED_RELATIVE_ERROR = 1e-12;
    static final long SEED = 20240601L;

    /** ISO 22232-2 steel reference values (read in its scope). */
    static final double STEEL_LONGITUDINAL_M_PER_S = 5920.0;
    static final double STEEL_SHEAR_M_PER_S = 3255.0;
    /** An example wedge velocity of ours (wedge materials vary, src/docs/methods.md). */
    static final double WEDGE_M_PER_S = 2730.0;

    static final PulseInput FIVE_MHZ_STEEL = PulseInput.of(5.0, STEEL_LONGITUDINAL_M_PER_S);

    static PulseResult compute(PulseInput in) {
        return PulseCalculator.compute(in);
    }

    static List<String> codes(PulseResult r) {
        return r.warnings().stream().map(Warning::code).toList();
    }

    static List<String> topics(PulseResult r) {
        return r.references().stream().map(Reference::topic).toList();
    }

    /** Pulse-echo directivity D(x)^2 at a half-angle, written here from Commons Math BesselJ. */
    static double twoWayDirectivityAt(double halfAngleDeg, double diameterMm, double wavelengthMm) {
        double x = Math.PI * diameterMm * Math.sin(Math.toRadians(halfAngleDeg)) / wavelengthMm;
        double d = 2.0 * BesselJ.value(1, x) / x;
        return d * d;
    }

    @Test
    @DisplayName("required inputs alone give period and wavelength, and every optional result is absent")
    void requiredInputsAloneGivePeriodAndWavelength() {
        PulseResult r = compute(FIVE_MHZ_STEEL);
        assertThat(r.periodUs()).isEqualTo(1.0 / 5.0);
        assertThat(r.wavelengthMm()).isCloseTo(5.92 / 5.0, within(1e-15));
        assertThat(r.centreFrequencyConvention()).isNull();
        assertThat(r.lowerFrequencyMhz()).isNull();
        assertThat(r.lowerFrequency20dbMhz()).isNull();
        assertThat(r.lowerFrequency40dbMhz()).isNull();
        assertThat(r.pulseDuration6dbUs()).isNull();
        assertThat(r.axialResolutionMm()).isNull();
        assertThat(r.nearFieldLengthMm()).isNull();
        assertThat(r.nearFieldLengthExactMm()).isNull();
        assertThat(r.beamSpread6dbDeg()).isNull();
        assertThat(r.beamDiameter6dbMm()).isNull();
        assertThat(r.nearFieldInPartMm()).isNull();
        assertThat(r.refractedAngleDeg()).isNull();
        assertThat(r.warnings()).isEmpty();
        assertThat(topics(r)).containsExactly("period and wavelength");
    }

    @Test
    @DisplayName("every input gives every result, each formula with its reference")
    void everyInputGivesEveryResult() {
        PulseResult r = compute(FIVE_MHZ_STEEL.toBuilder().bandwidthPercent(60.0)
                .elementDiameterMm(10.0)
                .distanceMm(60.0)
                .wedgePathMm(10.0)
                .wedgeVelocityMPerS(WEDGE_M_PER_S)
                .incidentAngleDeg(15.0).build());
        assertThat(r.centreFrequencyConvention()).isEqualTo(CentreFrequencyConvention.ARITHMETIC);
        assertThat(List.of(r.lowerFrequencyMhz(), r.upperFrequencyMhz(), r.upperFrequency20dbMhz(),
                r.upperFrequency40dbMhz(), r.pulseDuration6dbUs(), r.pulseDuration20dbUs(), r.cycles6db(),
                r.spatialPulseLengthMm(), r.axialResolutionMm(), r.nearFieldLengthMm(), r.nearFieldInPartMm()))
                .doesNotContainNull();
        assertThat(List.of(r.lowerFrequency20dbMhz(), r.lowerFrequency40dbMhz(), r.nearFieldLengthExactMm(),
                r.beamSpread6dbDeg(), r.beamSpread20dbDeg(), r.beamSpreadNullDeg(), r.beamDiameter6dbMm(),
                r.refractedAngleDeg()))
                .allSatisfy(o -> assertThat(o).isPresent());
        assertThat(r.warnings()).isEmpty();
        assertThat(topics(r)).contains("period and wavelength", "-6 dB bandwidth", "centre frequency ARITHMETIC",
                "-20 dB and -40 dB band edges, pulse durations and cycles",
                "spatial pulse length and axial resolution", "near field length", "exact near field length",
                "beam spread", "beam diameter", "near field in the part", "refracted angle");
        assertThat(r.references()).allSatisfy(ref -> assertThat(utdigit.core.common.Sources.find(ref.id())).isPresent());
    }

    @Nested
    class CentreFrequencyConventions {
        @Test
        @DisplayName("a bandwidth without a convention uses ARITHMETIC (the contract's default) and says so")
        void bandwidthWithoutConventionUsesArithmetic() {
            assertThat(compute(FIVE_MHZ_STEEL.toBuilder().bandwidthPercent(60.0).build()).centreFrequencyConvention())
                    .isEqualTo(CentreFrequencyConvention.ARITHMETIC);
            assertThat(compute(FIVE_MHZ_STEEL.toBuilder().bandwidthPercent(60.0)
                    .centreFrequencyConvention(CentreFrequencyConvention.GEOMETRIC).build())
                    .centreFrequencyConvention()).isEqualTo(CentreFrequencyConvention.GEOMETRIC);
        }

        @Test
        @DisplayName("GEOMETRIC edges satisfy sqrt(fl fu) = fc and (fu - fl)/fc = bw (EN 12668-2 / ISO 22232-2 definition, from memory)")
        void geometricEdgesHaveGeometricCentre() {
            qt().withFixedSeed(SEED).withExamples(2000)
                    .forAll(doubles().between(0.1, 50.0), doubles().between(1.0, 199.0))
                    .checkAssert((fcMhz, bandwidthPercent) -> {
                        PulseResult r = compute(PulseInput.builder(fcMhz, STEEL_LONGITUDINAL_M_PER_S)
                                .bandwidthPercent(bandwidthPercent)
                                .centreFrequencyConvention(CentreFrequencyConvention.GEOMETRIC).build());
                        double fl = r.lowerFrequencyMhz();
                        double fu = r.upperFrequencyMhz();
                        assertThat(Math.sqrt(fl * fu)).isCloseTo(fcMhz, within(fcMhz * ALLOWED_RELATIVE_ERROR));
                        assertThat((fu - fl) / fcMhz)
                                .isCloseTo(bandwidthPercent / 100.0, within(bandwidthPercent / 100.0 * 1e-11));
                        assertThat(fl).isPositive();
                    });
        }

        @Test
        @DisplayName("ARITHMETIC edges satisfy (fl + fu)/2 = fc and (fu - fl)/fc = bw (ASTM E1065 definition, from memory)")
        void arithmeticEdgesHaveArithmeticCentre() {
            qt().withFixedSeed(SEED).withExamples(2000)
                    .forAll(doubles().between(0.1, 50.0), doubles().between(1.0, 199.0))
                    .checkAssert((fcMhz, bandwidthPercent) -> {
                        PulseResult r = compute(PulseInput.builder(fcMhz, STEEL_LONGITUDINAL_M_PER_S)
                                .bandwidthPercent(bandwidthPercent).build());
                        double fl = r.lowerFrequencyMhz();
                        double fu = r.upperFrequencyMhz();
                        assertThat((fl + fu) / 2).isCloseTo(fcMhz, within(fcMhz * ALLOWED_RELATIVE_ERROR));
                        assertThat((fu - fl) / fcMhz)
                                .isCloseTo(bandwidthPercent / 100.0, within(bandwidthPercent / 100.0 * 1e-11));
                    });
        }

        @Test
        @DisplayName("GEOMETRIC, hand-worked: 5 MHz, 60 %: B = 3 MHz, fl,u = (-/+3 + sqrt(9 + 100))/2 = 3.720 and 6.720 MHz")
        void geometricHandWorkedExample() {
            PulseResult r = compute(FIVE_MHZ_STEEL.toBuilder().bandwidthPercent(60.0)
                    .centreFrequencyConvention(CentreFrequencyConvention.GEOMETRIC).build());
            assertThat(r.lowerFrequencyMhz()).isCloseTo((-3 + Math.sqrt(109)) / 2, within(1e-12));
            assertThat(r.upperFrequencyMhz()).isCloseTo((3 + Math.sqrt(109)) / 2, within(1e-12));
            assertThat(r.lowerFrequencyMhz()).isCloseTo(3.720, within(0.0005));
        }
    }

    @Nested
    class BandAndPulseLength {
        @Test
        @DisplayName("spatial pulse length is v tau(-6 dB) and axial resolution half of it (common practice, no published source)")
        void spatialPulseLengthAndAxialResolution() {
            PulseResult r = compute(FIVE_MHZ_STEEL.toBuilder().bandwidthPercent(60.0).build());
            // tau(-6 dB) = 2 x 0.1465871197758856 us: scipy.signal.gausspulse('cutoff', 5, 0.6, -6, -6)
            double tauUs = 2 * 0.1465871197758856;
            assertThat(r.pulseDuration6dbUs()).isCloseTo(tauUs, within(tauUs * ALLOWED_RELATIVE_ERROR));
            assertThat(r.spatialPulseLengthMm()).isCloseTo(5.92 * tauUs, within(1e-12));
            assertThat(r.axialResolutionMm()).isCloseTo(5.92 * tauUs / 2, within(1e-12));
        }

        @ParameterizedTest(name = "{0} % at -{1} dB: lower edge {2}")
        @CsvSource({"77, 40, true", "78, 40, false", "109, 20, true", "110, 20, false"})
        @DisplayName("a lower edge exists exactly while fc - (bw fc/2) sqrt(L/6) > 0, i.e. bw < 2/sqrt(L/6) (model)")
        void lowerEdgeExistsWhileAboveZeroHertz(double bandwidthPercent, int levelDb, boolean exists) {
            PulseResult r = compute(FIVE_MHZ_STEEL.toBuilder().bandwidthPercent(bandwidthPercent).build());
            var edge = levelDb == 40 ? r.lowerFrequency40dbMhz() : r.lowerFrequency20dbMhz();
            assertThat(bandwidthPercent / 100.0 < 2 / Math.sqrt(levelDb / 6.0)).isEqualTo(exists);
            assertThat(edge.isPresent()).isEqualTo(exists);
            assertThat(codes(r).contains("NO_LOWER_FREQUENCY_" + levelDb + "DB")).isEqualTo(!exists);
        }

        @Test
        @DisplayName("the warning for a missing lower edge names the field")
        void missingLowerEdgeWarningNamesTheField() {
            PulseResult r = compute(FIVE_MHZ_STEEL.toBuilder().bandwidthPercent(80.0).build());
            assertThat(r.lowerFrequency40dbMhz()).isEmpty();
            assertThat(r.warnings()).filteredOn(w -> w.code().equals("NO_LOWER_FREQUENCY_40DB"))
                    .singleElement()
                    .satisfies(w -> assertThat(w.message()).contains("lower_frequency_40db_mhz"));
        }

        @Test
        @DisplayName("bandwidth above 100 % warns (negative-frequency image, src/docs/methods.md); 100 % does not")
        void bandwidthAboveHundredPercentWarns() {
            assertThat(codes(compute(FIVE_MHZ_STEEL.toBuilder().bandwidthPercent(100.0).build())))
                    .doesNotContain("BANDWIDTH_ABOVE_100_PERCENT");
            PulseResult r = compute(FIVE_MHZ_STEEL.toBuilder().bandwidthPercent(100.5).build());
            assertThat(codes(r)).contains("BANDWIDTH_ABOVE_100_PERCENT");
            assertThat(r.warnings()).filteredOn(w -> w.code().equals("BANDWIDTH_ABOVE_100_PERCENT"))
                    .singleElement()
                    .satisfies(w -> assertThat(w.message()).contains("bandwidth_percent", "lower_frequency_mhz"));
        }
    }

    @Nested
    class Beam {
        static final double WAVELENGTH_MM = 5.92 / 5.0;

        @Test
        @DisplayName("an element exactly one wavelength across has no exact near field: null with a warning, never 0")
        void elementOfOneWavelengthHasNoExactNearField() {
            // (D^2 - lambda^2)/(4 lambda) is 0 at D = lambda: the face itself, not a maximum in front of it.
            // 1 MHz in 1000 m/s: lambda = 1 mm exactly.
            PulseResult r = compute(PulseInput.builder(1.0, 1000.0).elementDiameterMm(1.0).build());
            assertThat(r.wavelengthMm()).isEqualTo(1.0);
            assertThat(r.nearFieldLengthExactMm()).isEmpty();
            assertThat(codes(r)).contains("NO_EXACT_NEAR_FIELD");
            assertThat(PistonBeam.exactNearFieldLengthMm(1.0, 1.0)).isEmpty();
            assertThat(PistonBeam.exactNearFieldLengthMm(1.0 + 1e-9, 1.0).orElseThrow()).isPositive();
        }

        @Test
        @DisplayName("beam-spread angles lie where the pulse-echo directivity (Commons Math BesselJ) is at -6 dB, -20 dB and the first null")
        void beamSpreadAnglesAreAtTheirLevels() {
            PulseResult r = compute(FIVE_MHZ_STEEL.toBuilder().elementDiameterMm(10.0).build());
            assertThat(twoWayDirectivityAt(r.beamSpread6dbDeg().orElseThrow(), 10.0, WAVELENGTH_MM))
                    .isCloseTo(Math.pow(10, -6.0 / 20), within(1e-12));
            assertThat(twoWayDirectivityAt(r.beamSpread20dbDeg().orElseThrow(), 10.0, WAVELENGTH_MM))
                    .isCloseTo(0.1, within(1e-12));
            assertThat(twoWayDirectivityAt(r.beamSpreadNullDeg().orElseThrow(), 10.0, WAVELENGTH_MM))
                    .isCloseTo(0.0, within(1e-20));
            // cross-check from memory: sin(theta_null) = 1.22 lambda / D
            assertThat(Math.sin(Math.toRadians(r.beamSpreadNullDeg().orElseThrow())))
                    .isCloseTo(1.22 * WAVELENGTH_MM / 10.0, within(1e-3));
            assertThat(r.nearFieldLengthMm()).isCloseTo(100.0 / (4 * WAVELENGTH_MM), within(1e-12));
            assertThat(r.nearFieldLengthExactMm().orElseThrow())
                    .isCloseTo((100.0 - WAVELENGTH_MM * WAVELENGTH_MM) / (4 * WAVELENGTH_MM), within(1e-12));
        }

        @Test
        @DisplayName("an element between 0.87 and 1.22 wavelengths has -6 and -20 dB angles but no first null: empty with a warning")
        void smallElementHasNoFirstNull() {
            PulseResult r = compute(FIVE_MHZ_STEEL.toBuilder().elementDiameterMm(1.3).build());
            assertThat(r.beamSpread6dbDeg()).isPresent();
            assertThat(r.beamSpread20dbDeg()).isPresent();
            assertThat(r.beamSpreadNullDeg()).isEmpty();
            assertThat(r.nearFieldLengthExactMm()).isPresent();
            assertThat(codes(r)).containsExactly("NO_BEAM_SPREAD_NULL");
            assertThat(r.warnings().get(0).message()).contains("beam_spread_null_deg", "element_diameter_mm");
        }

        @Test
        @DisplayName("an element below half a wavelength has no angle, no exact near field and no beam diameter: empty with warnings")
        void tinyElementHasNoBeamAngles() {
            PulseResult r = compute(FIVE_MHZ_STEEL.toBuilder().elementDiameterMm(0.5).distanceMm(20.0).build());
            assertThat(r.nearFieldLengthMm()).isCloseTo(0.25 / (4 * WAVELENGTH_MM), within(1e-12));
            assertThat(r.nearFieldLengthExactMm()).isEmpty();
            assertThat(r.beamSpread6dbDeg()).isEmpty();
            assertThat(r.beamSpread20dbDeg()).isEmpty();
            assertThat(r.beamSpreadNullDeg()).isEmpty();
            assertThat(r.beamDiameter6dbMm()).isEmpty();
            assertThat(codes(r)).containsExactlyInAnyOrder("NO_EXACT_NEAR_FIELD", "NO_BEAM_SPREAD_6DB",
                    "NO_BEAM_SPREAD_20DB", "NO_BEAM_SPREAD_NULL", "NO_BEAM_DIAMETER_6DB");
        }

        @Test
        @DisplayName("beam diameter is 2 z tan(theta -6 dB) in the far field, without a warning")
        void beamDiameterInFarField() {
            PulseResult r = compute(FIVE_MHZ_STEEL.toBuilder().elementDiameterMm(10.0).distanceMm(60.0).build());
            double thetaRad = Math.toRadians(r.beamSpread6dbDeg().orElseThrow());
            assertThat(r.beamDiameter6dbMm().orElseThrow()).isCloseTo(2 * 60.0 * Math.tan(thetaRad), within(1e-12));
            assertThat(r.warnings()).isEmpty();
        }

        @Test
        @DisplayName("inside the near field the far-field beam diameter does not hold: null with a warning (10 mm, 5 MHz, z = 10 mm < N = 21.1 mm)")
        void distanceInsideNearFieldHasNoBeamDiameter() {
            // The far-field cone would give 2 x 10 x tan(3.49 deg) = 1.22 mm at 10 mm, an eighth of the element:
            // inside the near field the beam is of the order of the element's diameter (Krautkraemer, from memory).
            PulseResult r = compute(FIVE_MHZ_STEEL.toBuilder().elementDiameterMm(10.0).distanceMm(10.0).build());
            assertThat(r.nearFieldLengthMm()).isGreaterThan(10.0);
            assertThat(r.beamDiameter6dbMm()).isEmpty();
            assertThat(codes(r)).containsExactly("DISTANCE_IN_NEAR_FIELD");
            assertThat(r.warnings().get(0).message()).contains("distance_mm", "beam_diameter_6db_mm is null");
        }

        @Test
        @DisplayName("just inside the near field the beam diameter is null too; at the near-field end it exists")
        void distanceInsideNearFieldWarns() {
            PulseResult r = compute(FIVE_MHZ_STEEL.toBuilder().elementDiameterMm(10.0).distanceMm(15.0).build());
            assertThat(r.beamDiameter6dbMm()).isEmpty();
            PulseResult atEnd = compute(FIVE_MHZ_STEEL.toBuilder().elementDiameterMm(10.0)
                    .distanceMm(100.0 / (4 * WAVELENGTH_MM)).build());
            assertThat(atEnd.beamDiameter6dbMm()).isPresent();
            assertThat(codes(r)).containsExactly("DISTANCE_IN_NEAR_FIELD");
            assertThat(r.warnings().get(0).message()).contains("distance_mm");
        }

        @Test
        @DisplayName("behind a wedge the distance is compared with the near field left in the part")
        void distanceBehindWedgeIsComparedWithNearFieldInPart() {
            PulseInput wedge = FIVE_MHZ_STEEL.toBuilder().elementDiameterMm(10.0).wedgePathMm(10.0)
                    .wedgeVelocityMPerS(WEDGE_M_PER_S).build();
            // N = 21.11 mm, N in part = 21.11 - 10 x 2730/5920 = 16.50 mm
            PulseResult beyond = compute(wedge.toBuilder().distanceMm(18.0).build());
            assertThat(beyond.nearFieldInPartMm()).isCloseTo(100.0 / (4 * WAVELENGTH_MM) - 10.0 * 2730 / 5920,
                    within(1e-12));
            assertThat(beyond.warnings()).isEmpty();
            PulseResult inside = compute(wedge.toBuilder().distanceMm(15.0).build());
            assertThat(codes(inside)).containsExactly("DISTANCE_IN_NEAR_FIELD");
            assertThat(inside.warnings().get(0).message()).contains("left in the part");
        }

        @Test
        @DisplayName("a wedge longer than the near field leaves a negative near field in the part, with a warning")
        void longWedgeLeavesOnlyFarField() {
            PulseResult r = compute(FIVE_MHZ_STEEL.toBuilder().elementDiameterMm(10.0).wedgePathMm(50.0)
                    .wedgeVelocityMPerS(WEDGE_M_PER_S).build());
            assertThat(r.nearFieldInPartMm()).isNegative();
            assertThat(codes(r)).containsExactly("PART_IN_FAR_FIELD_ONLY");
        }
    }

    @Nested
    class Refraction {
        @Test
        @DisplayName("refracted angle by Snell's law with the part's velocity of the chosen mode (steel shear 3255 m/s)")
        void refractedAngleUsesPartVelocity() {
            PulseResult r = compute(PulseInput.builder(5.0, STEEL_SHEAR_M_PER_S).wedgeVelocityMPerS(WEDGE_M_PER_S)
                    .incidentAngleDeg(36.0).build());
            double expected = Math.toDegrees(Math.asin(Math.sin(Math.toRadians(36.0)) * 3255.0 / 2730.0));
            assertThat(r.refractedAngleDeg().orElseThrow()).isCloseTo(expected, within(1e-9));
            assertThat(r.warnings()).isEmpty();
            assertThat(r.nearFieldInPartMm()).isNull();
        }

        @Test
        @DisplayName("past the critical angle (asin(2730/3255) = 57.0 deg) the refracted angle is empty, with a warning naming it")
        void pastCriticalAngleIsEmptyWithWarning() {
            PulseResult r = compute(PulseInput.builder(5.0, STEEL_SHEAR_M_PER_S).wedgeVelocityMPerS(WEDGE_M_PER_S)
                    .incidentAngleDeg(60.0).build());
            assertThat(r.refractedAngleDeg()).isEmpty();
            assertThat(codes(r)).containsExactly("PAST_CRITICAL_ANGLE");
            assertThat(r.warnings().get(0).message()).contains("incident_angle_deg", "critical angle 57 deg");
        }
    }

    @Nested
    class InputsWithoutWhatTheyNeed {
        void assertNotApplicable(PulseInput in, String field) {
            assertThatThrownBy(() -> compute(in))
                    .isInstanceOfSatisfying(CalculationException.class, e -> {
                        assertThat(e.error()).isEqualTo(CalculationError.NOT_APPLICABLE);
                        assertThat(e.error().category()).isEqualTo(CalculationError.Category.INVALID_INPUT);
                        assertThat(e.fields()).containsExactly(field);
                        assertThat(e.getMessage()).contains(field);
                    });
        }

        @Test
        void conventionWithoutBandwidthIsNotApplicable() {
            assertNotApplicable(FIVE_MHZ_STEEL.toBuilder()
                    .centreFrequencyConvention(CentreFrequencyConvention.GEOMETRIC).build(),
                    "centre_frequency_convention");
        }

        @Test
        void distanceWithoutDiameterIsNotApplicable() {
            assertNotApplicable(FIVE_MHZ_STEEL.toBuilder().distanceMm(50.0).build(), "distance_mm");
        }

        @Test
        void wedgePathWithoutWedgeVelocityIsNotApplicable() {
            assertNotApplicable(FIVE_MHZ_STEEL.toBuilder().elementDiameterMm(10.0).wedgePathMm(10.0)
                    .build(), "wedge_path_mm");
        }

        @Test
        void wedgePathWithoutDiameterIsNotApplicable() {
            assertNotApplicable(FIVE_MHZ_STEEL.toBuilder().wedgePathMm(10.0).wedgeVelocityMPerS(WEDGE_M_PER_S).build(),
                    "wedge_path_mm");
        }

        @Test
        void incidentAngleWithoutWedgeVelocityIsNotApplicable() {
            assertNotApplicable(FIVE_MHZ_STEEL.toBuilder().incidentAngleDeg(30.0).build(), "incident_angle_deg");
        }

        @Test
        void wedgeVelocityAloneIsNotApplicable() {
            assertNotApplicable(FIVE_MHZ_STEEL.toBuilder().wedgeVelocityMPerS(WEDGE_M_PER_S)
                    .build(), "wedge_velocity_m_per_s");
        }
    }

    @Nested
    class ImpossibleSingleValues {
        void assertInvalid(Runnable build, String field) {
            assertThatThrownBy(build::run)
                    .isInstanceOfSatisfying(CalculationException.class, e -> {
                        assertThat(e.error()).isEqualTo(CalculationError.INVALID_INPUT);
                        assertThat(e.fields()).containsExactly(field);
                    });
        }

        @Test
        void nanFrequencyIsInvalid() {
            assertInvalid(() -> PulseInput.of(Double.NaN, 5920.0), "frequency_mhz");
        }

        @Test
        void infiniteVelocityIsInvalid() {
            assertInvalid(() -> PulseInput.of(5.0, Double.POSITIVE_INFINITY), "velocity_m_per_s");
        }

        @Test
        void bandwidthOfTwoHundredPercentIsInvalid() {
            assertInvalid(() -> FIVE_MHZ_STEEL.toBuilder().bandwidthPercent(200.0).build(), "bandwidth_percent");
            assertInvalid(() -> FIVE_MHZ_STEEL.toBuilder().bandwidthPercent(0.0).build(), "bandwidth_percent");
        }

        @Test
        void negativeDiameterIsInvalid() {
            assertInvalid(() -> FIVE_MHZ_STEEL.toBuilder().elementDiameterMm(-1.0).build(), "element_diameter_mm");
        }

        @Test
        void ninetyDegreeIncidenceIsInvalid() {
            assertInvalid(() -> FIVE_MHZ_STEEL.toBuilder().incidentAngleDeg(90.0).build(), "incident_angle_deg");
        }
    }
}
