package utdigit.web.sheets;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.springframework.stereotype.Component;
import utdigit.core.common.CalculationException;
import utdigit.core.materials.VelocitySource;
import utdigit.core.rules.Finding;
import utdigit.core.rules.RequirementProfile;
import utdigit.core.sheets.Feasibility;
import utdigit.core.sheets.SheetEvaluator;
import utdigit.core.sheets.SheetMetrics;
import utdigit.core.sheets.SheetInput;
import utdigit.core.sheets.SheetSetup;
import utdigit.core.sheets.SheetResult;
import utdigit.web.pipeline.Calculation;
import utdigit.web.json.ContractNaming;
import utdigit.web.problem.FieldError;
import utdigit.web.problem.FieldErrors;
import utdigit.web.problem.InputProblem;
import utdigit.web.units.Mirrors;
import utdigit.web.pipeline.ResultNotes;
import utdigit.web.units.VelocitySourceView;
import utdigit.web.rules.ProfileCatalog;

/**
 * A technique sheet to its verdict: the sections' mirrors resolved, the profile looked up, every
 * metric computed by the core calculators through {@link SheetEvaluator}, the rules checked.
 */
@Component
class TechniqueSheetValidationCalculation implements Calculation<TechniqueSheetRequest, TechniqueSheetValidationResponse> {
    static final String NAME = "technique-sheet-validations";
    static final String DEFAULT_PROFILE = "common-practice";

    /** Where each input the core calculators name lives in a sheet. */
    private static final Map<String, String> SHEET_POINTERS = Map.ofEntries(
            Map.entry("frequency_mhz", "/probe/frequency_mhz"),
            Map.entry("bandwidth_percent", "/probe/bandwidth_percent"),
            Map.entry("element_diameter_mm", "/probe/element_diameter_mm"),
            Map.entry("velocity_m_per_s", "/material/velocity_m_per_s"),
            Map.entry("velocity", "/material/velocity_m_per_s"),
            Map.entry("wave_mode", "/material/wave_mode"),
            Map.entry("material", "/material/material"),
            Map.entry("velocity_uncertainty_m_per_s", "/material/velocity_uncertainty_m_per_s"),
            Map.entry("velocity_uncertainty_percent", "/material/velocity_uncertainty_percent"),
            Map.entry("thickness", "/material/thickness_mm"),
            Map.entry("nominal_thickness", "/material/thickness_mm"),
            Map.entry("refracted_angle_deg", "/material/refracted_angle_deg"),
            Map.entry("required_resolution", "/evaluation/thickness_tolerance_mm"),
            Map.entry("probe_centre_separation", "/tofd/probe_centre_separation_mm"),
            Map.entry("depth", "/tofd/depth_of_interest_mm"),
            Map.entry("tfm_grid_spacing_mm", "/tfm/grid_spacing_mm"),
            Map.entry("tfm_lateral_grid_spacing_mm", "/tfm/lateral_grid_spacing_mm"),
            Map.entry("tfm_aperture_mm", "/tfm/aperture_mm"),
            Map.entry("tfm_depth_mm", "/tfm/depth_mm"),
            Map.entry("tfm_image", "/tfm/image"),
            Map.entry("reference_height_percent_fsh", "/evaluation/reference_height_percent_fsh"),
            Map.entry("evaluation_level_db", "/evaluation/evaluation_level_db"),
            Map.entry("amplitude_tolerance_db", "/evaluation/amplitude_tolerance_db"),
            Map.entry("incident_angle_deg", "/setup/incident_angle_deg"),
            Map.entry("wedge_velocity_m_per_s", "/setup/wedge_velocity_m_per_s"));

    /** The m/s form's upper bound of a velocity's standard uncertainty (its Bean Validation range). */
    private static final double MAX_VELOCITY_UNCERTAINTY_M_PER_S = 4000.0;

