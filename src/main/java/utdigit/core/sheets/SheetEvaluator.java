package utdigit.core.sheets;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import utdigit.core.acquisition.AcquisitionCalculator;
import utdigit.core.acquisition.AcquisitionInput;
import utdigit.core.acquisition.AcquisitionResult;
import utdigit.core.acquisition.CaptureMode;
import utdigit.core.common.CalculationException;
import utdigit.core.common.Reference;
import utdigit.core.common.ReportingFloors;
import utdigit.core.common.Sources;
import utdigit.core.common.Warning;
import utdigit.core.pulse.PulseCalculator;
import utdigit.core.pulse.PulseInput;
import utdigit.core.pulse.PulseResult;
import utdigit.core.quantization.QuantizationCalculator;
import utdigit.core.quantization.QuantizationInput;
import utdigit.core.quantization.QuantizationResult;
import utdigit.core.rules.Finding;
import utdigit.core.rules.RequirementProfile;
import utdigit.core.rules.RuleEvaluator;
import utdigit.core.rules.Verdict;
import utdigit.core.sampling.SamplingCalculator;
import utdigit.core.sampling.SamplingInput;
import utdigit.core.sampling.SamplingResult;
import utdigit.core.thickness.ThicknessCalculator;
import utdigit.core.thickness.ThicknessInput;
import utdigit.core.thickness.ThicknessResult;
import utdigit.core.timing.Technique;
import utdigit.core.timing.TimeOfFlightCalculator;
import utdigit.core.timing.TimeOfFlightInput;
import utdigit.core.timing.TimeOfFlightResult;

/**
 * Computes every metric a technique sheet's fields allow, by calling the same core calculators as
 * the single endpoints (no second implementation of any formula), then checks the metrics against a
 * requirement profile.
 *
 * <p>Which calculations run: pulse (frequency and velocity), sampling (sampling frequency and
 * frequency), quantization (bit depth), time of flight (sampling frequency and velocity; TOFD for a
 * TOFD sheet with a probe-centre separation, otherwise pulse-echo), thickness (sampling frequency,
 * velocity and thickness), acquisition: the data volume from sampling frequency, bit depth, gate,
 * increment and PRF; the largest scan speed from PRF and increment alone; the wrap-around PRF limit
 * from the longest sound path or round trip alone.
 *
 * <p>Settings the calculators find impossible together (their 422 on the single endpoints) are FAIL
 * findings of the service's own {@link Feasibility} checks, reported before the profiles' findings;
 * the figures of that calculation are then left out, the others computed. Under several profiles
 * the sheet's verdict is the worst of the profiles' verdicts and of the feasibility checks.
 * {@code combined_amplitude_error_db} is the worst case of the pulse's sampling loss and the
 * quantization error at the evaluation height together: sampling first lowers the peak, then the
 * quantizer errs at that lower height ({@link QuantizationCalculator#combinedErrorDb}).
 *
 * <p>The sheet cites each source once, its topic naming the sheet's calculations that cite it
 * ("pulse; sampling"): the single endpoints name the figures, the catalogue gives the citation.
 */
public final class SheetEvaluator {
    private SheetEvaluator() {}

    /** The service's own cautions, added after the profile's. */
    public static final List<String> SERVICE_CAUTIONS = List.of(
            "These results support a qualified examiner; they never replace the qualification of a procedure.",
            "The governing code edition, local codes and licensed practice decide which limits apply.",
            "Built-in velocities are planning defaults: measure the part's velocity for sizing.");

    /** The sheet checked against one profile. */
    public static SheetResult evaluate(SheetInput sheet, RequirementProfile profile) {
        return evaluate(sheet, List.of(profile), List.of());
    }

