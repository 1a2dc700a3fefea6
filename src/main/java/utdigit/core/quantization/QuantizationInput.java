package utdigit.core.quantization;

/**
 * Inputs of a quantization assessment, in the contract's units. Options and optional inputs are
 * nullable: null means "not given" and the calculator applies the contract's default (RF,
 * ROUNDING, FSR_OVER_2N, 0 dB) or leaves the dependent results out. Heights are displayed heights,
 * after the digital gain.
 *
 * @param bitDepth converter resolution N, 1 to 32 bits
 * @param digitizedSignal RF (-100..+100 %FSH) or RECTIFIED (0..100 %FSH); null: RF
 * @param quantizer ROUNDING or TRUNCATION; null: ROUNDING
 * @param codeMapping FSR_OVER_2N or MAX_CODE; null: FSR_OVER_2N
 * @param digitalGainDb gain applied after digitizing (soft gain), dB, -40 to +60; null: 0
 * @param signalHeightPercentFsh displayed echo height h, above 0 and at most 100 %FSH; null: not given
 * @param amplitudeToleranceDb the procedure's amplitude tolerance X, above 0 and at most 40 dB;
 *     null: not given
 * @param referenceHeightPercentFsh displayed height of the reference reflector, above 0 and at most
 *     100 %FSH; given together with {@code evaluationLevelDb} or not at all
 * @param evaluationLevelDb evaluation level L relative to the reference, dB (-14 is 14 dB below),
 *     -80 to +20; given together with {@code referenceHeightPercentFsh} or not at all
 * @param averaging number M of acquisitions averaged, 1 to 65536; null: not given
 */
public record QuantizationInput(
        int bitDepth,
        DigitizedSignal digitizedSignal,
        Quantizer quantizer,
        CodeMapping codeMapping,
        Double digitalGainDb,
        Double signalHeightPercentFsh,
        Double amplitudeToleranceDb,
        Double referenceHeightPercentFsh,
        Double evaluationLevelDb,
        Integer averaging) {

    /** Only the bit depth; every option at its default, no optional input. */
    public static QuantizationInput ofBitDepth(int bitDepth) {
        return new QuantizationInput(bitDepth, null, null, null, null, null, null, null, null, null);
    }

    public QuantizationInput withDigitizedSignal(DigitizedSignal value) {
        return new QuantizationInput(bitDepth, value, quantizer, codeMapping, digitalGainDb,
                signalHeightPercentFsh, amplitudeToleranceDb, referenceHeightPercentFsh, evaluationLevelDb, averaging);
    }

    public QuantizationInput withQuantizer(Quantizer value) {
        return new QuantizationInput(bitDepth, digitizedSignal, value, codeMapping, digitalGainDb,
                signalHeightPercentFsh, amplitudeToleranceDb, referenceHeightPercentFsh, evaluationLevelDb, averaging);
    }

    public QuantizationInput withCodeMapping(CodeMapping value) {
        return new QuantizationInput(bitDepth, digitizedSignal, quantizer, value, digitalGainDb,
                signalHeightPercentFsh, amplitudeToleranceDb, referenceHeightPercentFsh, evaluationLevelDb, averaging);
    }

    public QuantizationInput withDigitalGainDb(Double value) {
        return new QuantizationInput(bitDepth, digitizedSignal, quantizer, codeMapping, value,
                signalHeightPercentFsh, amplitudeToleranceDb, referenceHeightPercentFsh, evaluationLevelDb, averaging);
    }

    public QuantizationInput withSignalHeightPercentFsh(Double value) {
        return new QuantizationInput(bitDepth, digitizedSignal, quantizer, codeMapping, digitalGainDb,
                value, amplitudeToleranceDb, referenceHeightPercentFsh, evaluationLevelDb, averaging);
    }

    public QuantizationInput withAmplitudeToleranceDb(Double value) {
        return new QuantizationInput(bitDepth, digitizedSignal, quantizer, codeMapping, digitalGainDb,
                signalHeightPercentFsh, value, referenceHeightPercentFsh, evaluationLevelDb, averaging);
    }

    /** The reference height and the evaluation level, which only go together. */
    public QuantizationInput withEvaluation(Double referenceHeightPercentFshValue, Double evaluationLevelDbValue) {
        return new QuantizationInput(bitDepth, digitizedSignal, quantizer, codeMapping, digitalGainDb,
                signalHeightPercentFsh, amplitudeToleranceDb, referenceHeightPercentFshValue, evaluationLevelDbValue,
                averaging);
    }

    public QuantizationInput withAveraging(Integer value) {
        return new QuantizationInput(bitDepth, digitizedSignal, quantizer, codeMapping, digitalGainDb,
                signalHeightPercentFsh, amplitudeToleranceDb, referenceHeightPercentFsh, evaluationLevelDb, value);
    }
}