    private static final java.util.Set<String> DIGITIZATION = java.util.Set.of("sampling_frequency_mhz",
            "decimation_factor", "bit_depth", "digitized_signal", "quantizer", "code_mapping", "decimation_mode",
            "signal", "peak_reading");

    private final ProfileCatalog profiles;

    TechniqueSheetValidationCalculation(ProfileCatalog profiles) {
        this.profiles = profiles;
    }

    @Override
    public String name() {
        return NAME;
    }

    @Override
    public Class<TechniqueSheetRequest> requestType() {
        return TechniqueSheetRequest.class;
    }

    @Override
    public Class<TechniqueSheetValidationResponse> answerType() {
        return TechniqueSheetValidationResponse.class;
    }

    @Override
    public String pointer(String coreField, TechniqueSheetRequest q) {
        return inCallerForm(sheetPointer(coreField, q), q);
    }

    /**
     * The pointer of a length or speed the caller gave in inches names the inch field
     * (/material/thickness_in, /setup/wedge_velocity_in_per_us).
     */
    private static String inCallerForm(String pointer, TechniqueSheetRequest q) {
        String[] parts = pointer.split("/");
        if (parts.length != 3 || !(parts[2].endsWith("_mm") || parts[2].endsWith("_m_per_s"))) {
            return pointer;
        }
        String inchName = parts[2].endsWith("_mm")
                ? parts[2].substring(0, parts[2].length() - "_mm".length()) + "_in"
                : parts[2].substring(0, parts[2].length() - "_m_per_s".length()) + "_in_per_us";
        Object section = component(q, parts[1]);
        return section != null && component(section, inchName) != null ? "/" + parts[1] + "/" + inchName : pointer;
    }

    private static Object component(Object record, String jsonName) {
        for (java.lang.reflect.RecordComponent c : record.getClass().getRecordComponents()) {
            if (ContractNaming.snake(c.getName()).equals(jsonName)) {
                try {
                    return c.getAccessor().invoke(record);
                } catch (ReflectiveOperationException e) {
                    return null;
                }
            }
        }
        return null;
    }

    private String sheetPointer(String coreField, TechniqueSheetRequest q) {
        String p = SHEET_POINTERS.get(coreField);
        if (p != null) {
            return p;
        }
        if (DIGITIZATION.contains(coreField)) {
            return "/digitization/" + coreField;
        }
        if (coreField.startsWith("gate_length") ) {
            return "/acquisition/" + (q.acquisition() != null && q.acquisition().gateLengthUs() != null
                    ? "gate_length_us" : "gate_length_mm");
        }
        return "/acquisition/" + coreField;
    }