    /**
     * The sheet checked against every profile in order.
     *
     * @param profiles one or more profiles
     * @param inputFailures feasibility failures already found while reading the sheet (a shear wave
     *     asked of a liquid): FAIL findings reported first
     */
    public static SheetResult evaluate(SheetInput sheet, List<RequirementProfile> profiles,
                                       List<Finding> inputFailures) {
        if (profiles.isEmpty()) {
            throw new IllegalArgumentException("a sheet is checked against at least one profile");
        }
        Values v = new Values();
        v.feasibility.addAll(inputFailures);
        SheetInput.Probe probe = sheet.probe();
        SheetInput.Part part = sheet.part();
        SheetInput.Digitization dig = sheet.digitization();
        SheetInput.Acquisition acq = sheet.acquisition();
        SheetInput.Evaluation eval = sheet.evaluation();
        SheetInput.Tfm tfm = sheet.tfm();
        putInputs(sheet, v);

        Double f = probe.frequencyMhz();
        Double c = part.velocityMPerS();
        Double fs = dig.samplingFrequencyMhz();

        // An angle beam's wedge (both inputs) adds the incidence-plane figures (none past the critical angle).
        boolean angleBeam = sheet.setup().angleBeam();
        PulseResult pulse = f == null || c == null ? null : v.feasible("pulse", () -> PulseCalculator.compute(
                PulseInput.builder(f, c).bandwidthPercent(probe.bandwidthPercent())
                        .elementDiameterMm(probe.elementDiameterMm())
                        .wedgeVelocityMPerS(angleBeam ? sheet.setup().wedgeVelocityMPerS() : null)
                        .incidentAngleDeg(angleBeam ? sheet.setup().incidentAngleDeg() : null).build()));
        if (pulse != null) {
            PulseResult r = pulse;
            v.put("period_us", r.periodUs());
            v.put("wavelength_mm", r.wavelengthMm());
            v.put("lower_frequency_mhz", r.lowerFrequencyMhz());
            v.put("upper_frequency_mhz", r.upperFrequencyMhz());
            v.put("pulse_duration_6db_us", r.pulseDuration6dbUs());
            v.put("pulse_duration_20db_us", r.pulseDuration20dbUs());
            v.put("cycles_6db", r.cycles6db());
            v.put("spatial_pulse_length_mm", r.spatialPulseLengthMm());
            v.put("axial_resolution_mm", r.axialResolutionMm());
            v.put("near_field_length_mm", r.nearFieldLengthMm());
            v.put("beam_spread_6db_deg", r.beamSpread6dbDeg());
            SheetSetupMetrics.putIncidencePlane(r.incidencePlane(), v::put);
            v.notes("pulse", r.warnings(), r.references());
            List<Warning> angle = RefractedAngleCheck.check(part.refractedAngleDeg(), r.refractedAngleDeg(),
                    sheet.setup(), c);
            v.notes("pulse", angle, angle.isEmpty() ? List.of()
                    : List.of(Reference.of("refracted angle tolerance", Sources.BEAM_ANGLE_TOLERANCE)));
        }
        boolean hasGrid = tfm.gridSpacingMm() != null && c != null;
        boolean hasLateral = tfm.lateralGridSpacingMm() != null && tfm.apertureMm() != null && tfm.depthMm() != null;
        SamplingResult sampling = fs == null || f == null ? null : v.feasible("sampling", () -> SamplingCalculator
                .compute(SamplingInput.builder(fs, f)
                        .decimationFactor(dig.decimationFactor())
                        .decimationMode(dig.decimationMode())
                        .bandwidthPercent(probe.bandwidthPercent())
                        .signal(dig.signal())
                        .tfmGridSpacingMm(hasGrid ? tfm.gridSpacingMm() : null)
                        .velocityMPerS(hasGrid ? c : null)
                        .tfmImage(hasGrid ? tfm.image() : null)
                        .tfmLateralGridSpacingMm(hasLateral ? tfm.lateralGridSpacingMm() : null)
                        .tfmApertureMm(hasLateral ? tfm.apertureMm() : null)
                        .tfmDepthMm(hasLateral ? tfm.depthMm() : null).build()));
        if (sampling != null) {
            SamplingResult r = sampling;
            v.put("effective_sampling_frequency_mhz", r.effectiveSamplingFrequencyMhz());
            v.put("sampling_interval_ns", r.samplingIntervalNs());
            v.put("samples_per_period", r.samplesPerPeriod());
            v.put("samples_per_period_upper", r.samplesPerPeriodUpper());
            v.put("nyquist_frequency_mhz", r.nyquistFrequencyMhz());
            v.put("sine_amplitude_loss_db", r.sineAmplitudeLossDb());
            v.put("pulse_amplitude_loss_db", r.pulseAmplitudeLossDb());
            v.put("spectral_level_at_nyquist_db", ReportingFloors.level(r.spectralLevelAtNyquistDb()));
            v.put("energy_above_nyquist_fraction", ReportingFloors.fraction(r.energyAboveNyquistFraction()));
            v.put("timing_error_ns", r.timingErrorNs());
            v.put("timing_standard_uncertainty_ns", r.timingStandardUncertaintyNs());
            v.put("tfm_grid_amplitude_loss_db", r.tfmGridAmplitudeLossDb());
            v.put("tfm_lateral_amplitude_loss_db", r.tfmLateralAmplitudeLossDb());
            v.notes("sampling", r.warnings(), r.references());
        }
        boolean hasEvaluation = eval.referenceHeightPercentFsh() != null && eval.evaluationLevelDb() != null;
        QuantizationResult quantization = dig.bitDepth() == null ? null : v.feasible("quantization",
                () -> QuantizationCalculator.compute(QuantizationInput.builder(dig.bitDepth())
                        .digitizedSignal(dig.digitizedSignal())
                        .quantizer(dig.quantizer())
                        .codeMapping(dig.codeMapping())
                        .amplitudeToleranceDb(eval.amplitudeToleranceDb())
                        .referenceHeightPercentFsh(hasEvaluation ? eval.referenceHeightPercentFsh() : null)
                        .evaluationLevelDb(hasEvaluation ? eval.evaluationLevelDb() : null).build()));
        if (quantization != null) {
            QuantizationResult r = quantization;
            v.put("levels", (double) r.levels());
            v.put("lsb_percent_fsh", r.lsbPercentFsh());
            v.put("dynamic_range_db", r.dynamicRangeDb());
            v.put("minimum_height_percent_fsh", r.minimumHeightPercentFsh());
            v.put("evaluation_height_percent_fsh", r.evaluationHeightPercentFsh());
            v.put("evaluation_error_under_db", r.evaluationErrorUnderDb());
            v.notes("quantization", r.warnings(), r.references());
            quantization = r;
        }
        TimeOfFlightResult tof = null;
        if (fs != null && c != null) {
            TimeOfFlightInput.Builder b = TimeOfFlightInput.builder(fs, c).decimationFactor(dig.decimationFactor());
            if (sheet.technique() == SheetTechnique.TOFD && sheet.tofd().probeCentreSeparationMm() != null) {
                b.technique(Technique.TOFD)
                        .probeCentreSeparationMm(sheet.tofd().probeCentreSeparationMm())
                        .depthMm(sheet.tofd().depthOfInterestMm())
                        .thicknessMm(part.thicknessMm());
                if (f != null && probe.bandwidthPercent() != null) {
                    b.frequencyMhz(f).bandwidthPercent(probe.bandwidthPercent());
                }
            } else {
                b.technique(Technique.PULSE_ECHO).refractedAngleDeg(part.refractedAngleDeg());
            }
            tof = v.feasible("time of flight", () -> TimeOfFlightCalculator.compute(b.build()));
        }
        if (tof != null) {
            TimeOfFlightResult r = tof;
            v.put("sound_path_resolution_mm", r.soundPathResolutionMm());
            v.put("depth_resolution_mm", r.depthResolutionMm());
            v.put("lateral_wave_time_us", r.lateralWaveTimeUs());
            v.put("time_of_flight_us", r.timeOfFlightUs());
            v.put("pulse_limited_depth_resolution_mm", r.pulseLimitedDepthResolutionMm());
            v.put("dead_zone_depth_mm", r.deadZoneDepthMm());
            v.put("backwall_dead_zone_mm", r.backwallDeadZoneMm());
            v.notes("time of flight", r.warnings(), r.references());
        }
        ThicknessResult thickness = fs == null || c == null || part.thicknessMm() == null ? null
                : v.feasible("thickness", () -> ThicknessCalculator.compute(
                        ThicknessInput.builder(fs, c, part.thicknessMm())
                                .decimationFactor(dig.decimationFactor())
                                .velocityUncertaintyMPerS(part.velocityUncertaintyMPerS())
                                .velocityUncertaintyPercent(part.velocityUncertaintyPercent())
                                .requiredResolutionMm(eval.thicknessToleranceMm())
                                .frequencyMhz(probe.bandwidthPercent() == null ? null : f)
                                .bandwidthPercent(f == null ? null : probe.bandwidthPercent())
                                .build()));
        if (thickness != null) {
            ThicknessResult r = thickness;
            v.put("thickness_resolution_mm", r.thicknessResolutionMm());
            v.put("samples_across_thickness", r.samplesAcrossThickness());
            v.put("standard_uncertainty_mm", r.standardUncertaintyMm());
            v.put("expanded_uncertainty_mm", r.expandedUncertaintyMm());
            v.notes("thickness", r.warnings(), r.references());
        }
        acquisition(sheet, v);
        SheetSetupMetrics.Computed setup = SheetSetupMetrics.compute(sheet);
        setup.values().forEach(v::put);
        SheetSetupMetrics.INPUTS.stream().filter(v.values::containsKey).forEach(v.given::add);
        v.warnings.addAll(setup.warnings());
        v.references.addAll(setup.references());
        Double pulseLoss = v.values.get("pulse_amplitude_loss_db");
        Double evaluationError = v.values.get("evaluation_error_under_db");
        if (evaluationError != null) {
            v.put("evaluation_error_magnitude_db", Math.abs(evaluationError));
        }
        if (pulseLoss != null && evaluationError != null) {
            v.put("combined_amplitude_error_db", QuantizationCalculator.combinedErrorDb(pulseLoss,
                    quantization.evaluationHeightPercentFsh(),
                    quantization.quantizer().lowBoundLsbFraction() * quantization.lsbPercentFsh()));
            v.references.add(Reference.of("combined amplitude error", Sources.COMBINED_AMPLITUDE));
        }

        List<Finding> findings = new ArrayList<>(v.feasibility);
        Verdict verdict = v.feasibility.isEmpty() ? Verdict.PASS : Verdict.FAIL;
        List<SheetResult.ProfileVerdict> profileVerdicts = new ArrayList<>();
        List<String> cautions = new ArrayList<>();
        for (RequirementProfile profile : profiles) {
            List<Finding> own = RuleEvaluator.evaluate(profile, sheet.technique().name(), v.values);
            for (Finding finding : own) {
                findings.add(finding.missing().isEmpty() ? finding : finding.withMissingInputs(
                        SheetDependencies.missingInputs(finding.missing(), v.given, sheet.technique())));
            }
            Verdict profileVerdict = RuleEvaluator.verdict(own);
            profileVerdicts.add(new SheetResult.ProfileVerdict(profile, profileVerdict));
            verdict = Verdict.worst(verdict, profileVerdict);
            for (String caution : profile.cautions()) {
                if (!cautions.contains(caution)) {
                    cautions.add(caution);
                }
            }
        }
        cautions.addAll(SERVICE_CAUTIONS);
        return new SheetResult(v.values, findings, verdict, profileVerdicts, cautions,
                v.warnings, Reference.groupedById(v.references));
    }

