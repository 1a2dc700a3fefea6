package utdigit.client;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.util.List;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import utdigit.client.api.AcquisitionApi;
import utdigit.client.api.BatchesApi;
import utdigit.client.api.MaterialsApi;
import utdigit.client.api.PulseAndBeamApi;
import utdigit.client.api.QuantizationApi;
import utdigit.client.api.RequirementProfilesApi;
import utdigit.client.api.SamplingApi;
import utdigit.client.api.StampsApi;
import utdigit.client.api.TechniqueSheetsApi;
import utdigit.client.api.ThicknessApi;
import utdigit.client.api.TimeOfFlightApi;
import utdigit.client.model.AcquisitionBudget;
import utdigit.client.model.AcquisitionBudgetRequest;
import utdigit.client.model.Material;
import utdigit.client.model.PulseParameters;
import utdigit.client.model.PulseParametersBatchRow;
import utdigit.client.model.PulseParametersRequest;
import utdigit.client.model.QuantizationAssessment;
import utdigit.client.model.QuantizationAssessmentRequest;
import utdigit.client.model.RequirementProfile;
import utdigit.client.model.RequirementProfileSummary;
import utdigit.client.model.SamplingAssessment;
import utdigit.client.model.SamplingAssessmentRequest;
import utdigit.client.model.SheetAcquisition;
import utdigit.client.model.SheetDigitization;
import utdigit.client.model.SheetEvaluation;
import utdigit.client.model.SheetMaterial;
import utdigit.client.model.SheetProbe;
import utdigit.client.model.StampVerification;
import utdigit.client.model.StampVerificationRequest;
import utdigit.client.model.TechniqueSheet;
import utdigit.client.model.TechniqueSheetValidation;
import utdigit.client.model.ThicknessResolution;
import utdigit.client.model.ThicknessResolutionRequest;
import utdigit.client.model.TimeOfFlightResolution;
import utdigit.client.model.TimeOfFlightResolutionRequest;

/**
 * The client generated from the committed api-examples/openapi.json (mvn -Pclient) calls the
 * running service once per endpoint: proof that the document is usable as it stands. The service
 * runs elsewhere (.ci/run starts the jar); its URL comes in client.base-url.
 *
 * <p>Expected values are the definitions, not copies of answers: period 1/f, wavelength v/f,
 * 2^n levels and an LSB of 200 %FSH / 2^n (RF), dt = 1/fs, a thickness step of v dt / 2, a scan speed of PRF / laws x increment.
 */
class ServiceClientIT {
    private static final double EXACT = 1e-12;
    /** ISO 22232-2 steel reference values, the service's carbon-steel (README "Quick start"). */
    private static final double STEEL_LONGITUDINAL_M_PER_S = 5920;
    private static final double STEEL_SHEAR_M_PER_S = 3255;

    private ApiClient client;

    @BeforeEach
    void connect() {
        client = new ApiClient();
        client.updateBaseUri(System.getProperty("client.base-url", "http://127.0.0.1:8080"));
    }

    @Test
    void materialsListAndOne() throws ApiException {
        assertThat(new MaterialsApi(client).getMaterials().getMaterials())
                .extracting(Material::getId).contains("carbon-steel", "water");
        Material steel = new MaterialsApi(client).getMaterialsById("carbon-steel", null);
        assertThat(steel.getLongitudinalMPerS()).isEqualTo(STEEL_LONGITUDINAL_M_PER_S);
        assertThat(steel.getShearMPerS()).isEqualTo(STEEL_SHEAR_M_PER_S);
    }

    @Test
    void pulseParameters() throws ApiException {
        PulseParameters answer = new PulseAndBeamApi(client).postPulseParameters(pulseRequest());
        assertThat(answer.getPeriodUs()).isCloseTo(1 / 5.0, within(EXACT));
        assertThat(answer.getWavelengthMm()).isCloseTo(STEEL_LONGITUDINAL_M_PER_S / 5e6 * 1e3, within(EXACT));
        assertThat(answer.getStamp().getCalculation()).isEqualTo("pulse-parameters");
        assertThat(answer.getStamp().getSha256()).matches("[0-9a-f]{64}");
    }

