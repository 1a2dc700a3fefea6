package utdigit.core.sheets;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Which sheet inputs each metric's formula uses, and where each input lives in a sheet (a JSON
 * Pointer into the sheet's sections). A rule that cannot be evaluated names in {@code
 * missing_inputs} the sheet inputs to add; each figure is computed as soon as the inputs its own
 * formula uses are given, and needs no other.
 */
public final class SheetDependencies {
    private SheetDependencies() {}

    /** Where each sheet input lives (its mm / m/s form; the inch and material forms are alternatives). */
    public static final Map<String, String> POINTERS = Map.ofEntries(
            Map.entry("frequency_mhz", "/probe/frequency_mhz"),
            Map.entry("bandwidth_percent", "/probe/bandwidth_percent"),
            Map.entry("element_diameter_mm", "/probe/element_diameter_mm"),
            Map.entry("element_count", "/probe/element_count"),
            Map.entry("velocity_m_per_s", "/material/velocity_m_per_s"),
            Map.entry("velocity_uncertainty_m_per_s", "/material/velocity_uncertainty_m_per_s"),
            Map.entry("thickness_mm", "/material/thickness_mm"),
            Map.entry("refracted_angle_deg", "/material/refracted_angle_deg"),
            Map.entry("sampling_frequency_mhz", "/digitization/sampling_frequency_mhz"),
            Map.entry("decimation_factor", "/digitization/decimation_factor"),
            Map.entry("bit_depth", "/digitization/bit_depth"),
            Map.entry("pulse_repetition_frequency_hz", "/acquisition/pulse_repetition_frequency_hz"),
            Map.entry("focal_laws", "/acquisition/focal_laws"),
            Map.entry("fmc_element_count", "/acquisition/fmc_element_count"),
            Map.entry("averaging", "/acquisition/averaging"),
            Map.entry("scan_increment_mm", "/acquisition/scan_increment_mm"),
            Map.entry("scan_length_mm", "/acquisition/scan_length_mm"),
            Map.entry("planned_scan_speed_mm_per_s", "/acquisition/planned_scan_speed_mm_per_s"),
            Map.entry("gate_length_us", "/acquisition/gate_length_us"),
            Map.entry("gate_length_mm", "/acquisition/gate_length_mm"),
            Map.entry("max_sound_path_mm", "/acquisition/max_sound_path_mm"),
            Map.entry("max_round_trip_us", "/acquisition/max_round_trip_us"),
            Map.entry("wraparound_decay_factor", "/acquisition/wraparound_decay_factor"),
            Map.entry("probe_centre_separation_mm", "/tofd/probe_centre_separation_mm"),
            Map.entry("depth_of_interest_mm", "/tofd/depth_of_interest_mm"),
            Map.entry("tfm_grid_spacing_mm", "/tfm/grid_spacing_mm"),
            Map.entry("tfm_lateral_grid_spacing_mm", "/tfm/lateral_grid_spacing_mm"),
            Map.entry("tfm_aperture_mm", "/tfm/aperture_mm"),
            Map.entry("tfm_depth_mm", "/tfm/depth_mm"),
            Map.entry("reference_height_percent_fsh", "/evaluation/reference_height_percent_fsh"),
            Map.entry("evaluation_level_db", "/evaluation/evaluation_level_db"),
            Map.entry("amplitude_tolerance_db", "/evaluation/amplitude_tolerance_db"),
            Map.entry("thickness_tolerance_mm", "/evaluation/thickness_tolerance_mm"),
            Map.entry("beam_width_6db_mm", "/setup/beam_width_6db_mm"),
            Map.entry("sound_path_mm", "/setup/sound_path_mm"),
            Map.entry("index_step_mm", "/setup/index_step_mm"),
            Map.entry("angular_step_deg", "/setup/angular_step_deg"),
            Map.entry("element_pitch_mm", "/setup/element_pitch_mm"),
            Map.entry("active_elements", "/setup/active_elements"),
            Map.entry("dac_span_db", "/setup/dac_span_db"),
            Map.entry("gate_start_us", "/setup/gate_start_us"),
            Map.entry("gate_end_us", "/setup/gate_end_us"),
            Map.entry("incident_angle_deg", "/setup/incident_angle_deg"),
            Map.entry("wedge_velocity_m_per_s", "/setup/wedge_velocity_m_per_s"));