    /**
     * The acquisition figures, each from the inputs its formula uses: the whole budget (data volume,
     * data rate) needs sampling frequency, bit depth, gate, increment and PRF; the largest scan speed
     * needs PRF and increment; the wrap-around PRF limit the longest sound path or round trip. The
     * gate is checked against the firing period whenever both are given.
     */
    private static void acquisition(SheetInput sheet, Values v) {
        SheetInput.Acquisition acq = sheet.acquisition();
        SheetInput.Digitization dig = sheet.digitization();
        Double fs = dig.samplingFrequencyMhz();
        Double c = sheet.part().velocityMPerS();
        Double prf = acq.pulseRepetitionFrequencyHz();
        // A length in the part needs the part's velocity (absent when the material check failed).
        Double gateMm = c == null ? null : acq.gateLengthMm();
        Double soundPathMm = c == null ? null : acq.maxSoundPathMm();
        boolean hasGate = acq.gateLengthUs() != null || gateMm != null;
        boolean roundTripGiven = acq.maxRoundTripUs() != null || soundPathMm != null;
        boolean whole = fs != null && dig.bitDepth() != null && hasGate && acq.scanIncrementMm() != null && prf != null;
        if (whole) {
            boolean needsVelocity = gateMm != null || soundPathMm != null;
            AcquisitionResult r = v.feasible("acquisition", () -> AcquisitionCalculator.compute(
                    AcquisitionInput.builder(fs, dig.bitDepth(), acq.scanIncrementMm(), prf)
                            .decimationFactor(dig.decimationFactor())
                            .gateLengthUs(acq.gateLengthUs())
                            .gateLengthMm(gateMm)
                            .velocityMPerS(needsVelocity ? c : null)
                            .focalLaws(acq.focalLaws())
                            .fmcElementCount(acq.fmcElementCount())
                            .capture(acq.capture())
                            .averaging(acq.averaging())
                            .scanLengthMm(acq.scanLengthMm())
                            .plannedScanSpeedMmPerS(acq.plannedScanSpeedMmPerS())
                            .maxRoundTripUs(acq.maxRoundTripUs())
                            .maxSoundPathMm(soundPathMm)
                            .wraparoundDecayFactor(roundTripGiven ? acq.wraparoundDecayFactor() : null)
                            .build()));
            if (r != null) {
                v.put("samples_per_a_scan", (double) r.samplesPerAScan());
                v.put("firings_per_position", (double) r.firingsPerPosition());
                v.put("a_scans_per_position", (double) r.aScansPerPosition());
                v.put("bytes_per_position", (double) r.bytesPerPosition());
                v.put("megabytes_per_metre", r.megabytesPerMetre());
                v.put("file_size_megabytes", r.fileSizeMegabytes());
                v.put("max_scan_speed_mm_per_s", r.maxScanSpeedMmPerS());
                v.put("data_rate_megabytes_per_s", r.dataRateMegabytesPerS());
                v.put("max_prf_without_wraparound_hz", r.maxPrfWithoutWraparoundHz());
                v.notes("acquisition", r.warnings(), r.references());
                return;
            }
        } else if (hasGate && prf != null) {
            double gateUs = acq.gateLengthUs() != null ? acq.gateLengthUs()
                    : AcquisitionCalculator.pulseEchoTimeUs(gateMm, c);
            String gateField = acq.gateLengthUs() != null ? "gate_length_us" : "gate_length_mm";
            v.feasible("acquisition", () -> AcquisitionCalculator.checkGateWithinPeriod(gateField, gateUs, prf));
        }
        if (prf != null && acq.scanIncrementMm() != null) {
            long firings = acq.fmcElementCount() != null
                    ? (acq.capture() == null ? CaptureMode.FMC : acq.capture()).firings(acq.fmcElementCount())
                    : acq.focalLaws() == null ? 1 : acq.focalLaws();
            int averaging = acq.averaging() == null ? 1 : acq.averaging();
            v.put("firings_per_position", (double) firings);
            v.put("max_scan_speed_mm_per_s",
                    AcquisitionCalculator.maxScanSpeedMmPerS(prf, acq.scanIncrementMm(), firings, averaging));
            v.references.add(Reference.of("acquisition", Sources.SCAN_SPEED));
        }
        if (roundTripGiven) {
            double roundTripUs = acq.maxRoundTripUs() != null ? acq.maxRoundTripUs()
                    : AcquisitionCalculator.pulseEchoTimeUs(soundPathMm, c);
            double q = acq.wraparoundDecayFactor() == null ? 1.0 : acq.wraparoundDecayFactor();
            v.put("max_prf_without_wraparound_hz", AcquisitionCalculator.maxPrfWithoutWraparoundHz(roundTripUs, q));
            v.references.add(Reference.of("acquisition", Sources.WRAPAROUND));
        }
    }

