package utdigit.core.pulse;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * An angle beam's near field and beam spread in the incidence plane, where the part sees the
 * projected aperture D cos(beta)/cos(alpha), and in the perpendicular plane, which keeps D.
 * The projected aperture is checked against ray geometry written out here (the element's edge rays
 * refracted by Snell's law and their separation measured across the refracted beam), the beam-spread
 * angles against the two-way piston directivity (Commons Math BesselJ, as in PistonDirectivityTest).
 */
class AngleBeamTest {

    private static final double STEEL_SHEAR_M_PER_S = 3255.0;
    private static final double WEDGE_M_PER_S = 2730.0;

    /** 5 MHz, 10 mm element, shear in steel from a 2730 m/s wedge at the incident angle for 45 deg. */
    private static final double INCIDENT_FOR_45_DEG =
            Math.toDegrees(Math.asin(Math.sin(Math.toRadians(45.0)) * WEDGE_M_PER_S / STEEL_SHEAR_M_PER_S));

    private static PulseInput angleBeam() {
        return PulseInput.builder(5.0, STEEL_SHEAR_M_PER_S).elementDiameterMm(10.0)
                .wedgeVelocityMPerS(WEDGE_M_PER_S).incidentAngleDeg(INCIDENT_FOR_45_DEG).build();
    }

    /**
     * The projected aperture by ray geometry: the element (width D, face normal to the incident
     * direction) sends its two edge rays to the interface y = 0; each refracts by Snell's law; the
     * width of the refracted beam is the distance between the two refracted rays measured across them.
     */
    private static double apertureByRays(double diameterMm, double incidentDeg, double vWedge, double vPart) {
        double alpha = Math.toRadians(incidentDeg);
        // incident direction (sin a, -cos a); the element's face spans D along (cos a, sin a)
        double[] edgeA = {0.0, 20.0};
        double[] edgeB = {edgeA[0] + diameterMm * Math.cos(alpha), edgeA[1] + diameterMm * Math.sin(alpha)};
        double hitA = edgeA[0] + edgeA[1] * Math.tan(alpha); // where each edge ray meets y = 0
        double hitB = edgeB[0] + edgeB[1] * Math.tan(alpha);
        double beta = Math.asin(Math.sin(alpha) * vPart / vWedge);
        // refracted direction (sin b, -cos b): the beam's width across it is |hitB - hitA| cos b
        return Math.abs(hitB - hitA) * Math.cos(beta);
    }

    @Test
    @DisplayName("45 deg shear in steel: the incidence plane sees 0.878 D, its near field 0.77 N (ray geometry, Snell)")
    void projectedApertureAndNearField() {
        PulseResult r = PulseCalculator.compute(angleBeam());
        assertThat(r.refractedAngleDeg().orElseThrow()).isCloseTo(45.0, within(1e-9));
        double apertureMm = apertureByRays(10.0, INCIDENT_FOR_45_DEG, WEDGE_M_PER_S, STEEL_SHEAR_M_PER_S);
        PulseResult.IncidencePlane plane = r.incidencePlane();
        assertThat(plane.apertureMm().orElseThrow()).isCloseTo(apertureMm, within(1e-9));
        double wavelengthMm = STEEL_SHEAR_M_PER_S / 5.0 / 1000.0;
        assertThat(plane.nearFieldLengthMm().orElseThrow())
                .isCloseTo(apertureMm * apertureMm / (4 * wavelengthMm), within(1e-9));
        // the figure: near field x 0.77 in that plane
        assertThat(plane.nearFieldLengthMm().orElseThrow() / r.nearFieldLengthMm()).isCloseTo(0.771, within(0.001));
        // the perpendicular plane keeps D
        assertThat(r.nearFieldLengthMm()).isCloseTo(100.0 / (4 * wavelengthMm), within(1e-9));
    }

    @Test
    @DisplayName("beam spread in the incidence plane is the piston's with D_eff, wider than with D (BesselJ directivity)")
    void beamSpreadInTheIncidencePlane() {
        PulseResult r = PulseCalculator.compute(angleBeam());
        PulseResult.IncidencePlane plane = r.incidencePlane();
        double apertureMm = plane.apertureMm().orElseThrow();
        double wavelengthMm = STEEL_SHEAR_M_PER_S / 5.0 / 1000.0;
        assertThat(PulseCalculatorTest.twoWayDirectivityAt(plane.beamSpread6dbDeg().orElseThrow(), apertureMm,
                wavelengthMm)).isCloseTo(Math.pow(10, -6.0 / 20), within(1e-12));
        assertThat(PulseCalculatorTest.twoWayDirectivityAt(plane.beamSpread20dbDeg().orElseThrow(), apertureMm,
                wavelengthMm)).isCloseTo(0.1, within(1e-12));
        assertThat(plane.beamSpread6dbDeg().orElseThrow()).isGreaterThan(r.beamSpread6dbDeg().orElseThrow());
        assertThat(r.references()).anySatisfy(ref -> assertThat(ref.topic()).isEqualTo("incidence plane of an angle beam"));
    }

    @Test
    @DisplayName("the wedge path carried into the part: a wedge path equal to the element's near field in the wedge "
            + "leaves no near field in either plane (the planes' transfer factors are consistent with D and D_eff)")
    void wedgePathInTheIncidencePlane() {
        // near field of D in the wedge's material: D^2 f / (4 v_w)
        double wedgeNearFieldMm = 100.0 * 5.0 / (4 * WEDGE_M_PER_S / 1000.0);
        PulseResult r = PulseCalculator.compute(angleBeam().toBuilder().wedgePathMm(wedgeNearFieldMm).build());
        assertThat(r.nearFieldInPartMm()).isCloseTo(0.0, within(1e-9));
        assertThat(r.incidencePlane().nearFieldInPartMm().orElseThrow()).isCloseTo(0.0, within(1e-9));
        // half of it leaves half of each plane's near field
        PulseResult half = PulseCalculator.compute(angleBeam().toBuilder().wedgePathMm(wedgeNearFieldMm / 2).build());
        assertThat(half.incidencePlane().nearFieldInPartMm().orElseThrow())
                .isCloseTo(half.incidencePlane().nearFieldLengthMm().orElseThrow() / 2, within(1e-9));
    }

    @Test
    @DisplayName("beam width in the incidence plane: null inside that plane's near field, 2 z tan(theta) beyond it")
    void beamWidthInTheIncidencePlane() {
        PulseResult inside = PulseCalculator.compute(angleBeam().toBuilder().distanceMm(10.0).build());
        assertThat(inside.incidencePlane().beamDiameter6dbMm()).isEmpty();
        assertThat(PulseCalculatorTest.codes(inside)).contains(PulseCalculator.DISTANCE_IN_INCIDENCE_PLANE_NEAR_FIELD);
        PulseResult beyond = PulseCalculator.compute(angleBeam().toBuilder().distanceMm(60.0).build());
        double theta = Math.toRadians(beyond.incidencePlane().beamSpread6dbDeg().orElseThrow());
        assertThat(beyond.incidencePlane().beamDiameter6dbMm().orElseThrow())
                .isCloseTo(2 * 60.0 * Math.tan(theta), within(1e-9));
    }

    @Test
    @DisplayName("past the critical angle every incidence-plane figure is null, with the critical-angle warning; "
            + "at normal incidence the incidence plane is the perpendicular one")
    void pastTheCriticalAngleAndNormalIncidence() {
        PulseResult past = PulseCalculator.compute(PulseInput.builder(5.0, STEEL_SHEAR_M_PER_S).elementDiameterMm(10.0)
                .wedgeVelocityMPerS(WEDGE_M_PER_S).incidentAngleDeg(60.0).distanceMm(50.0).build());
        PulseResult.IncidencePlane plane = past.incidencePlane();
        assertThat(List.of(plane.apertureMm(), plane.nearFieldLengthMm(), plane.beamSpread6dbDeg(),
                plane.beamSpread20dbDeg(), plane.beamDiameter6dbMm())).allSatisfy(o -> assertThat(o).isEmpty());
        assertThat(plane.nearFieldInPartMm()).isNull();
        assertThat(PulseCalculatorTest.codes(past)).contains("PAST_CRITICAL_ANGLE");
        assertThat(past.warnings()).anySatisfy(w -> assertThat(w.message()).contains("incidence_plane_"));

        PulseResult normal = PulseCalculator.compute(PulseInput.builder(5.0, 5920.0).elementDiameterMm(10.0)
                .wedgeVelocityMPerS(WEDGE_M_PER_S).incidentAngleDeg(0.0).build());
        assertThat(normal.incidencePlane().nearFieldLengthMm().orElseThrow()).isEqualTo(normal.nearFieldLengthMm());
        assertThat(normal.incidencePlane().beamSpread6dbDeg()).isEqualTo(normal.beamSpread6dbDeg());
    }

    @Test
    @DisplayName("without an incident angle there are no incidence-plane figures (omitted)")
    void noAngleNoIncidencePlane() {
        assertThat(PulseCalculator.compute(PulseInput.builder(5.0, 5920.0).elementDiameterMm(10.0)
                .build()).incidencePlane())
                .isNull();
    }
}
