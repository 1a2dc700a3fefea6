package utdigit.core.sheets;

import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

/**
 * The vocabulary of requirement profiles: every metric a technique-sheet validation can hold in its
 * {@code values}, by the contract's snake_case name. Sheet inputs (normalised: lengths in mm,
 * velocity in m/s) and computed results share one namespace; a profile naming anything else is
 * rejected at start-up.
 */
public final class SheetMetrics {
    private SheetMetrics() {}

    /** Sheet inputs that rules may name. */
    public static final List<String> INPUTS = List.of(
            "frequency_mhz", "bandwidth_percent", "element_diameter_mm", "element_count",
            "velocity_m_per_s", "velocity_uncertainty_m_per_s", "thickness_mm", "refracted_angle_deg",
            "sampling_frequency_mhz", "decimation_factor", "bit_depth",
            "pulse_repetition_frequency_hz", "focal_laws", "fmc_element_count", "averaging",
            "scan_increment_mm", "scan_length_mm", "planned_scan_speed_mm_per_s", "gate_length_us",
            "max_sound_path_mm", "max_round_trip_us", "wraparound_decay_factor",
            "probe_centre_separation_mm", "depth_of_interest_mm",
            "tfm_grid_spacing_mm", "tfm_lateral_grid_spacing_mm", "tfm_aperture_mm", "tfm_depth_mm",
            "reference_height_percent_fsh", "evaluation_level_db", "amplitude_tolerance_db",
            "thickness_tolerance_mm");

    /** Computed values that rules may name. */
    public static final List<String> COMPUTED = List.of(
            // pulse and beam
            "period_us", "wavelength_mm", "lower_frequency_mhz", "upper_frequency_mhz",
            "pulse_duration_6db_us", "pulse_duration_20db_us", "cycles_6db", "spatial_pulse_length_mm",
            "axial_resolution_mm", "near_field_length_mm", "beam_spread_6db_deg",
            // sampling
            "effective_sampling_frequency_mhz", "sampling_interval_ns", "samples_per_period",
            "samples_per_period_upper", "nyquist_frequency_mhz", "sine_amplitude_loss_db",
            "pulse_amplitude_loss_db", "spectral_level_at_nyquist_db", "energy_above_nyquist_fraction",
            "timing_error_ns", "timing_standard_uncertainty_ns", "tfm_grid_amplitude_loss_db",
            "tfm_lateral_amplitude_loss_db",
            // quantization
            "levels", "lsb_percent_fsh", "dynamic_range_db", "minimum_height_percent_fsh",
            "evaluation_height_percent_fsh", "evaluation_error_under_db",
            // time of flight and TOFD
            "sound_path_resolution_mm", "depth_resolution_mm", "lateral_wave_time_us", "time_of_flight_us",
            "pulse_limited_depth_resolution_mm", "dead_zone_depth_mm", "backwall_dead_zone_mm",
            // thickness
            "thickness_resolution_mm", "samples_across_thickness", "standard_uncertainty_mm",
            "expanded_uncertainty_mm",
            // acquisition
            "samples_per_a_scan", "firings_per_position", "a_scans_per_position", "bytes_per_position",
            "megabytes_per_metre", "file_size_megabytes", "max_scan_speed_mm_per_s",
            "data_rate_megabytes_per_s", "max_prf_without_wraparound_hz",
            // the sheet's own consistency
            "evaluation_error_magnitude_db", "combined_amplitude_error_db");

    /**
     * Metrics that are counts: reported as integers ({@code "bit_depth": 8}, not 8.0). Each is an
     * integer input or an exact integer result of its calculator.
     */
    public static final Set<String> COUNTS = Set.of("element_count", "decimation_factor", "bit_depth",
            "focal_laws", "fmc_element_count", "averaging", "levels", "samples_per_a_scan", "firings_per_position",
            "a_scans_per_position", "bytes_per_position");

    /** Every metric name, inputs first. */
    public static final Set<String> ALL;

    static {
        Set<String> all = new LinkedHashSet<>(INPUTS);
        all.addAll(COMPUTED);
        all.addAll(SheetSetupMetrics.INPUTS);
        all.addAll(SheetSetupMetrics.COMPUTED);
        ALL = java.util.Collections.unmodifiableSet(all);
    }

    public static boolean isKnown(String metric) {
        return ALL.contains(metric);
    }
}
