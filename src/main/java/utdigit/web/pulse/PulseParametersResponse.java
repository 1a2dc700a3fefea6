package utdigit.web.pulse;

import io.swagger.v3.oas.annotations.media.Schema;
import java.util.List;
import java.util.Optional;
import utdigit.web.pipeline.ResultNotes.ReferenceView;
import utdigit.web.pipeline.ResultNotes.WarningView;
import utdigit.web.units.VelocitySourceView;

/** The answer of POST /api/pulse-parameters. */
@Schema(name = "PulseParameters", description = "Period, wavelength, the Gaussian pulse model's band and durations, "
        + "and the circular piston's near field and beam spread. Fields whose optional inputs were not given are "
        + "omitted; a value that cannot exist is null with a warning.")
record PulseParametersResponse(
        @Schema(description = "Period of the nominal frequency, us", example = "0.2")
        double periodUs,
        @Schema(description = "Wavelength in the part at the nominal frequency, mm", example = "1.184")
        double wavelengthMm,
        @Schema(description = "Wavelength in the part, in", example = "0.0466")
        double wavelengthIn,
        @Schema(description = "Lower -6 dB band edge of the chosen convention, MHz", example = "3.5")
        Double lowerFrequencyMhz,
        @Schema(description = "Upper -6 dB band edge of the chosen convention, MHz", example = "6.5")
        Double upperFrequencyMhz,
        @Schema(description = "Lower -20 dB edge of the pulse model, MHz; null below 0 Hz",
                types = {"number", "null"}, example = "2.26")
        Optional<Double> lowerFrequency20dbMhz,
        @Schema(description = "Upper -20 dB edge of the pulse model, MHz", example = "7.74")
        Double upperFrequency20dbMhz,
        @Schema(description = "Lower -40 dB edge of the pulse model, MHz; null below 0 Hz",
                types = {"number", "null"}, example = "0.39")
        Optional<Double> lowerFrequency40dbMhz,
        @Schema(description = "Upper -40 dB edge of the pulse model, MHz", example = "9.61")
        Double upperFrequency40dbMhz,
        @Schema(description = "Envelope duration between its -6 dB points, us", example = "0.294")
        Double pulseDuration6dbUs,
        @Schema(description = "Envelope duration between its -20 dB points, us", example = "0.537")
        Double pulseDuration20dbUs,
        @Schema(description = "Carrier cycles within the -6 dB envelope duration", example = "1.47")
        Double cycles6db,
        @Schema(description = "Spatial pulse length, velocity x -6 dB duration, mm", example = "1.74")
        Double spatialPulseLengthMm,
        @Schema(description = "Axial (range) resolution, half the spatial pulse length, mm (common practice)",
                example = "0.87")
        Double axialResolutionMm,
        @Schema(description = "Near-field length D^2 / (4 lambda), mm; for an angle beam the plane perpendicular "
                + "to incidence (see incidence_plane_near_field_length_mm)", example = "21.1")
        Double nearFieldLengthMm,
        @Schema(description = "Last on-axis maximum (D^2 - lambda^2) / (4 lambda), mm; null when D <= lambda",
                types = {"number", "null"}, example = "20.8")
        Optional<Double> nearFieldLengthExactMm,
        @Schema(description = "Pulse-echo (two-way) -6 dB beam-spread half-angle with D, deg (for an angle beam: "
                + "the plane perpendicular to incidence); null when none exists",
                types = {"number", "null"}, example = "3.49")
        Optional<Double> beamSpread6dbDeg,
        @Schema(description = "Pulse-echo (two-way) -20 dB beam-spread half-angle, deg; null when none exists",
                types = {"number", "null"}, example = "5.9")
        Optional<Double> beamSpread20dbDeg,
        @Schema(description = "Half-angle to the first null of the far-field directivity, deg; null when none exists",
                types = {"number", "null"}, example = "8.3")
        Optional<Double> beamSpreadNullDeg,
        @Schema(description = "Beam diameter at the distance, 2 z tan(theta -6 dB), mm (for an angle beam: the "
                + "plane perpendicular to incidence); null inside the near field, where the far-field cone does not "
                + "hold, or when no angle exists",
                types = {"number", "null"}, example = "6.1")
        Optional<Double> beamDiameter6dbMm,
        @Schema(description = "Near field left in the part behind the wedge or delay line, N - w v_w / v, mm (for "
                + "an angle beam: the plane perpendicular to incidence); negative: the part sees only far field",
                example = "15.6")
        Double nearFieldInPartMm,
        @Schema(description = "Refracted angle in the part by Snell's law, deg; null past the critical angle",
                types = {"number", "null"}, example = "45.3")
        Optional<Double> refractedAngleDeg,
        @Schema(description = "Angle beam, incidence plane (with element_diameter and incident_angle_deg): the "
                + "projected aperture the part sees, D cos(beta)/cos(alpha), mm; null past the critical angle. The "
                + "other near-field and beam fields then hold for the plane perpendicular to incidence (full D)",
                types = {"number", "null"}, example = "7.73")
        Optional<Double> incidencePlaneApertureMm,
        @Schema(description = "Angle beam, incidence plane: near field of the projected aperture D_eff^2/(4 lambda), "
                + "mm; null past the critical angle", types = {"number", "null"}, example = "12.6")
        Optional<Double> incidencePlaneNearFieldLengthMm,
        @Schema(description = "Angle beam, incidence plane (with wedge_path): near field left in the part, "
                + "D_eff^2/(4 lambda) - w (v_w/v) cos^2(beta)/cos^2(alpha), mm; negative: only far field in this "
                + "plane; null past the critical angle", types = {"number", "null"},
                example = "9.8")
        Optional<Double> incidencePlaneNearFieldInPartMm,
        @Schema(description = "Angle beam, incidence plane: pulse-echo (two-way) -6 dB beam-spread half-angle with "
                + "D_eff, deg; null when none exists", types = {"number", "null"}, example = "2.9")
        Optional<Double> incidencePlaneBeamSpread6dbDeg,
        @Schema(description = "Angle beam, incidence plane: pulse-echo (two-way) -20 dB beam-spread half-angle with "
                + "D_eff, deg; null when none exists", types = {"number", "null"}, example = "4.9")
        Optional<Double> incidencePlaneBeamSpread20dbDeg,
        @Schema(description = "Angle beam, incidence plane (with distance): -6 dB beam width 2 z tan(theta) with "
                + "D_eff's angle, mm; null inside this plane's near field or when no angle exists",
                types = {"number", "null"}, example = "5.1")
        Optional<Double> incidencePlaneBeamDiameter6dbMm,
        @Schema(description = "The normalised request, with every default that has an effect; itself a valid "
                + "request that reproduces this answer")
        PulseParametersRequest inputs,
        VelocitySourceView velocitySource,
        List<WarningView> warnings,
        List<ReferenceView> references,
        @Schema(description = "Inch mirrors of the length results: each x_mm result as x_in = x_mm / 25.4 (the "
                + "inch is 25.4 mm exactly), a speed x_mm_per_s as x_in_per_s; each present when its mm field is, "
                + "null when it is null; omitted when the answer has no length result")
        InInches inInches) {

    /** Inch mirrors of the length results, each the mm result / 25.4. */
    @Schema(name = "PulseParametersInInches", description = "Inch mirrors of the length "
            + "results (the inch is 25.4 mm exactly)")
    record InInches(
            @Schema(description = "spatial_pulse_length_mm / 25.4, in", format = "double")
            Double spatialPulseLengthIn,
            @Schema(description = "axial_resolution_mm / 25.4, in", format = "double")
            Double axialResolutionIn,
            @Schema(description = "near_field_length_mm / 25.4, in", format = "double")
            Double nearFieldLengthIn,
            @Schema(description = "near_field_length_exact_mm / 25.4, in; null when it is null", format = "double",
                    types = {"number", "null"})
            Optional<Double> nearFieldLengthExactIn,
            @Schema(description = "beam_diameter_6db_mm / 25.4, in; null when it is null", format = "double",
                    types = {"number", "null"})
            Optional<Double> beamDiameter6dbIn,
            @Schema(description = "near_field_in_part_mm / 25.4, in", format = "double")
            Double nearFieldInPartIn,
            @Schema(description = "incidence_plane_aperture_mm / 25.4, in; null when it is null", format = "double",
                    types = {"number", "null"})
            Optional<Double> incidencePlaneApertureIn,
            @Schema(description = "incidence_plane_near_field_length_mm / 25.4, in; null when it is null", format = "double",
                    types = {"number", "null"})
            Optional<Double> incidencePlaneNearFieldLengthIn,
            @Schema(description = "incidence_plane_near_field_in_part_mm / 25.4, in; null when it is null", format = "double",
                    types = {"number", "null"})
            Optional<Double> incidencePlaneNearFieldInPartIn,
            @Schema(description = "incidence_plane_beam_diameter_6db_mm / 25.4, in; null when it is null", format = "double",
                    types = {"number", "null"})
            Optional<Double> incidencePlaneBeamDiameter6dbIn) {

        /** The mirrors, or null (omitted) when the answer has no length result. */
        static InInches of(Double spatialPulseLengthIn, Double axialResolutionIn, Double nearFieldLengthIn,
                    Optional<Double> nearFieldLengthExactIn, Optional<Double> beamDiameter6dbIn,
                    Double nearFieldInPartIn, Optional<Double> incidencePlaneApertureIn,
                    Optional<Double> incidencePlaneNearFieldLengthIn,
                    Optional<Double> incidencePlaneNearFieldInPartIn,
                    Optional<Double> incidencePlaneBeamDiameter6dbIn) {
            return spatialPulseLengthIn == null && axialResolutionIn == null && nearFieldLengthIn == null &&
                    nearFieldLengthExactIn == null && beamDiameter6dbIn == null && nearFieldInPartIn == null &&
                    incidencePlaneApertureIn == null && incidencePlaneNearFieldLengthIn == null &&
                    incidencePlaneNearFieldInPartIn == null && incidencePlaneBeamDiameter6dbIn == null ? null
                    : new InInches(spatialPulseLengthIn, axialResolutionIn, nearFieldLengthIn,
                    nearFieldLengthExactIn, beamDiameter6dbIn, nearFieldInPartIn, incidencePlaneApertureIn,
                    incidencePlaneNearFieldLengthIn, incidencePlaneNearFieldInPartIn,
                    incidencePlaneBeamDiameter6dbIn);
        }
    }
}
