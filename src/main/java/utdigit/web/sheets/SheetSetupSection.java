package utdigit.web.sheets;

import io.swagger.v3.oas.annotations.media.Schema;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import utdigit.core.dac.TcgMode;
import utdigit.core.sheets.SheetSetup;
import utdigit.web.problem.FieldErrors;
import utdigit.web.units.Lengths;
import utdigit.web.units.Mirrors;
import utdigit.web.units.VelocityFields;

/** The set-up section of a technique sheet: coverage, array, DAC/TCG, the TOFD gate and an angle beam's wedge. */
@Schema(name = "SheetSetup", description = "Scan coverage (with acquisition.scan_increment), the array's pitch and "
        + "steering, the DAC curve's span and its correction, the TOFD gate, and an angle beam's wedge (incident "
        + "angle and wedge velocity, for the incidence-plane figures). Each length once: _mm or _in; each speed once: "
        + "_m_per_s or _in_per_us.")
public record SheetSetupSection(
        @Lengths.Mm Double beamWidth6dbMm,
        @Lengths.In Double beamWidth6dbIn,
        @Lengths.Mm Double soundPathMm,
        @Lengths.In Double soundPathIn,
        @Lengths.Mm Double indexStepMm,
        @Lengths.In Double indexStepIn,
        @DecimalMin(value = "0", inclusive = false) @DecimalMax(value = "90", inclusive = false) Double angularStepDeg,
        @Lengths.Mm Double elementPitchMm,
        @Lengths.In Double elementPitchIn,
        @Min(1) @Max(65536) Integer activeElements,
        @DecimalMin("0") @DecimalMax(value = "90", inclusive = false) Double maxSteeringAngleDeg,
        @DecimalMin("100") @DecimalMax("20000") Double steeringVelocityMPerS,
        @DecimalMin(value = "0", inclusive = false) @DecimalMax("60") Double dacSpanDb,
        TcgMode tcg,
        @DecimalMin("0") @DecimalMax("100000") Double gateStartUs,
        @DecimalMin("0") @DecimalMax("100000") Double gateEndUs,
        @DecimalMin(value = "0", inclusive = false) Double steeringVelocityInPerUs,
        @DecimalMin("0") @DecimalMax(value = "90", inclusive = false) Double incidentAngleDeg,
        @DecimalMin("100") @DecimalMax("20000") Double wedgeVelocityMPerS,
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