    @Override
    public TechniqueSheetValidationResponse answer(TechniqueSheetRequest q) {
        List<RequirementProfile> chosen = profiles(q);
        List<String> profileIds = chosen.stream().map(RequirementProfile::id).toList();

        FieldErrors errors = FieldErrors.create();
        TechniqueSheetRequest.Probe p = q.probe() == null ? new TechniqueSheetRequest.Probe(null, null, null, null, null)
                : q.probe();
        TechniqueSheetRequest.Material m = q.material() == null ? new TechniqueSheetRequest.Material(null, null, null,
                null, null, null, null, null, null, null, null) : q.material();
        TechniqueSheetRequest.Acquisition a = q.acquisition() == null ? new TechniqueSheetRequest.Acquisition(null, null,
                null, null, null, null, null, null, null, null, null, null, null, null, null, null, null, null)
                : q.acquisition();
        TechniqueSheetRequest.Tfm tfm = q.tfm() == null ? null : q.tfm();
        TechniqueSheetRequest.Evaluation e = q.evaluation();
        TechniqueSheetRequest.Tofd t = q.tofd() == null ? new TechniqueSheetRequest.Tofd(null, null, null, null) : q.tofd();

        FieldErrors probeErrors = errors.section("probe");
        Double diameterMm = Mirrors.lengthMm(probeErrors, "element_diameter", p.elementDiameterMm(), p.elementDiameterIn(), false);
        FieldErrors materialErrors = errors.section("material");
        List<Finding> inputFailures = new ArrayList<>();
        VelocitySource velocity;
        try {
            velocity = Mirrors.velocity(materialErrors, m, false);
        } catch (CalculationException failure) {
            if (!Feasibility.isFeasibilityFailure(failure)) {
                throw failure;
            }
            inputFailures.add(Feasibility.failure("material", failure));
            velocity = null;
        }
        Double thicknessMm = Mirrors.lengthMm(materialErrors, "thickness", m.thicknessMm(), m.thicknessIn(), false);
        Double givenUncertaintyMPerS = Mirrors.speedMPerS(materialErrors, "velocity_uncertainty",
                m.velocityUncertaintyMPerS(), m.velocityUncertaintyInPerUs(), 0.0, MAX_VELOCITY_UNCERTAINTY_M_PER_S);
        if (givenUncertaintyMPerS != null && m.velocityUncertaintyPercent() != null) {
            String detail = "give the velocity uncertainty once: velocity_uncertainty_m_per_s (or _in_per_us) or "
                    + "velocity_uncertainty_percent";
            materialErrors.add(m.velocityUncertaintyInPerUs() != null ? "velocity_uncertainty_in_per_us"
                    : "velocity_uncertainty_m_per_s", detail).add("velocity_uncertainty_percent", detail);
        }
        FieldErrors acqErrors = errors.section("acquisition");
        Double incrementMm = Mirrors.lengthMm(acqErrors, "scan_increment", a.scanIncrementMm(), a.scanIncrementIn(), false);
        Double lengthMm = Mirrors.lengthMm(acqErrors, "scan_length", a.scanLengthMm(), a.scanLengthIn(), false);
        Double gateMm = Mirrors.lengthMm(acqErrors, "gate_length", a.gateLengthMm(), a.gateLengthIn(), false);
        if (a.gateLengthUs() != null && gateMm != null) {
            String detail = "give the gate once: gate_length_us or gate_length_mm/_in";
            acqErrors.add("gate_length_us", detail).add(a.gateLengthMm() != null ? "gate_length_mm" : "gate_length_in", detail);
        }
        Double soundPathMm = Mirrors.lengthMm(acqErrors, "max_sound_path", a.maxSoundPathMm(), a.maxSoundPathIn(), false);
        Double plannedMmPerS = Mirrors.speedMmPerS(acqErrors, "planned_scan_speed", a.plannedScanSpeedMmPerS(),
                a.plannedScanSpeedInPerS());
        FieldErrors tfmErrors = errors.section("tfm");
        Double gridMm = tfm == null ? null
                : Mirrors.lengthMm(tfmErrors, "grid_spacing", tfm.gridSpacingMm(), tfm.gridSpacingIn(), false);
        Double lateralMm = tfm == null ? null : Mirrors.lengthMm(tfmErrors, "lateral_grid_spacing",
                tfm.lateralGridSpacingMm(), tfm.lateralGridSpacingIn(), false);
        Double apertureMm = tfm == null ? null
                : Mirrors.lengthMm(tfmErrors, "aperture", tfm.apertureMm(), tfm.apertureIn(), false);
        Double tfmDepthMm = tfm == null ? null
                : Mirrors.lengthMm(tfmErrors, "depth", tfm.depthMm(), tfm.depthIn(), false);
        Double toleranceMm = e == null ? null : Mirrors.lengthMm(errors.section("evaluation"), "thickness_tolerance",
                e.thicknessToleranceMm(), e.thicknessToleranceIn(), false);
        FieldErrors tofdErrors = errors.section("tofd");
        Double pcsMm = Mirrors.lengthMm(tofdErrors, "probe_centre_separation", t.probeCentreSeparationMm(),
                t.probeCentreSeparationIn(), false);
        Double depthMm = Mirrors.lengthMm(tofdErrors, "depth_of_interest", t.depthOfInterestMm(), t.depthOfInterestIn(), false);
        if (velocity == null && inputFailures.isEmpty() && (gateMm != null || soundPathMm != null)) {
            materialErrors.add("velocity_m_per_s", "a gate or sound path in mm needs the part's velocity: give "
                    + "velocity_m_per_s, velocity_in_per_us or material");
        }
        SheetSetup setup = q.setup() == null ? null : q.setup().toCore(errors.section("setup"));
        errors.throwIfAny();

        Double c = velocity == null ? null : velocity.velocityMPerS();
        // No velocity uncertainty given and a material that states one: its standard uncertainty is used.
        boolean materialUncertainty = velocity != null && givenUncertaintyMPerS == null
                && m.velocityUncertaintyPercent() == null && velocity.standardUncertaintyMPerS() != null;
        Double velocityUncertaintyMPerS = materialUncertainty
                ? velocity.standardUncertaintyMPerS() : givenUncertaintyMPerS;
        TechniqueSheetRequest.Digitization d = q.digitization();
        SheetInput sheet = new SheetInput(q.sheetId(), q.revision(), q.technique(),
                new SheetInput.Probe(p.frequencyMhz(), p.bandwidthPercent(), diameterMm, p.elementCount()),
                new SheetInput.Part(c, velocityUncertaintyMPerS, m.velocityUncertaintyPercent(), thicknessMm,
                        m.refractedAngleDeg()),
                d == null ? null : new SheetInput.Digitization(d.samplingFrequencyMhz(), d.decimationFactor(),
                        d.bitDepth(), d.digitizedSignal(), d.quantizer(), d.codeMapping(), d.decimationMode(), d.signal()),
                new SheetInput.Acquisition(a.pulseRepetitionFrequencyHz(), a.focalLaws(), a.fmcElementCount(),
                        a.capture(), a.averaging(), incrementMm, lengthMm, plannedMmPerS, a.gateLengthUs(),
                        gateMm, soundPathMm, a.maxRoundTripUs(), a.wraparoundDecayFactor()),
                new SheetInput.Tofd(pcsMm, depthMm),
                tfm == null ? null : new SheetInput.Tfm(gridMm, lateralMm, apertureMm, tfmDepthMm, tfm.image()),
                e == null ? null : new SheetInput.Evaluation(e.referenceHeightPercentFsh(), e.evaluationLevelDb(),
                        e.amplitudeToleranceDb(), toleranceMm),
                setup);

        SheetResult r = SheetEvaluator.evaluate(sheet, chosen, inputFailures);

        TechniqueSheetRequest inputs = new TechniqueSheetRequest(q.sheetId(), q.revision(), q.technique(), null,
                profileIds,
                q.probe() == null ? null : new TechniqueSheetRequest.Probe(p.frequencyMhz(), p.bandwidthPercent(),
                        diameterMm, null, p.elementCount()),
                q.material() == null ? null : inputFailures.isEmpty() ? new TechniqueSheetRequest.Material(null, null,
                        null, c, null,
                        velocityUncertaintyMPerS, m.velocityUncertaintyPercent(), thicknessMm, null,
                        m.refractedAngleDeg(), null)
                        : new TechniqueSheetRequest.Material(m.material(), m.waveMode(), m.temperatureC(), null, null,
                        givenUncertaintyMPerS, m.velocityUncertaintyPercent(), thicknessMm, null,
                        m.refractedAngleDeg(), null),
                d,
                q.acquisition() == null ? null : new TechniqueSheetRequest.Acquisition(a.pulseRepetitionFrequencyHz(),
                        a.focalLaws(), a.fmcElementCount(), a.capture(), a.averaging(), incrementMm, null, lengthMm,
                        null, plannedMmPerS, null, a.gateLengthUs(), gateMm, null, soundPathMm, null,
                        a.maxRoundTripUs(), a.wraparoundDecayFactor()),
                q.tofd() == null ? null : new TechniqueSheetRequest.Tofd(pcsMm, null, depthMm, null),
                tfm == null ? null : new TechniqueSheetRequest.Tfm(gridMm, null, lateralMm, null, apertureMm, null,
                        tfmDepthMm, null, tfm.image()),
                e == null ? null : new TechniqueSheetRequest.Evaluation(e.referenceHeightPercentFsh(),
                        e.evaluationLevelDb(), e.amplitudeToleranceDb(), toleranceMm, null),
                setup == null ? null : SheetSetupSection.normalised(setup));

        return new TechniqueSheetValidationResponse(q.sheetId(), q.revision(),
                r.profiles().stream().map(pv -> new TechniqueSheetValidationResponse.ProfileRef(pv.profile().id(),
                        pv.profile().version(), pv.profile().sha256(), pv.profile().verificationStatus(),
                        pv.verdict())).toList(),
                r.verdict(), r.findings().stream().map(f -> view(f, q)).toList(),
                presented(r.values()), r.cautions(), inputs,
                materialUncertainty ? VelocitySourceView.usingMaterialUncertainty(velocity) : VelocitySourceView.of(velocity),
                ResultNotes.warnings(r.warnings()), ResultNotes.references(r.references()));
    }

