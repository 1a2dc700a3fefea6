package utdigit.core.coverage;

import static utdigit.core.common.MessageNumbers.rounded;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import utdigit.core.common.CalculationException;
import utdigit.core.common.Checks;
import utdigit.core.common.Reference;
import utdigit.core.common.Sources;
import utdigit.core.common.Warning;
import utdigit.core.pulse.PulseCalculator;
import utdigit.core.pulse.PulseInput;
import utdigit.core.pulse.PulseResult;

/**
 * Scan coverage (POST /api/scan-coverages): the amplitude a reflector loses when it lies midway
 * between two scan positions, for the scan increment, the index step and a sector scan's angular
 * step, and the largest step for a dB tolerance.
 *
 * <p>The model (derived): the beam's main lobe across the scan direction is taken as Gaussian with
 * the pulse-echo -6 dB full width w at the reflector's sound path, so a reflector x off the axis
 * reads 24 (x / w)^2 dB low (exactly 6 dB at x = w / 2). Midway between positions dx apart it is
 * dx / 2 off both: the worst loss is 6 (dx / w)^2 dB. An angular step dtheta (radians) moves the
 * beam z dtheta at sound path z: 6 (z dtheta / w)^2 dB. The largest step for X dB is w sqrt(X / 6).
 */
public final class ScanCoverageCalculator {
    private ScanCoverageCalculator() {}

    public static final String BEAM_WIDTH_UNKNOWN = "BEAM_WIDTH_UNKNOWN";
    public static final String STEP_BEYOND_BEAM_WIDTH = "STEP_BEYOND_BEAM_WIDTH";
    public static final String STEP_OVER_TOLERANCE = "STEP_OVER_TOLERANCE";

    /** The loss at the edge of the -6 dB width, dB: the coefficient of the model. */
    static final double EDGE_LOSS_DB = 6.0;

    /**
     * @throws CalculationException notApplicable (400) for a beam width given together with probe
     *     inputs, for neither, for probe inputs without all of frequency, velocity, element diameter
     *     and sound path, or for an angular step without a sound path
     */
    public static ScanCoverageResult compute(ScanCoverageInput in) {
        Objects.requireNonNull(in, "input");
        boolean anyProbe = in.frequencyMhz() != null || in.velocityMPerS() != null || in.elementDiameterMm() != null;
        if (in.beamWidth6dbMm() != null && anyProbe) {
            throw CalculationException.notApplicable("beam_width_6db", "give the beam width once: beam_width_6db "
                    + "(measured or computed at the reflector's sound path), or frequency_mhz, a velocity, "
                    + "element_diameter and sound_path for a round probe, not both");
        }
        if (in.beamWidth6dbMm() == null) {
            String missing = in.frequencyMhz() == null ? "frequency_mhz" : in.velocityMPerS() == null ? "velocity"
                    : in.elementDiameterMm() == null ? "element_diameter" : in.soundPathMm() == null ? "sound_path" : null;
            if (missing != null) {
                throw CalculationException.notApplicable(anyProbe ? missing : "beam_width_6db",
                        "a beam width is needed: give beam_width_6db, or frequency_mhz, a velocity, element_diameter "
                                + "and sound_path for a round probe" + (anyProbe ? " (" + missing + " is missing)" : ""));
            }
        }
        if (in.angularStepDeg() != null && in.soundPathMm() == null) {
            throw CalculationException.notApplicable("angular_step_deg",
                    "angular_step_deg needs sound_path: the step between beams at the reflector is z dtheta");
        }
        Double toleranceDb = in.amplitudeToleranceDb() == null ? null
                : Checks.positive("amplitude_tolerance_db", in.amplitudeToleranceDb());

        List<Warning> warnings = new ArrayList<>();
        List<Reference> references = new ArrayList<>();
        Optional<Double> widthMm;
        if (in.beamWidth6dbMm() != null) {
            widthMm = Optional.of(Checks.positive("beam_width_6db", in.beamWidth6dbMm()));
        } else {
            widthMm = probeBeamWidthMm(in, warnings, references);
        }
        references.add(Reference.of("loss between scan positions", Sources.SCAN_COVERAGE));

        Optional<Double> scanLoss = in.scanIncrementMm() == null ? null
                : widthMm.map(w -> lossDb(Checks.positive("scan_increment", in.scanIncrementMm()), w));
        Optional<Double> indexLoss = in.indexStepMm() == null ? null
                : widthMm.map(w -> lossDb(Checks.positive("index_step", in.indexStepMm()), w));
        Optional<Double> angularLoss = null;
        Double angularStepMm = null;
        if (in.angularStepDeg() != null) {
            double stepDeg = Checks.positive("angular_step_deg", in.angularStepDeg());
            angularStepMm = Checks.positive("sound_path", in.soundPathMm()) * StrictMath.toRadians(stepDeg);
            double stepMm = angularStepMm;
            angularLoss = widthMm.map(w -> lossDb(stepMm, w));
        }
        for (Object[] s : new Object[][] {{"scan_increment", in.scanIncrementMm(), scanLoss},
                {"index_step", in.indexStepMm(), indexLoss}, {"angular_step_deg", angularStepMm, angularLoss}}) {
            @SuppressWarnings("unchecked")
            Optional<Double> loss = (Optional<Double>) s[2];
            if (loss != null && loss.isPresent() && loss.get() > EDGE_LOSS_DB) {
                warnings.add(Warning.of(STEP_BEYOND_BEAM_WIDTH, s[0] + " moves the beam " + rounded((Double) s[1])
                        + " mm, more than the -6 dB beam width " + rounded(widthMm.get()) + " mm: a reflector midway lies "
                        + "outside the main lobe's -6 dB edge and the Gaussian figure (" + rounded(loss.get())
                        + " dB) only says it can be missed"));
            }
        }

        Optional<Double> maxStep = null;
        Optional<Double> maxAngular = null;
        Optional<Boolean> scanWithin = null;
        Optional<Boolean> indexWithin = null;
        Optional<Boolean> angularWithin = null;
        if (toleranceDb != null) {
            double x = toleranceDb;
            maxStep = widthMm.map(w -> maxStepMm(w, x));
            if (in.soundPathMm() != null) {
                double z = Checks.positive("sound_path", in.soundPathMm());
                maxAngular = maxStep.map(s -> StrictMath.toDegrees(s / z));
            }
            scanWithin = within(scanLoss, x, "scan_increment", warnings);
            indexWithin = within(indexLoss, x, "index_step", warnings);
            angularWithin = within(angularLoss, x, "angular_step_deg", warnings);
            references.add(Reference.of("largest step for a tolerance", Sources.SCAN_COVERAGE));
        }
        return new ScanCoverageResult(widthMm, scanLoss, indexLoss, angularLoss, maxStep, maxAngular, scanWithin,
                indexWithin, angularWithin, warnings, references);
    }

