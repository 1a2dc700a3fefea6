package utdigit.web.acquisition;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.springframework.stereotype.Component;
import utdigit.core.acquisition.AcquisitionCalculator;
import utdigit.core.acquisition.AcquisitionInput;
import utdigit.core.acquisition.AcquisitionResult;
import utdigit.core.common.CalculationException;
import utdigit.core.materials.VelocitySource;
import utdigit.web.pipeline.ToleranceCheck;
import utdigit.web.pipeline.Calculation;
import utdigit.web.problem.FieldError;
import utdigit.web.problem.FieldErrors;
import utdigit.web.problem.InputProblem;
import utdigit.web.json.JsonPointers;
import utdigit.web.units.Mirrors;
import utdigit.web.problem.ProblemType;
import utdigit.web.pipeline.ResultNotes;
import utdigit.web.units.VelocitySourceView;

/**
 * Request to core input, core result to answer, for acquisition budgets. The two forms of the gate
 * (a time, or a sound path with a velocity), the two forms of the round trip and the inch mirrors
 * are resolved here, so that the core sees one normalised input; a failure the core reports on a
 * millimetre input the caller gave in inches is pointed at the inch input.
 */
@Component
class AcquisitionBudgetCalculation implements Calculation<AcquisitionBudgetRequest, AcquisitionBudgetResponse> {
    static final String NAME = "acquisition-budgets";

    @Override
    public String name() {
        return NAME;
    }

    @Override
    public Class<AcquisitionBudgetRequest> requestType() {
        return AcquisitionBudgetRequest.class;
    }

    @Override
    public Class<AcquisitionBudgetResponse> answerType() {
        return AcquisitionBudgetResponse.class;
    }

    /** A core input named in mm points at the inch form when the caller gave that; a velocity at its source. */
    @Override
    public String pointer(String coreField, AcquisitionBudgetRequest q) {
        if ("velocity_m_per_s".equals(coreField)) {
            return Mirrors.velocityPointer(q);
        }
        return JsonPointers.property(inchInputs(q).getOrDefault(coreField, coreField));
    }

    @Override
    public AcquisitionBudgetResponse answer(AcquisitionBudgetRequest q) {
        FieldErrors errors = FieldErrors.create();

        Double gateMm = Mirrors.lengthMm(errors, "gate_length", q.gateLengthMm(), q.gateLengthIn(), false);
        List<String> gateLengthForms = given("gate_length_mm", q.gateLengthMm(), "gate_length_in", q.gateLengthIn());
        if (q.gateLengthUs() != null && !gateLengthForms.isEmpty()) {
            bothForms(errors, "the gate", "gate_length_us", "gate_length", gateLengthForms);
        } else if (q.gateLengthUs() == null && gateLengthForms.isEmpty()) {
            errors.add("gate_length_us", "the gate is required: give gate_length_us, or gate_length_mm or "
                    + "gate_length_in (a sound path in the part) with a velocity");
        }

        Double soundPathMm = Mirrors.lengthMm(errors, "max_sound_path", q.maxSoundPathMm(), q.maxSoundPathIn(), false);
        List<String> soundPathForms =
                given("max_sound_path_mm", q.maxSoundPathMm(), "max_sound_path_in", q.maxSoundPathIn());
        if (q.maxRoundTripUs() != null && !soundPathForms.isEmpty()) {
            bothForms(errors, "the round trip", "max_round_trip_us", "max_sound_path", soundPathForms);
        }

        Double scanIncrementMm =
                Mirrors.lengthMm(errors, "scan_increment", q.scanIncrementMm(), q.scanIncrementIn(), true);
        Double scanLengthMm = Mirrors.lengthMm(errors, "scan_length", q.scanLengthMm(), q.scanLengthIn(), false);
        Double plannedMmPerS = Mirrors.speedMmPerS(errors, "planned_scan_speed", q.plannedScanSpeedMmPerS(),
                q.plannedScanSpeedInPerS());

        boolean velocityNeeded = !gateLengthForms.isEmpty() || !soundPathForms.isEmpty();
        List<String> velocityGiven = given("velocity_m_per_s", q.velocityMPerS(), "velocity_in_per_us",
                q.velocityInPerUs(), "material", q.material(), "wave_mode", q.waveMode(),
                "temperature_c", q.temperatureC());
        VelocitySource velocity = velocityNeeded ? errors.orLater(() -> Mirrors.velocity(errors, q, true)) : null;
        errors.throwIfAny();
        if (!velocityNeeded && !velocityGiven.isEmpty()) {
            String detail = "a velocity applies only with a gate or a max_sound_path given as a length "
                    + "(gate_length_mm/_in, max_sound_path_mm/_in); gate_length_us and max_round_trip_us are "
                    + "already times";
            throw new InputProblem(ProblemType.INAPPLICABLE_INPUT, detail,
                    velocityGiven.stream().map(f -> FieldError.at(f, detail)).toList());
        }

        Double velocityMPerS = velocity == null ? null : velocity.velocityMPerS();
        AcquisitionInput input = AcquisitionInput.builder(q.samplingFrequencyMhz(), q.bitDepth(), scanIncrementMm,
                        q.pulseRepetitionFrequencyHz())
                .decimationFactor(q.decimationFactor())
                .gateLengthUs(q.gateLengthUs())
                .gateLengthMm(gateMm)
                .velocityMPerS(velocityMPerS)
                .focalLaws(q.focalLaws())
                .fmcElementCount(q.fmcElementCount())
                .capture(q.capture())
                .averaging(q.averaging())
                .scanLengthMm(scanLengthMm)
                .plannedScanSpeedMmPerS(plannedMmPerS)
                .maxRoundTripUs(q.maxRoundTripUs())
                .maxSoundPathMm(soundPathMm)
                .wraparoundDecayFactor(q.wraparoundDecayFactor())
                .fileSizeLimitMegabytes(q.fileSizeLimitMegabytes())
                .build();
        AcquisitionResult r;
        try {
            r = AcquisitionCalculator.compute(input);
        } catch (CalculationException e) {
            throw inCallerTerms(e, inchInputs(q));
        }

        AcquisitionBudgetRequest inputs = new AcquisitionBudgetRequest(q.samplingFrequencyMhz(),
                r.options().decimationFactor(), q.bitDepth(), q.gateLengthUs(), gateMm, null, velocityMPerS, null,
                null, null, null, r.options().focalLaws(), q.fmcElementCount(), r.options().capture(),
                r.options().averaging(), scanIncrementMm, null, scanLengthMm, null, q.pulseRepetitionFrequencyHz(),
                plannedMmPerS, null, q.maxRoundTripUs(), soundPathMm, null,
                r.options().wraparoundDecayFactor(), q.fileSizeLimitMegabytes());
        return new AcquisitionBudgetResponse(r.samplesPerAScan(), r.bytesPerSample(), r.bytesPerAScan(),
                r.firingsPerPosition(), r.aScansPerPosition(), r.bytesPerPosition(), r.megabytesPerMetre(),
                r.fileSizeMegabytes(), r.maxScanSpeedMmPerS(), r.dataRateMegabytesPerS(),
                r.maxPrfWithoutWraparoundHz(), r.maxScanLengthPerFileMm(), r.effectiveSamplingFrequencyMhz(),
                r.gateLengthUsedUs(), r.pulseRepetitionPeriodUs(), r.dataRateScanSpeedMmPerS(),
                r.maxRoundTripUsedUs(), ToleranceCheck.builder()
                        .atMost("planned_scan_speed_mm_per_s", plannedMmPerS, "max_scan_speed_mm_per_s",
                                r.maxScanSpeedMmPerS())
                        .atMost("pulse_repetition_frequency_hz", q.pulseRepetitionFrequencyHz(),
                                "max_prf_without_wraparound_hz", r.maxPrfWithoutWraparoundHz())
                        .atMost("file_size_megabytes", r.fileSizeMegabytes(), "file_size_limit_megabytes",
                                q.fileSizeLimitMegabytes())
                        .build(),
                inputs, VelocitySourceView.of(velocity),
                ResultNotes.warnings(r.warnings()), ResultNotes.references(r.references()),
                AcquisitionBudgetResponse.InInches.of(Mirrors.inches(r.maxScanLengthPerFileMm()),
                        Mirrors.inches(r.maxScanSpeedMmPerS()),
                        Mirrors.inches(r.dataRateScanSpeedMmPerS())));
    }

