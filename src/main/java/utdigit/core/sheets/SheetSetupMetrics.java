package utdigit.core.sheets;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.BiConsumer;
import utdigit.core.arrays.ArrayApertureCalculator;
import utdigit.core.arrays.ArrayApertureInput;
import utdigit.core.arrays.ArrayApertureResult;
import utdigit.core.common.Reference;
import utdigit.core.common.Warning;
import utdigit.core.coverage.ScanCoverageCalculator;
import utdigit.core.coverage.ScanCoverageInput;
import utdigit.core.coverage.ScanCoverageResult;
import utdigit.core.dac.DacQuantizationCalculator;
import utdigit.core.dac.DacQuantizationInput;
import utdigit.core.dac.DacQuantizationResult;
import utdigit.core.dac.TcgMode;
import utdigit.core.pulse.PulseCalculator;
import utdigit.core.pulse.PulseResult;
import utdigit.core.timing.TofdSetupCalculator;
import utdigit.core.timing.TofdSetupInput;
import utdigit.core.timing.TofdSetupResult;

/**
 * The sheet metrics of scan coverage, array apertures, DAC/TCG and the TOFD set-up, computed by the
 * same core calculators as POST /api/scan-coverages, /api/array-apertures, /api/dac-quantizations
 * and /api/tofd-setups; an angle beam's incidence-plane figures come from the sheet's pulse
 * calculation (POST /api/pulse-parameters' calculator) through {@link #putIncidencePlane}.
 */
public final class SheetSetupMetrics {
    private SheetSetupMetrics() {}

    /** Sheet inputs of the set-up section that rules may name. */
    public static final List<String> INPUTS = List.of(
            "beam_width_6db_mm", "sound_path_mm", "index_step_mm", "angular_step_deg", "element_pitch_mm",
            "active_elements", "max_steering_angle_deg", "steering_velocity_m_per_s", "dac_span_db", "gate_start_us", "gate_end_us",
            "incident_angle_deg", "wedge_velocity_m_per_s");

    /** Computed values of the set-up that rules may name. */
    public static final List<String> COMPUTED = List.of(
            // scan coverage
            "scan_increment_loss_db", "index_step_loss_db", "angular_step_loss_db",
            // arrays
            "aperture_near_field_length_mm", "aperture_beam_spread_6db_deg", "max_grating_lobe_free_pitch_mm",
            // DAC / TCG
            "lowest_reference_height_percent_fsh", "dac_error_magnitude_db",
            // TOFD set-up
            "backwall_time_us", "gate_start_margin_us", "gate_end_margin_us", "tofd_timing_depth_uncertainty_mm",
            // angle beam, incidence plane (the probe's near_field_length_mm and beam_spread_6db_deg then hold for
            // the plane perpendicular to incidence)
            "incidence_plane_aperture_mm", "incidence_plane_near_field_length_mm",
            "incidence_plane_beam_spread_6db_deg");

    /**
     * An angle beam's incidence-plane figures, as POST /api/pulse-parameters computes them
     * ({@link PulseCalculator} with the sheet's incident angle and wedge velocity): the sheet's pulse
     * calculation puts them through {@code put}. Past the critical angle they are empty (the pulse
     * warning PAST_CRITICAL_ANGLE says why).
     */
    static void putIncidencePlane(PulseResult.IncidencePlane plane, BiConsumer<String, Optional<Double>> put) {
        if (plane == null) {
            return;
        }
        put.accept("incidence_plane_aperture_mm", plane.apertureMm());
        put.accept("incidence_plane_near_field_length_mm", plane.nearFieldLengthMm());
        put.accept("incidence_plane_beam_spread_6db_deg", plane.beamSpread6dbDeg());
    }

    /** The metrics, warnings (prefixed with their calculation) and references of the set-up. */
    public record Computed(Map<String, Double> values, List<Warning> warnings, List<Reference> references) {}