    private static void putInputs(SheetInput s, Values v) {
        v.put("frequency_mhz", s.probe().frequencyMhz());
        v.put("bandwidth_percent", s.probe().bandwidthPercent());
        v.put("element_diameter_mm", s.probe().elementDiameterMm());
        v.put("element_count", s.probe().elementCount());
        v.put("velocity_m_per_s", s.part().velocityMPerS());
        v.put("velocity_uncertainty_m_per_s", s.part().velocityUncertaintyMPerS() != null
                ? s.part().velocityUncertaintyMPerS()
                : s.part().velocityUncertaintyPercent() != null && s.part().velocityMPerS() != null
                        ? s.part().velocityUncertaintyPercent() / 100.0 * s.part().velocityMPerS() : null);
        v.put("thickness_mm", s.part().thicknessMm());
        v.put("refracted_angle_deg", s.part().refractedAngleDeg());
        v.put("sampling_frequency_mhz", s.digitization().samplingFrequencyMhz());
        v.put("decimation_factor", s.digitization().decimationFactor());
        v.put("bit_depth", s.digitization().bitDepth());
        SheetInput.Acquisition a = s.acquisition();
        v.put("pulse_repetition_frequency_hz", a.pulseRepetitionFrequencyHz());
        v.put("focal_laws", a.focalLaws());
        v.put("fmc_element_count", a.fmcElementCount());
        v.put("averaging", a.averaging());
        v.put("scan_increment_mm", a.scanIncrementMm());
        v.put("scan_length_mm", a.scanLengthMm());
        v.put("planned_scan_speed_mm_per_s", a.plannedScanSpeedMmPerS());
        v.put("gate_length_us", a.gateLengthUs());
        v.put("max_sound_path_mm", a.maxSoundPathMm());
        v.put("max_round_trip_us", a.maxRoundTripUs());
        v.put("wraparound_decay_factor", a.wraparoundDecayFactor());
        v.put("probe_centre_separation_mm", s.tofd().probeCentreSeparationMm());
        v.put("depth_of_interest_mm", s.tofd().depthOfInterestMm());
        v.put("tfm_grid_spacing_mm", s.tfm().gridSpacingMm());
        v.put("tfm_lateral_grid_spacing_mm", s.tfm().lateralGridSpacingMm());
        v.put("tfm_aperture_mm", s.tfm().apertureMm());
        v.put("tfm_depth_mm", s.tfm().depthMm());
        v.put("reference_height_percent_fsh", s.evaluation().referenceHeightPercentFsh());
        v.put("evaluation_level_db", s.evaluation().evaluationLevelDb());
        v.put("amplitude_tolerance_db", s.evaluation().amplitudeToleranceDb());
        v.put("thickness_tolerance_mm", s.evaluation().thicknessToleranceMm());
        v.given.addAll(v.values.keySet());
        if (a.gateLengthMm() != null) {
            v.given.add("gate_length_mm");
        }
        if (a.maxSoundPathMm() != null) {
            v.given.add("max_sound_path_mm");
        }
    }

