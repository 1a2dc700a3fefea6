package utdigit.web.acquisition;

import io.swagger.v3.oas.annotations.media.Schema;
import java.util.List;
import java.util.Optional;
import utdigit.web.pipeline.ResultNotes.ReferenceView;
import utdigit.web.pipeline.ToleranceCheck;
import utdigit.web.pipeline.ResultNotes.WarningView;
import utdigit.web.units.Mirrors;
import utdigit.web.units.VelocitySourceView;

/** The answer of POST /api/acquisition-budgets. */
@Schema(name = "AcquisitionBudget", description = "Data volume, scan speed and wrap-around PRF limit of an encoded "
        + "acquisition. MB is 10^6 bytes (not the binary MiB of 2^20 bytes); sizes exclude file headers, encoder "
        + "data and compression. Data volume counts A-scans; scan speed counts firings. Fields whose optional "
        + "inputs were not given are omitted.")
record AcquisitionBudgetResponse(
        long samplesPerAScan,
        int bytesPerSample,
        long bytesPerAScan,
        long firingsPerPosition,
        long aScansPerPosition,
        long bytesPerPosition,
        double megabytesPerMetre,
        Double fileSizeMegabytes,
        double maxScanSpeedMmPerS,
        double dataRateMegabytesPerS,
        Double maxPrfWithoutWraparoundHz,
        Double maxScanLengthPerFileMm,
        double effectiveSamplingFrequencyMhz,
        double gateLengthUsedUs,
        double pulseRepetitionPeriodUs,
        double dataRateScanSpeedMmPerS,
        Double maxRoundTripUsedUs,
        List<ToleranceCheck> toleranceChecks,

        AcquisitionBudgetRequest inputs,
        VelocitySourceView velocitySource,
        List<WarningView> warnings,
        List<ReferenceView> references,
        InInches inInches) {

    /** Inch mirrors of the length results, each the mm result / 25.4. */
    @Schema(name = "AcquisitionBudgetInInches", description = "Inch mirrors of the length "
            + "results (the inch is 25.4 mm exactly)")
    record InInches(
            Double maxScanLengthPerFileIn,
            Double maxScanSpeedInPerS,
            Double dataRateScanSpeedInPerS) {

        /** The mirrors, or null (omitted) when the answer has no length result. */
        static InInches of(Double maxScanLengthPerFileIn, Double maxScanSpeedInPerS, Double dataRateScanSpeedInPerS) {
            return Mirrors.orNone(new InInches(maxScanLengthPerFileIn, maxScanSpeedInPerS, dataRateScanSpeedInPerS));
        }
    }
}
