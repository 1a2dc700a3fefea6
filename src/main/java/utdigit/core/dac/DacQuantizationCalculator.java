package utdigit.core.dac;

import static utdigit.core.common.MessageNumbers.rounded;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import utdigit.core.common.CalculationException;
import utdigit.core.common.Checks;
import utdigit.core.common.Decibels;
import utdigit.core.common.Reference;
import utdigit.core.common.Sources;
import utdigit.core.common.Warning;
import utdigit.core.quantization.QuantizationCalculator;
import utdigit.core.quantization.QuantizationInput;
import utdigit.core.quantization.QuantizationResult;

/**
 * DAC quantization (POST /api/dac-quantizations): for a DAC curve spanning S dB whose highest
 * reference point stands at h_ref, the lowest reference height, its quantization error and whether it
 * meets the tolerance in three set-ups:
 * <ul>
 *   <li>no correction: the lowest point stands S dB below h_ref, h_ref 10^(-S/20), and is read with the
 *   converter's LSB;</li>
 *   <li>TCG before the converter (analog): each depth is amplified to h_ref before digitizing; the
 *   span costs no resolution, every point is read at h_ref;</li>
 *   <li>TCG applied to digitized data (a gain per depth after the converter): the lowest point is
 *   displayed at h_ref, but its displayed LSB has grown by S dB, so its error is that of no
 *   correction.</li>
 * </ul>
 * Every figure comes from {@link QuantizationCalculator}: the uncorrected point as an evaluation
 * level of -S dB, the analog TCG as a height h_ref, the digital TCG as a height h_ref with a digital
 * gain of S dB. No formula of the quantization is repeated here.
 */
public final class DacQuantizationCalculator {
    private DacQuantizationCalculator() {}

    public static final String READS_AS_ZERO = "READS_AS_ZERO";
    public static final String OUT_OF_TOLERANCE = "OUT_OF_TOLERANCE";
    public static final String NO_UNCORRECTED_SPAN = "NO_UNCORRECTED_SPAN";

    /**
     * @throws CalculationException invalid inputs outside a formula's domain (the web layer checks
     *     ranges first); impossible (422) from the quantization (MAX_CODE with one bit of RF)
     */
    public static DacQuantizationResult compute(DacQuantizationInput in) {
        Objects.requireNonNull(in, "input");
        double spanDb = Checks.positive("dac_span_db", in.dacSpanDb());
        double referencePercentFsh = Checks.positive("reference_height_percent_fsh", in.referenceHeightPercentFsh());
        Double toleranceDb = in.amplitudeToleranceDb();

        QuantizationResult plain = QuantizationCalculator.compute(quantization(in)
                .signalHeightPercentFsh(referencePercentFsh)
                .amplitudeToleranceDb(toleranceDb)
                .referenceHeightPercentFsh(referencePercentFsh)
                .evaluationLevelDb(-spanDb).build());
        QuantizationResult digital = QuantizationCalculator.compute(quantization(in)
                .digitalGainDb(spanDb)
                .signalHeightPercentFsh(referencePercentFsh).build());

        List<Warning> warnings = new ArrayList<>();
        List<Reference> references = new ArrayList<>(plain.references());
        references.add(Reference.of("DAC and TCG against quantization", Sources.DAC_TCG));

        double lowest = plain.evaluationHeightPercentFsh();
        Optional<Double> uncorrected = plain.evaluationErrorUnderDb();
        Optional<Double> analog = plain.amplitudeErrorUnderDb();
        Optional<Double> soft = digital.amplitudeErrorUnderDb();
        zeroWarning(uncorrected, "uncorrected_error_under_db", lowest, warnings);
        zeroWarning(analog, "analog_tcg_error_under_db", referencePercentFsh, warnings);
        zeroWarning(soft, "digital_tcg_error_under_db", referencePercentFsh, warnings);

        Double minimum = plain.minimumHeightPercentFsh();
        Optional<Double> maxSpan = null;
        Boolean uncorrectedOk = null;
        Boolean analogOk = null;
        Boolean softOk = null;
        if (toleranceDb != null) {
            maxSpan = referencePercentFsh > minimum
                    ? Optional.of(Decibels.fromRatio(referencePercentFsh / minimum)) : Optional.empty();
            if (maxSpan.isEmpty()) {
                warnings.add(Warning.of(NO_UNCORRECTED_SPAN, "reference_height_percent_fsh " + rounded(referencePercentFsh)
                        + " is itself below minimum_height_percent_fsh " + rounded(minimum) + ": no span is read within "
                        + "amplitude_tolerance_db " + rounded(toleranceDb) + " without correction; max_uncorrected_span_db is null"));
            }
            uncorrectedOk = within(uncorrected, toleranceDb, "uncorrected", warnings);
            analogOk = within(analog, toleranceDb, "analog_tcg", warnings);
            softOk = within(soft, toleranceDb, "digital_tcg", warnings);
            references.add(Reference.of("largest span without correction", Sources.DAC_TCG));
        }
        return new DacQuantizationResult(plain.digitizedSignal(), plain.quantizer(), plain.codeMapping(),
                plain.lsbPercentFsh(), lowest, uncorrected, analog, digital.lsbPercentFsh(), soft, minimum, maxSpan,
                uncorrectedOk, analogOk, softOk, warnings, references);
    }

    /** A quantization input with the DAC input's converter and options. */
    private static QuantizationInput.Builder quantization(DacQuantizationInput in) {
        return QuantizationInput.builder(in.bitDepth())
                .digitizedSignal(in.digitizedSignal())
                .quantizer(in.quantizer())
                .codeMapping(in.codeMapping());
    }

    private static void zeroWarning(Optional<Double> error, String field, double heightPercentFsh,
                                    List<Warning> warnings) {
        if (error.isEmpty()) {
            warnings.add(Warning.of(READS_AS_ZERO, "the point read for " + field + " (" + rounded(heightPercentFsh)
                    + " %FSH displayed) is at or below the quantizer's low bound: it can read as 0, so " + field
                    + " has no finite value; it is null"));
        }
    }

    private static boolean within(Optional<Double> error, double toleranceDb, String setUp, List<Warning> warnings) {
        boolean ok = error.isPresent() && -error.get() <= toleranceDb;
        if (!ok) {
            warnings.add(Warning.of(OUT_OF_TOLERANCE, setUp + ": the lowest reference point can read "
                    + (error.isPresent() ? rounded(-error.get()) + " dB low" : "as 0") + ", more than "
                    + "amplitude_tolerance_db " + rounded(toleranceDb) + " allows"));
        }
        return ok;
    }
}