    /** The values as answered: counts as integers (exact in a double below 2^53), the rest as they are. */
    private static Map<String, Number> presented(Map<String, Double> values) {
        Map<String, Number> out = new java.util.LinkedHashMap<>();
        values.forEach((metric, value) -> out.put(metric, SheetMetrics.COUNTS.contains(metric)
                && value == Math.rint(value) && Math.abs(value) < 0x1p53 ? (Number) value.longValue() : value));
        return out;
    }

    /** The profiles asked for: profile_id or profile_ids (not both), default common-practice; each known once. */
    private List<RequirementProfile> profiles(TechniqueSheetRequest q) {
        if (q.profileId() != null && q.profileIds() != null) {
            String detail = "give the profiles once: profile_id (one) or profile_ids (one or more)";
            throw InputProblem.invalid(List.of(new FieldError("/profile_id", detail),
                    new FieldError("/profile_ids", detail)));
        }
        if (q.profileIds() == null) {
            String id = q.profileId() == null ? DEFAULT_PROFILE : q.profileId();
            return List.of(profiles.find(id).orElseThrow(() -> InputProblem.invalid("/profile_id",
                    "unknown requirement profile '" + id + "'; see GET /api/requirement-profiles")));
        }
        List<FieldError> errors = new ArrayList<>();
        List<RequirementProfile> out = new ArrayList<>();
        for (int i = 0; i < q.profileIds().size(); i++) {
            String id = q.profileIds().get(i);
            String pointer = "/profile_ids/" + i;
            if (q.profileIds().subList(0, i).contains(id)) {
                errors.add(new FieldError(pointer, "profile '" + id + "' is named twice"));
                continue;
            }
            profiles.find(id).ifPresentOrElse(out::add, () -> errors.add(new FieldError(pointer,
                    "unknown requirement profile '" + id + "'; see GET /api/requirement-profiles")));
        }
        if (!errors.isEmpty()) {
            throw InputProblem.invalid(errors);
        }
        return out;
    }

    private TechniqueSheetValidationResponse.FindingView view(Finding f, TechniqueSheetRequest q) {
        return new TechniqueSheetValidationResponse.FindingView(f.profileId(), f.ruleId(), f.title(), f.metric(),
                f.actual(), f.limit(), f.limitMetric(), f.comparison(), f.verdict(),
                f.missing().isEmpty() ? null : f.missing(),
                f.missingInputs().isEmpty() ? null : f.missingInputs(),
                Mirrors.withInches(f.reason()),
                f.settings().isEmpty() ? null : f.settings().stream().map(name -> pointer(name, q)).distinct()
                        .toList());
    }
}
