package utdigit.web.sheets;

import io.swagger.v3.oas.annotations.media.Schema;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import utdigit.core.dac.TcgMode;
import utdigit.core.sheets.SheetSetup;
import utdigit.web.problem.FieldErrors;
import utdigit.web.units.Mirrors;
import utdigit.web.units.VelocityFields;

/** The set-up section of a technique sheet: coverage, array, DAC/TCG, the TOFD gate and an angle beam's wedge. */
@Schema(name = "SheetSetup", description = "Scan coverage (with acquisition.scan_increment), the array's pitch and "
        + "steering, the DAC curve's span and its correction, the TOFD gate, and an angle beam's wedge (incident "
        + "angle and wedge velocity, for the incidence-plane figures). Each length once: _mm or _in; each speed once: "
        + "_m_per_s or _in_per_us.")
public record SheetSetupSection(
        @Schema(description = "Pulse-echo -6 dB beam width at the reflector's sound path, mm; else the round probe's "
                + "(probe.frequency_mhz, probe.element_diameter, the part's velocity) at sound_path", format = "double",
                example = "8")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000") Double beamWidth6dbMm,
        @Schema(description = "Pulse-echo -6 dB beam width, in", format = "double", example = "0.315")
        @DecimalMin(value = "0", inclusive = false) Double beamWidth6dbIn,
        @Schema(description = "Sound path to the reflector the coverage is judged at, mm", format = "double",
                example = "60")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000") Double soundPathMm,
        @Schema(description = "Sound path to the reflector, in", format = "double", example = "2.36")
        @DecimalMin(value = "0", inclusive = false) Double soundPathIn,
        @Schema(description = "Distance between scan lines (index offset), mm", format = "double", example = "4")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000") Double indexStepMm,
        @Schema(description = "Index step, in", format = "double", example = "0.16")
        @DecimalMin(value = "0", inclusive = false) Double indexStepIn,
        @Schema(description = "Angle between neighbouring beams of a sector scan, deg (above 0, below 90)",
                format = "double", example = "1")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax(value = "90", inclusive = false) Double angularStepDeg,
        @Schema(description = "Array element pitch, mm", format = "double", example = "0.6")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000") Double elementPitchMm,
        @Schema(description = "Array element pitch, in", format = "double", example = "0.024")
        @DecimalMin(value = "0", inclusive = false) Double elementPitchIn,
        @Schema(description = "Elements fired together (1 to 65536)", format = "int32", example = "16")
        @Min(1) @Max(65536) Integer activeElements,
        @Schema(description = "Largest steering angle used, from the array's normal in the medium where the beam is "
                + "steered, deg (0 to below 90)", format = "double", example = "10")
        @DecimalMin("0") @DecimalMax(value = "90", inclusive = false) Double maxSteeringAngleDeg,
        @Schema(description = "Velocity of the medium where the beam is steered, m/s (100 to 20000): the wedge's for "
                + "an array on a wedge; default the part's velocity (a contact array)", format = "double",
                example = "2330")
        @DecimalMin("100") @DecimalMax("20000") Double steeringVelocityMPerS,
        @Schema(description = "Span of the DAC curve from its highest point (at evaluation.reference_height_percent_fsh) "
                + "to its lowest, dB (above 0, at most 60)", format = "double", example = "24")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax("60") Double dacSpanDb,
        @Schema(description = "How the DAC span is corrected: NONE, ANALOG (TCG before the converter) or DIGITAL (TCG "
                + "on digitized data); default NONE")
        TcgMode tcg,
        @Schema(description = "TOFD gate opening time in the part, us (0 to 100000)", format = "double", example = "10")
        @DecimalMin("0") @DecimalMax("100000") Double gateStartUs,
        @Schema(description = "TOFD gate closing time in the part, us (0 to 100000)", format = "double", example = "16.5")
        @DecimalMin("0") @DecimalMax("100000") Double gateEndUs,
        @Schema(description = "Velocity of the medium where the beam is steered, in/us (equivalent of 100 to 20000 "
                + "m/s); the inch form of steering_velocity_m_per_s", format = "double", example = "0.0917")
        @DecimalMin(value = "0", inclusive = false) Double steeringVelocityInPerUs,
        @Schema(description = "Angle beam: incident angle in the wedge, deg (0 to below 90); with "
                + "wedge_velocity, probe.frequency_mhz, probe.element_diameter and the part's velocity it gives the "
                + "incidence-plane figures (incidence_plane_aperture_mm, incidence_plane_near_field_length_mm, "
                + "incidence_plane_beam_spread_6db_deg)", format = "double", example = "36",
                minimum = "0", exclusiveMaximumValue = 90)
        @DecimalMin("0") @DecimalMax(value = "90", inclusive = false) Double incidentAngleDeg,
        @Schema(description = "Angle beam: longitudinal velocity of the wedge, m/s (100 to 20000); wedge grades vary "
                + "by maker and temperature: give the measured value", format = "double", example = "2730",
                minimum = "100", maximum = "20000")
        @DecimalMin("100") @DecimalMax("20000") Double wedgeVelocityMPerS,
        @Schema(description = "Angle beam: longitudinal velocity of the wedge, in/us (equivalent of 100 to 20000 m/s)",
                format = "double", example = "0.1075")
        @DecimalMin(value = "0", inclusive = false) Double wedgeVelocityInPerUs) {

    /** The core's section with lengths in mm; field errors go to {@code errors} (section "setup"). */
    SheetSetup toCore(FieldErrors errors) {
        Double widthMm = Mirrors.lengthMm(errors, "beam_width_6db", beamWidth6dbMm, beamWidth6dbIn, false);
        Double pathMm = Mirrors.lengthMm(errors, "sound_path", soundPathMm, soundPathIn, false);
        Double indexMm = Mirrors.lengthMm(errors, "index_step", indexStepMm, indexStepIn, false);
        Double pitchMm = Mirrors.lengthMm(errors, "element_pitch", elementPitchMm, elementPitchIn, false);
        if (gateStartUs != null && gateEndUs != null && !(gateEndUs > gateStartUs)) {
            errors.add("gate_end_us", "must be after gate_start_us");
        }
        if ((gateStartUs == null) != (gateEndUs == null)) {
            errors.add(gateStartUs == null ? "gate_start_us" : "gate_end_us",
                    "give the gate whole: gate_start_us and gate_end_us together");
        }
        Double steeringMPerS = Mirrors.speedMPerS(errors, "steering_velocity", steeringVelocityMPerS,
                steeringVelocityInPerUs, VelocityFields.MIN_M_PER_S, VelocityFields.MAX_M_PER_S);
        Double wedgeMPerS = Mirrors.speedMPerS(errors, "wedge_velocity", wedgeVelocityMPerS, wedgeVelocityInPerUs,
                VelocityFields.MIN_M_PER_S, VelocityFields.MAX_M_PER_S);
        return new SheetSetup(widthMm, pathMm, indexMm, angularStepDeg, pitchMm, activeElements, maxSteeringAngleDeg,
                steeringMPerS, dacSpanDb, tcg, gateStartUs, gateEndUs, incidentAngleDeg, wedgeMPerS);
    }

    /** The normalised section for an answer's inputs (lengths in mm). */
    static SheetSetupSection normalised(SheetSetup s) {
        return new SheetSetupSection(s.beamWidth6dbMm(), null, s.soundPathMm(), null, s.indexStepMm(), null,
                s.angularStepDeg(), s.elementPitchMm(), null, s.activeElements(), s.maxSteeringAngleDeg(),
                s.steeringVelocityMPerS(), s.dacSpanDb(),
                s.tcg(), s.gateStartUs(), s.gateEndUs(), null, s.incidentAngleDeg(), s.wedgeVelocityMPerS(), null);
    }
}