    public static Computed compute(SheetInput sheet) {
        Map<String, Double> values = new LinkedHashMap<>();
        List<Warning> warnings = new ArrayList<>();
        List<Reference> references = new ArrayList<>();
        SheetSetup s = sheet.setup();
        SheetInput.Probe probe = sheet.probe();
        Double f = probe.frequencyMhz();
        Double c = sheet.part().velocityMPerS();

        put(values, "beam_width_6db_mm", s.beamWidth6dbMm());
        put(values, "sound_path_mm", s.soundPathMm());
        put(values, "index_step_mm", s.indexStepMm());
        put(values, "angular_step_deg", s.angularStepDeg());
        put(values, "element_pitch_mm", s.elementPitchMm());
        put(values, "active_elements", s.activeElements() == null ? null : s.activeElements().doubleValue());
        put(values, "max_steering_angle_deg", s.maxSteeringAngleDeg());
        put(values, "steering_velocity_m_per_s", s.steeringVelocityMPerS());
        put(values, "dac_span_db", s.dacSpanDb());
        put(values, "gate_start_us", s.gateStartUs());
        put(values, "gate_end_us", s.gateEndUs());
        put(values, "incident_angle_deg", s.incidentAngleDeg());
        put(values, "wedge_velocity_m_per_s", s.wedgeVelocityMPerS());

        Double increment = sheet.acquisition().scanIncrementMm();
        boolean anyStep = increment != null || s.indexStepMm() != null
                || (s.angularStepDeg() != null && s.soundPathMm() != null);
        boolean probeBeam = s.beamWidth6dbMm() == null && f != null && c != null && probe.elementDiameterMm() != null
                && s.soundPathMm() != null;
        if (anyStep && (s.beamWidth6dbMm() != null || probeBeam)) {
            ScanCoverageResult r = ScanCoverageCalculator.compute(ScanCoverageInput.builder()
                    .beamWidth6dbMm(s.beamWidth6dbMm())
                    .frequencyMhz(probeBeam ? f : null)
                    .velocityMPerS(probeBeam ? c : null)
                    .elementDiameterMm(probeBeam ? probe.elementDiameterMm() : null)
                    .soundPathMm(s.soundPathMm())
                    .scanIncrementMm(increment)
                    .indexStepMm(s.indexStepMm())
                    .angularStepDeg(s.soundPathMm() == null ? null : s.angularStepDeg()).build());
            if (probeBeam) {
                put(values, "beam_width_6db_mm", r.beamWidth6dbMm());
            }
            put(values, "scan_increment_loss_db", r.scanIncrementLossDb());
            put(values, "index_step_loss_db", r.indexStepLossDb());
            put(values, "angular_step_loss_db", r.angularStepLossDb());
            notes("scan coverage", r.warnings(), r.references(), warnings, references);
        }

        Double steeringVelocity = s.steeringVelocityMPerS() != null ? s.steeringVelocityMPerS() : c;
        if (s.elementPitchMm() != null && f != null && steeringVelocity != null) {
            ArrayApertureResult r = ArrayApertureCalculator.compute(ArrayApertureInput.builder(f, steeringVelocity,
                            s.elementPitchMm())
                    .activeElements(s.activeElements())
                    .maxSteeringAngleDeg(s.maxSteeringAngleDeg()).build());
            put(values, "aperture_near_field_length_mm", r.nearFieldLengthMm());
            put(values, "aperture_beam_spread_6db_deg", r.beamSpread6dbDeg());
            put(values, "max_grating_lobe_free_pitch_mm", r.maxGratingLobeFreePitchMm());
            notes("array aperture", r.warnings(), r.references(), warnings, references);
        }

        Integer bits = sheet.digitization().bitDepth();
        Double reference = sheet.evaluation().referenceHeightPercentFsh();
        if (s.dacSpanDb() != null && bits != null && reference != null) {
            SheetInput.Digitization d = sheet.digitization();
            DacQuantizationResult r = DacQuantizationCalculator.compute(DacQuantizationInput.builder(bits,
                            s.dacSpanDb(), reference)
                    .digitizedSignal(d.digitizedSignal())
                    .quantizer(d.quantizer())
                    .codeMapping(d.codeMapping()).build());
            put(values, "lowest_reference_height_percent_fsh", r.lowestReferenceHeightPercentFsh());
            Optional<Double> error = s.tcg() == TcgMode.ANALOG ? r.analogTcgErrorUnderDb()
                    : s.tcg() == TcgMode.DIGITAL ? r.digitalTcgErrorUnderDb() : r.uncorrectedErrorUnderDb();
            put(values, "dac_error_magnitude_db", error.map(StrictMath::abs));
            notes("DAC", r.warnings(), r.references(), warnings, references);
        }

        Double pcs = sheet.tofd().probeCentreSeparationMm();
        Double thickness = sheet.part().thicknessMm();
        if (sheet.technique() == SheetTechnique.TOFD && pcs != null && thickness != null && c != null) {
            boolean gate = s.gateStartUs() != null && s.gateEndUs() != null && s.gateEndUs() > s.gateStartUs();
            Double depth = sheet.tofd().depthOfInterestMm();
            boolean atDepth = depth != null && depth <= thickness && sheet.digitization().samplingFrequencyMhz() != null;
            TofdSetupInput in = TofdSetupInput.builder(c, pcs, thickness)
                    .gateStartUs(gate ? s.gateStartUs() : null)
                    .gateEndUs(gate ? s.gateEndUs() : null)
                    .depthMm(atDepth ? depth : null)
                    .samplingFrequencyMhz(atDepth ? sheet.digitization().samplingFrequencyMhz() : null)
                    .decimationFactor(atDepth ? sheet.digitization().decimationFactor() : null).build();
            TofdSetupResult r = TofdSetupCalculator.compute(in);
            put(values, "backwall_time_us", r.backwallTimeUs());
            put(values, "gate_start_margin_us", r.gateStartMarginUs());
            put(values, "gate_end_margin_us", r.gateEndMarginUs());
            put(values, "tofd_timing_depth_uncertainty_mm", r.timingDepthUncertaintyMm());
            notes("TOFD set-up", r.warnings(), r.references(), warnings, references);
        }
        return new Computed(values, warnings, references);
    }

    private static void put(Map<String, Double> values, String metric, Double value) {
        if (value != null) {
            values.put(metric, value);
        }
    }

    private static void put(Map<String, Double> values, String metric, Optional<Double> value) {
        put(values, metric, value == null ? null : value.orElse(null));
    }

    private static void notes(String calculation, List<Warning> ws, List<Reference> refs, List<Warning> warnings,
                              List<Reference> references) {
        for (Warning w : ws) {
            warnings.add(Warning.of(w.code(), calculation + ": " + w.message()));
        }
        refs.forEach(r -> references.add(new Reference(calculation, r.id())));
    }
}