    /** 6 (step / width)^2 dB: the worst loss midway between positions a step apart. */
    public static double lossDb(double stepMm, double beamWidthMm) {
        Checks.positive("step", stepMm);
        Checks.positive("beam_width", beamWidthMm);
        double ratio = stepMm / beamWidthMm;
        return EDGE_LOSS_DB * ratio * ratio;
    }

    /** w sqrt(X / 6), mm: the largest step whose worst loss is X dB. */
    public static double maxStepMm(double beamWidthMm, double toleranceDb) {
        Checks.positive("beam_width", beamWidthMm);
        Checks.positive("amplitude_tolerance_db", toleranceDb);
        return beamWidthMm * StrictMath.sqrt(toleranceDb / EDGE_LOSS_DB);
    }

    private static Optional<Boolean> within(Optional<Double> loss, double toleranceDb, String field,
                                            List<Warning> warnings) {
        if (loss == null) {
            return null;
        }
        Optional<Boolean> ok = loss.map(l -> l <= toleranceDb);
        if (ok.isPresent() && !ok.get()) {
            warnings.add(Warning.of(STEP_OVER_TOLERANCE, field + " loses up to " + rounded(loss.get())
                    + " dB, more than amplitude_tolerance_db " + rounded(toleranceDb)));
        }
        return ok;
    }

    private static Optional<Double> probeBeamWidthMm(ScanCoverageInput in, List<Warning> warnings,
                                                     List<Reference> references) {
        double soundPathMm = Checks.positive("sound_path", in.soundPathMm());
        PulseResult pulse = PulseCalculator.compute(PulseInput.builder(in.frequencyMhz(), in.velocityMPerS())
                .elementDiameterMm(Checks.positive("element_diameter", in.elementDiameterMm()))
                .distanceMm(soundPathMm).build());
        references.add(Reference.of("beam width of a round probe", Sources.PISTON_DIRECTIVITY));
        double nearFieldMm = pulse.nearFieldLengthMm();
        if (soundPathMm < nearFieldMm) {
            warnings.add(Warning.of(BEAM_WIDTH_UNKNOWN, "sound_path " + rounded(soundPathMm) + " mm lies inside the "
                    + "near field (" + rounded(nearFieldMm) + " mm): the far-field beam width does not hold there, so "
                    + "beam_width_6db_mm and the losses are null; give beam_width_6db as measured at that depth"));
            return Optional.empty();
        }
        Optional<Double> width = pulse.beamDiameter6dbMm() == null ? Optional.empty() : pulse.beamDiameter6dbMm();
        if (width.isEmpty()) {
            warnings.add(Warning.of(BEAM_WIDTH_UNKNOWN, "element_diameter " + rounded(in.elementDiameterMm())
                    + " mm is too small for the wavelength: the beam has no -6 dB half-angle, so beam_width_6db_mm "
                    + "and the losses are null"));
        }
        return width;
    }
}