    private static final String FS = "sampling_frequency_mhz";
    private static final String F = "frequency_mhz";
    private static final String C = "velocity_m_per_s";
    private static final String BW = "bandwidth_percent";
    private static final String PCS = "probe_centre_separation_mm";
    /** The gate: in us, or as a sound path in mm (which needs the velocity, checked at the door). */
    private static final String GATE = "gate_length_us|gate_length_mm";
    private static final List<String> ANGLE_BEAM =
            List.of(F, C, "element_diameter_mm", "incident_angle_deg", "wedge_velocity_m_per_s");
    private static final List<String> DATA_VOLUME =
            List.of(FS, "bit_depth", GATE, "scan_increment_mm", "pulse_repetition_frequency_hz");

    /**
     * The inputs (or other metrics) each computed metric's formula uses; "a|b" means either input.
     * A metric not listed here names no inputs to add.
     */
    static final Map<String, List<String>> NEEDS = Map.ofEntries(
            Map.entry("period_us", List.of(F, C)),
            Map.entry("wavelength_mm", List.of(F, C)),
            Map.entry("lower_frequency_mhz", List.of(F, C, BW)),
            Map.entry("upper_frequency_mhz", List.of(F, C, BW)),
            Map.entry("pulse_duration_6db_us", List.of(F, C, BW)),
            Map.entry("pulse_duration_20db_us", List.of(F, C, BW)),
            Map.entry("cycles_6db", List.of(F, C, BW)),
            Map.entry("spatial_pulse_length_mm", List.of(F, C, BW)),
            Map.entry("axial_resolution_mm", List.of(F, C, BW)),
            Map.entry("near_field_length_mm", List.of(F, C, "element_diameter_mm")),
            Map.entry("beam_spread_6db_deg", List.of(F, C, "element_diameter_mm")),
            Map.entry("effective_sampling_frequency_mhz", List.of(FS, F)),
            Map.entry("sampling_interval_ns", List.of(FS, F)),
            Map.entry("samples_per_period", List.of(FS, F)),
            Map.entry("nyquist_frequency_mhz", List.of(FS, F)),
            Map.entry("sine_amplitude_loss_db", List.of(FS, F)),
            Map.entry("timing_error_ns", List.of(FS, F)),
            Map.entry("timing_standard_uncertainty_ns", List.of(FS, F)),
            Map.entry("samples_per_period_upper", List.of(FS, F, BW)),
            Map.entry("pulse_amplitude_loss_db", List.of(FS, F, BW)),
            Map.entry("spectral_level_at_nyquist_db", List.of(FS, F, BW)),
            Map.entry("energy_above_nyquist_fraction", List.of(FS, F, BW)),
            Map.entry("tfm_grid_amplitude_loss_db", List.of(FS, F, "tfm_grid_spacing_mm", C)),
            Map.entry("tfm_lateral_amplitude_loss_db",
                    List.of(FS, F, "tfm_lateral_grid_spacing_mm", "tfm_aperture_mm", "tfm_depth_mm")),
            Map.entry("levels", List.of("bit_depth")),
            Map.entry("lsb_percent_fsh", List.of("bit_depth")),
            Map.entry("dynamic_range_db", List.of("bit_depth")),
            Map.entry("minimum_height_percent_fsh", List.of("bit_depth", "amplitude_tolerance_db")),
            Map.entry("evaluation_height_percent_fsh",
                    List.of("bit_depth", "reference_height_percent_fsh", "evaluation_level_db")),
            Map.entry("evaluation_error_under_db",
                    List.of("bit_depth", "reference_height_percent_fsh", "evaluation_level_db")),
            Map.entry("sound_path_resolution_mm", List.of(FS, C)),
            Map.entry("depth_resolution_mm", List.of(FS, C, "refracted_angle_deg")),
            Map.entry("lateral_wave_time_us", List.of(FS, C, PCS)),
            Map.entry("time_of_flight_us", List.of(FS, C, PCS, "depth_of_interest_mm")),
            Map.entry("pulse_limited_depth_resolution_mm", List.of(FS, C, PCS, "depth_of_interest_mm", F, BW)),
            Map.entry("dead_zone_depth_mm", List.of(FS, C, PCS, F, BW)),
            Map.entry("backwall_dead_zone_mm", List.of(FS, C, PCS, "thickness_mm", F, BW)),
            Map.entry("thickness_resolution_mm", List.of(FS, C, "thickness_mm")),
            Map.entry("samples_across_thickness", List.of(FS, C, "thickness_mm")),
            Map.entry("standard_uncertainty_mm", List.of(FS, C, "thickness_mm")),
            Map.entry("expanded_uncertainty_mm", List.of(FS, C, "thickness_mm")),
            Map.entry("samples_per_a_scan", DATA_VOLUME),
            Map.entry("a_scans_per_position", DATA_VOLUME),
            Map.entry("bytes_per_position", DATA_VOLUME),
            Map.entry("megabytes_per_metre", DATA_VOLUME),
            Map.entry("data_rate_megabytes_per_s", DATA_VOLUME),
            Map.entry("file_size_megabytes", List.of("data_rate_megabytes_per_s", "scan_length_mm")),
            Map.entry("firings_per_position", List.of("pulse_repetition_frequency_hz", "scan_increment_mm")),
            Map.entry("max_scan_speed_mm_per_s", List.of("pulse_repetition_frequency_hz", "scan_increment_mm")),
            Map.entry("max_prf_without_wraparound_hz", List.of("max_sound_path_mm|max_round_trip_us")),
            Map.entry("evaluation_error_magnitude_db", List.of("evaluation_error_under_db")),
            Map.entry("combined_amplitude_error_db", List.of("pulse_amplitude_loss_db", "evaluation_error_under_db")),
            // The setup section's metrics (SheetSetupMetrics): the beam width is given, or comes from
            // the round probe at the sound path; its pointer names the given form.
            Map.entry("scan_increment_loss_db", List.of("beam_width_6db_mm", "scan_increment_mm")),
            Map.entry("index_step_loss_db", List.of("beam_width_6db_mm", "index_step_mm")),
            Map.entry("angular_step_loss_db", List.of("beam_width_6db_mm", "angular_step_deg", "sound_path_mm")),
            Map.entry("aperture_near_field_length_mm", List.of(F, C, "element_pitch_mm", "active_elements")),
            Map.entry("aperture_beam_spread_6db_deg", List.of(F, C, "element_pitch_mm", "active_elements")),
            Map.entry("max_grating_lobe_free_pitch_mm", List.of(F, C, "element_pitch_mm")),
            Map.entry("lowest_reference_height_percent_fsh",
                    List.of("bit_depth", "dac_span_db", "reference_height_percent_fsh")),
            Map.entry("dac_error_magnitude_db", List.of("bit_depth", "dac_span_db", "reference_height_percent_fsh")),
            Map.entry("backwall_time_us", List.of(C, PCS, "thickness_mm")),
            Map.entry("gate_start_margin_us", List.of(C, PCS, "thickness_mm", "gate_start_us", "gate_end_us")),
            Map.entry("gate_end_margin_us", List.of(C, PCS, "thickness_mm", "gate_start_us", "gate_end_us")),
            Map.entry("tofd_timing_depth_uncertainty_mm", List.of(FS, C, PCS, "thickness_mm", "depth_of_interest_mm")),
            // An angle beam's incidence plane: the projected aperture needs the refracted angle (Snell).
            Map.entry("incidence_plane_aperture_mm", ANGLE_BEAM),
            Map.entry("incidence_plane_near_field_length_mm", ANGLE_BEAM),
            Map.entry("incidence_plane_beam_spread_6db_deg", ANGLE_BEAM));