    /** The names of the inputs given (non-null), from name-value pairs. */
    private static List<String> given(Object... namesAndValues) {
        List<String> names = new ArrayList<>();
        for (int i = 0; i < namesAndValues.length; i += 2) {
            if (namesAndValues[i + 1] != null) {
                names.add((String) namesAndValues[i]);
            }
        }
        return names;
    }

    /** A quantity given both as a time and as a length: one error on each form given. */
    private static void bothForms(FieldErrors errors, String what, String timeField, String lengthBase,
                                  List<String> lengthForms) {
        String detail = "give " + what + " once: " + timeField + " (a time) or " + lengthBase
                + "_mm / " + lengthBase + "_in (a sound path in the part), not both";
        errors.add(timeField, detail);
        for (String form : lengthForms) {
            errors.add(form, detail);
        }
    }

    /** The core's millimetre input names for the inputs this request gave in inches, with the inch names. */
    private static Map<String, String> inchInputs(AcquisitionBudgetRequest q) {
        Map<String, String> renames = new LinkedHashMap<>();
        if (q.gateLengthIn() != null) {
            renames.put("gate_length_mm", "gate_length_in");
        }
        if (q.scanIncrementIn() != null) {
            renames.put("scan_increment_mm", "scan_increment_in");
        }
        if (q.scanLengthIn() != null) {
            renames.put("scan_length_mm", "scan_length_in");
        }
        if (q.maxSoundPathIn() != null) {
            renames.put("max_sound_path_mm", "max_sound_path_in");
        }
        if (q.plannedScanSpeedInPerS() != null) {
            renames.put("planned_scan_speed_mm_per_s", "planned_scan_speed_in_per_s");
        }
        return renames;
    }

    /**
     * The core's failure with the message naming the inputs as the caller gave them (gate_length_in
     * for a gate the core saw in mm); the pointers follow from {@link #pointer}. Unchanged when no
     * input was given in inches, and for INVALID_INPUT, which Bean Validation and the mirrors' range
     * checks leave unreachable.
     */
    static CalculationException inCallerTerms(CalculationException e, Map<String, String> renames) {
        if (e.fields().stream().noneMatch(renames::containsKey)) {
            return e;
        }
        String message = e.getMessage();
        for (Map.Entry<String, String> rename : renames.entrySet()) {
            message = Pattern.compile("\\b" + Pattern.quote(rename.getKey()) + "\\b").matcher(message)
                    .replaceAll(Matcher.quoteReplacement(rename.getValue()));
        }
        return switch (e.error()) {
            case IMPOSSIBLE_COMBINATION -> CalculationException.impossible(message, e.fields().toArray(String[]::new));
            case NOT_APPLICABLE -> CalculationException.notApplicable(e.fields().get(0), message);
            case INVALID_INPUT -> e;
        };
    }
}