    @Test
    void quantizationAssessment() throws ApiException {
        QuantizationAssessment answer = new QuantizationApi(client).postQuantizationAssessments(new QuantizationAssessmentRequest()
                .bitDepth(12).signalHeightPercentFsh(80.0).amplitudeToleranceDb(1.0));
        assertThat(answer.getLevels()).isEqualTo(1 << 12);
        // RF spans -100..+100 %FSH: the LSB is 200 %FSH / 2^n.
        assertThat(answer.getLsbPercentFsh()).isCloseTo(200.0 / (1 << 12), within(EXACT));
        assertThat(answer.getInputs().getDigitizedSignal())
                .isEqualTo(QuantizationAssessmentRequest.DigitizedSignalEnum.RF);
    }

    @Test
    void timeOfFlightResolution() throws ApiException {
        TimeOfFlightResolution answer = new TimeOfFlightApi(client).postTimeOfFlightResolutions(new TimeOfFlightResolutionRequest()
                .samplingFrequencyMhz(100.0).material("carbon-steel")
                .waveMode(TimeOfFlightResolutionRequest.WaveModeEnum.SHEAR).refractedAngleDeg(60.0));
        assertThat(answer.getTimeResolutionNs()).isCloseTo(1e3 / 100.0, within(EXACT));
        // Pulse-echo: half the round-trip path of one sample, v dt / 2.
        assertThat(answer.getSoundPathResolutionMm()).isCloseTo(STEEL_SHEAR_M_PER_S * 1e-8 / 2 * 1e3, within(EXACT));
    }

    @Test
    void thicknessResolution() throws ApiException {
        ThicknessResolution answer = new ThicknessApi(client).postThicknessResolutions(new ThicknessResolutionRequest()
                .samplingFrequencyMhz(100.0).material("carbon-steel").nominalThicknessMm(12.7)
                .velocityUncertaintyPercent(0.5));
        assertThat(answer.getThicknessResolutionMm()).isCloseTo(STEEL_LONGITUDINAL_M_PER_S * 1e-8 / 2 * 1e3,
                within(EXACT));
    }

    @Test
    void acquisitionBudget() throws ApiException {
        AcquisitionBudget answer = new AcquisitionApi(client).postAcquisitionBudgets(new AcquisitionBudgetRequest()
                .samplingFrequencyMhz(100.0).bitDepth(12).gateLengthUs(40.0).scanIncrementMm(1.0)
                .pulseRepetitionFrequencyHz(6000.0).focalLaws(61).scanLengthMm(2400.0));
        assertThat(answer.getMaxScanSpeedMmPerS()).isCloseTo(6000.0 / 61 * 1.0, within(1e-9));
        assertThat(answer.getSamplesPerAScan()).isEqualTo(4000); // 40 us x 100 MHz
    }

    @Test
    void samplingAssessment() throws ApiException {
        SamplingAssessment answer = new SamplingApi(client).postSamplingAssessments(new SamplingAssessmentRequest()
                .samplingFrequencyMhz(100.0).frequencyMhz(5.0).decimationFactor(2).bandwidthPercent(60.0));
        assertThat(answer.getEffectiveSamplingFrequencyMhz()).isCloseTo(100.0 / 2, within(EXACT));
        assertThat(answer.getSamplesPerPeriod()).isCloseTo(50.0 / 5.0, within(EXACT));
        // Worst-case sine bound at n samples per period: 20 log10(1 / cos(pi / n)).
        assertThat(answer.getSineAmplitudeLossDb()).isCloseTo(-20 * Math.log10(Math.cos(Math.PI / 10)), within(1e-9));
    }

    @Test
    void requirementProfilesListAndOne() throws ApiException {
        assertThat(new RequirementProfilesApi(client).getRequirementProfiles().getProfiles())
                .extracting(RequirementProfileSummary::getId).contains("common-practice");
        RequirementProfile profile = new RequirementProfilesApi(client).getRequirementProfilesById("common-practice");
        assertThat(profile.getRules()).isNotEmpty();
        assertThat(profile.getSha256()).matches("[0-9a-f]{64}");
    }