    /** A TOFD sheet's depth step per sample is the TOFD geometry's, not an angle beam's. */
    private static final List<String> TOFD_DEPTH_RESOLUTION = List.of(FS, C, PCS, "depth_of_interest_mm");

    /**
     * JSON Pointers of the sheet inputs to add so that {@code metrics} can be computed, in a stable
     * order without repeats.
     *
     * @param given the names of the inputs the sheet gives (including gate_length_mm, max_sound_path_mm)
     */
    public static List<String> missingInputs(List<String> metrics, Set<String> given, SheetTechnique technique) {
        Set<String> pointers = new LinkedHashSet<>();
        for (String metric : metrics) {
            collect(metric, given, technique, pointers, 0);
        }
        return new ArrayList<>(pointers);
    }

    private static void collect(String metric, Set<String> given, SheetTechnique technique, Set<String> out,
                                int depth) {
        if (depth > 8) {
            return;
        }
        if (metric.contains("|")) {
            String[] alternatives = metric.split("\\|");
            for (String a : alternatives) {
                if (given.contains(a)) {
                    return;
                }
            }
            collect(alternatives[0], given, technique, out, depth + 1);
            return;
        }
        if (POINTERS.containsKey(metric)) {
            if (!given.contains(metric)) {
                out.add(POINTERS.get(metric));
            }
            return;
        }
        List<String> needs = technique == SheetTechnique.TOFD && metric.equals("depth_resolution_mm")
                ? TOFD_DEPTH_RESOLUTION : NEEDS.getOrDefault(metric, List.of());
        for (String n : needs) {
            collect(n, given, technique, out, depth + 1);
        }
    }
}