    /** The values under construction with the notes of each calculation. */
    private static final class Values {
        // sized for a sheet with every section: no rehashing as the metrics come in
        final Map<String, Double> values = new LinkedHashMap<>(256);
        final List<Warning> warnings = new ArrayList<>();
        final Set<Reference> references = new LinkedHashSet<>(64);
        /** The names of the inputs the sheet gives, for the inputs a rule still needs. */
        final Set<String> given = new LinkedHashSet<>(128);
        /** FAIL findings of the service's feasibility checks. */
        final List<Finding> feasibility = new ArrayList<>();

        void put(String metric, Double value) {
            if (value != null) {
                assert SheetMetrics.isKnown(metric) : metric;
                values.put(metric, value);
            }
        }

        /**
         * The calculation's result, or null when it found the sheet's settings impossible together:
         * that failure becomes a FAIL finding of the feasibility checks.
         */
        <T> T feasible(String calculation, java.util.function.Supplier<T> call) {
            try {
                return call.get();
            } catch (CalculationException e) {
                if (!Feasibility.isFeasibilityFailure(e)) {
                    throw e;
                }
                Finding failure = Feasibility.failure(calculation, e);
                if (feasibility.stream().noneMatch(f -> f.ruleId().equals(failure.ruleId())
                        && f.reason().equals(failure.reason()))) {
                    feasibility.add(failure);
                }
                return null;
            }
        }

        void put(String metric, Integer value) {
            put(metric, value == null ? null : value.doubleValue());
        }

        void put(String metric, double value) {
            put(metric, Double.valueOf(value));
        }

        void put(String metric, Optional<Double> value) {
            put(metric, value == null ? null : value.orElse(null));
        }

        void notes(String calculation, List<Warning> ws, List<Reference> refs) {
            for (Warning w : ws) {
                warnings.add(Warning.of(w.code(), calculation + ": " + w.message()));
            }
            refs.forEach(r -> references.add(new Reference(calculation, r.id())));
        }
    }
}