    @Test
    void techniqueSheetValidation() throws ApiException {
        // The demo shop's sheet BPF-W-PAUT-03: 61 focal laws at 6000 Hz and 1 mm increments allow
        // 6000 / 61 x 1 = 98.4 mm/s; the sheet plans 150 mm/s.
        TechniqueSheet sheet = new TechniqueSheet().sheetId("BPF-W-PAUT-03").revision("A")
                .technique(TechniqueSheet.TechniqueEnum.PHASED_ARRAY)
                .probe(new SheetProbe().frequencyMhz(5.0).bandwidthPercent(65.0).elementCount(32))
                .material(new SheetMaterial().material("carbon-steel").waveMode(SheetMaterial.WaveModeEnum.SHEAR)
                        .thicknessMm(32.0).refractedAngleDeg(55.0))
                .digitization(new SheetDigitization().samplingFrequencyMhz(100.0).decimationFactor(2).bitDepth(12))
                .acquisition(new SheetAcquisition().pulseRepetitionFrequencyHz(6000.0).focalLaws(61)
                        .scanIncrementMm(1.0).scanLengthMm(2400.0).plannedScanSpeedMmPerS(150.0).gateLengthMm(120.0)
                        .maxSoundPathMm(150.0).wraparoundDecayFactor(1.5))
                .evaluation(new SheetEvaluation().referenceHeightPercentFsh(80.0).evaluationLevelDb(-14.0)
                        .amplitudeToleranceDb(2.0).thicknessToleranceMm(0.5));
        TechniqueSheetValidation answer = new TechniqueSheetsApi(client).postTechniqueSheetValidations(sheet);
        assertThat(answer.getVerdict()).isEqualTo(TechniqueSheetValidation.VerdictEnum.FAIL);
        assertThat(answer.getValues().get("max_scan_speed_mm_per_s").doubleValue()).isCloseTo(6000.0 / 61, within(1e-9));
        assertThat(answer.getStamp().getCalculation()).isEqualTo("technique-sheet-validations");
        // No profile_ids set: the generated model leaves the list out (containerDefaultToNull), and the
        // sheet is checked against the default profile.
        assertThat(answer.getProfiles()).extracting(p -> p.getId()).containsExactly("common-practice");
    }

    @Test
    void stampVerificationOfAnAnswerReadThroughTheGeneratedModel() throws ApiException {
        // The answer goes through the generated model and back to JSON: its stamp still verifies only
        // if the model holds every member of the answer.
        PulseParameters answer = new PulseAndBeamApi(client).postPulseParameters(pulseRequest());
        JsonNode document = client.getObjectMapper().valueToTree(answer);
        StampVerification verdict = new StampsApi(client).postStampVerifications(new StampVerificationRequest().document(document));
        assertThat(verdict.getContentIntact()).isTrue();
        assertThat(verdict.getReproducible()).isTrue();
    }

    @Test
    void batchOfPulseParameters() throws ApiException {
        // Each calculation's batch is its own operation with typed rows: a JSON array in, a JSON array out.
        List<PulseParametersBatchRow> rows = new BatchesApi(client).postPulseParametersBatch(
                List.of(pulseRequest(), new PulseParametersRequest().frequencyMhz(5.0)));
        assertThat(rows).extracting(PulseParametersBatchRow::getRow).containsExactly(1L, 2L);
        assertThat(rows).extracting(PulseParametersBatchRow::getStatus)
                .containsExactly(PulseParametersBatchRow.StatusEnum.OK, PulseParametersBatchRow.StatusEnum.INVALID);
        assertThat(rows.get(0).getResult().getPeriodUs()).isCloseTo(0.2, within(1e-15));
        assertThat(rows.get(1).getProblem().getStatus()).isEqualTo(400);
    }

    private static PulseParametersRequest pulseRequest() {
        return new PulseParametersRequest().frequencyMhz(5.0).bandwidthPercent(60.0).elementDiameterMm(10.0)
                .material("carbon-steel");
    }
}
