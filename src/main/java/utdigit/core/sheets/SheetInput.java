package utdigit.core.sheets;

import java.util.Objects;
import utdigit.core.acquisition.CaptureMode;
import utdigit.core.quantization.CodeMapping;
import utdigit.core.quantization.DigitizedSignal;
import utdigit.core.quantization.Quantizer;
import utdigit.core.sampling.DecimationMode;
import utdigit.core.sampling.SampledSignal;
import utdigit.core.sampling.TfmImage;

/**
 * A technique sheet, normalised: lengths in mm, the velocity in m/s. Every section and field is
 * optional; the evaluation computes what the given fields allow.
 */
public record SheetInput(String sheetId, String revision, SheetTechnique technique, Probe probe, Part part,
                         Digitization digitization, Acquisition acquisition, Tofd tofd, Tfm tfm,
                         Evaluation evaluation, SheetSetup setup) {

    /** A sheet without a set-up section. */
    public SheetInput(String sheetId, String revision, SheetTechnique technique, Probe probe, Part part,
                      Digitization digitization, Acquisition acquisition, Tofd tofd, Tfm tfm, Evaluation evaluation) {
        this(sheetId, revision, technique, probe, part, digitization, acquisition, tofd, tfm, evaluation, null);
    }

    public SheetInput {
        Objects.requireNonNull(technique, "technique");
        probe = probe == null ? Probe.EMPTY : probe;
        part = part == null ? Part.EMPTY : part;
        digitization = digitization == null ? Digitization.EMPTY : digitization;
        acquisition = acquisition == null ? Acquisition.EMPTY : acquisition;
        tofd = tofd == null ? Tofd.EMPTY : tofd;
        tfm = tfm == null ? Tfm.EMPTY : tfm;
        evaluation = evaluation == null ? Evaluation.EMPTY : evaluation;
        setup = setup == null ? SheetSetup.EMPTY : setup;
    }

    /** The probe: nominal frequency, -6 dB bandwidth, element diameter (single element), elements. */
    public record Probe(Double frequencyMhz, Double bandwidthPercent, Double elementDiameterMm, Integer elementCount) {
        public static final Probe EMPTY = new Probe(null, null, null, null);
    }

    /**
     * The part: velocity of the wave mode used (m/s) with its standard uncertainty (m/s or %), wall
     * thickness, refracted angle of an angle beam.
     */
    public record Part(Double velocityMPerS, Double velocityUncertaintyMPerS, Double velocityUncertaintyPercent,
                       Double thicknessMm, Double refractedAngleDeg) {
        public static final Part EMPTY = new Part(null, null, null, null, null);
    }

    /** The digitizer's settings. */
    public record Digitization(Double samplingFrequencyMhz, Integer decimationFactor, Integer bitDepth,
                               DigitizedSignal digitizedSignal, Quantizer quantizer, CodeMapping codeMapping,
                               DecimationMode decimationMode, SampledSignal signal) {
        public static final Digitization EMPTY = new Digitization(null, null, null, null, null, null, null, null);
    }

    /** The acquisition: firing, capture, scan and gate. */
    public record Acquisition(Double pulseRepetitionFrequencyHz, Integer focalLaws, Integer fmcElementCount,
                              CaptureMode capture, Integer averaging, Double scanIncrementMm, Double scanLengthMm,
                              Double plannedScanSpeedMmPerS, Double gateLengthUs, Double gateLengthMm,
                              Double maxSoundPathMm, Double maxRoundTripUs, Double wraparoundDecayFactor) {
        public static final Acquisition EMPTY =
                new Acquisition(null, null, null, null, null, null, null, null, null, null, null, null, null);
    }

    /** TOFD set-up: the full probe-centre separation 2S and the depth of interest. */
    public record Tofd(Double probeCentreSeparationMm, Double depthOfInterestMm) {
        public static final Tofd EMPTY = new Tofd(null, null);
    }

    /** TFM image grid: depth and lateral steps, aperture and depth of the lateral check, image kind. */
    public record Tfm(Double gridSpacingMm, Double lateralGridSpacingMm, Double apertureMm, Double depthMm,
                      TfmImage image) {
        public static final Tfm EMPTY = new Tfm(null, null, null, null, null);
    }

    /** The evaluation: reference height and level, the dB and thickness tolerances. */
    public record Evaluation(Double referenceHeightPercentFsh, Double evaluationLevelDb, Double amplitudeToleranceDb,
                             Double thicknessToleranceMm) {
        public static final Evaluation EMPTY = new Evaluation(null, null, null, null);
    }
}
