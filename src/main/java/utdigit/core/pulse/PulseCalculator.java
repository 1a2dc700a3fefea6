package utdigit.core.pulse;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import utdigit.core.common.CalculationException;
import utdigit.core.common.Reference;
import utdigit.core.common.Sources;
import utdigit.core.common.Units;
import utdigit.core.common.Warning;

/**
 * Pulse and beam parameters of a probe (POST /api/pulse-parameters): period and wavelength; with a
 * bandwidth, the band edges, pulse durations and lengths of the Gaussian pulse model; with an
 * element diameter, the near field and the pulse-echo beam spread of a circular piston; with a
 * distance, the beam diameter there; behind a wedge, the near field left in the part and the
 * refracted angle.
 *
 * <p>The formulas and their references are on {@link Waves}, {@link GaussianPulse},
 * {@link CentreFrequencyConvention}, {@link PistonBeam}, {@link PistonDirectivity} and
 * {@link Snell}. Period, wavelength, near field and beam spread use the nominal frequency; durations
 * and cycles the pulse model's carrier (the same with ARITHMETIC). The distance is a distance in the
 * part: with wedge_path_mm given, it is compared with the near field left in the part, else with
 * the near field. The band edges are the one-sided model's (methods.md); a -20 or -40 dB lower edge more
 * than 0.1 % above the real pulse's (its negative-frequency image, {@link RealPulseSpectrum}) is
 * flagged with a warning. Stateless and thread-safe.
 */
public final class PulseCalculator {
    private PulseCalculator() {}

    /** The convention used when a bandwidth is given without one (the contract's default). */
    public static final CentreFrequencyConvention DEFAULT_CONVENTION = CentreFrequencyConvention.ARITHMETIC;

    /** Above this bandwidth the real pulse's negative-frequency image moves its lower edges. */
    public static final double IMAGE_WARNING_BANDWIDTH_PERCENT = 100.0;

    /** Pulse-echo levels of the beam-spread fields, dB below the axis. */
    static final double BEAM_SPREAD_6DB = -6.0;
    static final double BEAM_SPREAD_20DB = -20.0;

    /** Band-edge and duration levels of the result fields, dB below the peak. */
    static final double LEVEL_6DB = -6.0;
    static final double LEVEL_20DB = -20.0;
    static final double LEVEL_40DB = -40.0;

    /** Warning codes. */
    public static final String BANDWIDTH_ABOVE_100_PERCENT = "BANDWIDTH_ABOVE_100_PERCENT";
    public static final String NO_LOWER_FREQUENCY_20DB = "NO_LOWER_FREQUENCY_20DB";
    public static final String NO_LOWER_FREQUENCY_40DB = "NO_LOWER_FREQUENCY_40DB";
    public static final String REAL_LOWER_EDGE_BELOW_MODEL = "REAL_LOWER_EDGE_BELOW_MODEL";
    public static final String NO_EXACT_NEAR_FIELD = "NO_EXACT_NEAR_FIELD";
    public static final String NO_BEAM_SPREAD_6DB = "NO_BEAM_SPREAD_6DB";
    public static final String NO_BEAM_SPREAD_20DB = "NO_BEAM_SPREAD_20DB";
    public static final String NO_BEAM_SPREAD_NULL = "NO_BEAM_SPREAD_NULL";
    public static final String NO_BEAM_DIAMETER_6DB = "NO_BEAM_DIAMETER_6DB";
    public static final String DISTANCE_IN_NEAR_FIELD = "DISTANCE_IN_NEAR_FIELD";
    public static final String PART_IN_FAR_FIELD_ONLY = "PART_IN_FAR_FIELD_ONLY";
    public static final String DISTANCE_IN_INCIDENCE_PLANE_NEAR_FIELD = "DISTANCE_IN_INCIDENCE_PLANE_NEAR_FIELD";
    public static final String NO_INCIDENCE_PLANE_BEAM_DIAMETER_6DB = "NO_INCIDENCE_PLANE_BEAM_DIAMETER_6DB";
    public static final String PAST_CRITICAL_ANGLE = "PAST_CRITICAL_ANGLE";

    /**
     * A model lower edge more than this fraction above the real pulse's is flagged (the tolerance to
     * which the tests hold unflagged edges against an FFT of the real pulse: 0.1 %).
     */
    public static final double REAL_LOWER_EDGE_TOLERANCE_FRACTION = 1e-3;

    /**
     * The real lower edge is solved only where its first-order estimated shift exceeds this (half the
     * tolerance: the estimate is within a few % of the solved shift near the tolerance, see
     * {@link RealPulseSpectrum#estimatedLowerEdgeShiftFraction}).
     */
    private static final double REAL_LOWER_EDGE_SOLVE_FRACTION = REAL_LOWER_EDGE_TOLERANCE_FRACTION / 2.0;

    /**
     * Computes every result whose inputs are given.
     *
     * @throws CalculationException NOT_APPLICABLE (HTTP 400) for an input given without the input
     *     it needs: centre_frequency_convention without bandwidth_percent, distance_mm or
     *     wedge_path_mm without element_diameter_mm, wedge_path_mm or incident_angle_deg without
     *     wedge_velocity_m_per_s, wedge_velocity_m_per_s without either of them
     */
    public static PulseResult compute(PulseInput in) {
        Objects.requireNonNull(in, "input");
        checkApplicability(in);
        List<Warning> warnings = new ArrayList<>();
        List<Reference> references = new ArrayList<>();

        double frequencyMhz = in.frequencyMhz();
        double velocityMPerS = in.velocityMPerS();
        double periodUs = Waves.periodUs(frequencyMhz);
        double wavelengthMm = Waves.wavelengthMm(velocityMPerS, frequencyMhz);
        references.add(Reference.of("period and wavelength", Sources.DEFINITIONS));

        Band band = in.bandwidthPercent() == null
                ? Band.NONE
                : band(in, warnings, references);
        Element element = in.elementDiameterMm() == null
                ? Element.NONE
                : element(in, wavelengthMm, warnings, references);
        Optional<Double> refractedAngleDeg = in.incidentAngleDeg() == null
                ? null
                : refractedAngleDeg(in, warnings, references);
        PulseResult.IncidencePlane incidencePlane = null;
        if (in.incidentAngleDeg() != null && in.elementDiameterMm() != null) {
            incidencePlane = incidencePlane(in, wavelengthMm, refractedAngleDeg, warnings, references);
        }

        return new PulseResult(
                band.convention,
                periodUs,
                wavelengthMm,
                Units.mmToIn(wavelengthMm),
                band.lowerFrequencyMhz,
                band.upperFrequencyMhz,
                band.lowerFrequency20dbMhz,
                band.upperFrequency20dbMhz,
                band.lowerFrequency40dbMhz,
                band.upperFrequency40dbMhz,
                band.pulseDuration6dbUs,
                band.pulseDuration20dbUs,
                band.cycles6db,
                band.spatialPulseLengthMm,
                band.axialResolutionMm,
                element.nearFieldLengthMm,
                element.nearFieldLengthExactMm,
                element.beamSpread6dbDeg,
                element.beamSpread20dbDeg,
                element.beamSpreadNullDeg,
                element.beamDiameter6dbMm,
                element.nearFieldInPartMm,
                refractedAngleDeg,
                incidencePlane,
                warnings,
                references);
    }

    /** The element's results (near field, beam spread, beam diameter, near field in the part), all null without a diameter. */
    private record Element(
            Double nearFieldLengthMm,
            Optional<Double> nearFieldLengthExactMm,
            Optional<Double> beamSpread6dbDeg,
            Optional<Double> beamSpread20dbDeg,
            Optional<Double> beamSpreadNullDeg,
            Optional<Double> beamDiameter6dbMm,
            Double nearFieldInPartMm) {
        static final Element NONE = new Element(null, null, null, null, null, null, null);
    }

    private static Element element(PulseInput in, double wavelengthMm, List<Warning> warnings,
            List<Reference> references) {
        double diameterMm = in.elementDiameterMm();
        double nearFieldLengthMm = PistonBeam.nearFieldLengthMm(diameterMm, wavelengthMm);
        references.add(Reference.of("near field length", Sources.NEAR_FIELD_PRACTICE));
        Optional<Double> nearFieldLengthExactMm = PistonBeam.exactNearFieldLengthMm(diameterMm, wavelengthMm);
        references.add(Reference.of("exact near field length", Sources.PISTON_NEAR_FIELD));
        if (nearFieldLengthExactMm.isEmpty()) {
            warnings.add(PulseMessages.noExactNearField(diameterMm, wavelengthMm));
        }

        PulseEchoSpread spread = pulseEchoSpread(wavelengthMm, diameterMm, "", warnings);
        Optional<Double> beamSpreadNullDeg = beamSpread(PistonDirectivity.firstNullConstant(),
                wavelengthMm, diameterMm, NO_BEAM_SPREAD_NULL, "beam_spread_null_deg",
                "the first null", warnings);
        references.add(Reference.of("beam spread", Sources.PISTON_DIRECTIVITY));

        Double nearFieldInPartMm = null;
        if (in.wedgePathMm() != null) {
            nearFieldInPartMm = PistonBeam.nearFieldInPartMm(
                    nearFieldLengthMm, in.wedgePathMm(), in.wedgeVelocityMPerS(), in.velocityMPerS());
            references.add(Reference.of("near field in the part", Sources.NEAR_FIELD_PRACTICE));
            if (nearFieldInPartMm < 0) {
                warnings.add(PulseMessages.partInFarFieldOnly(nearFieldLengthMm, in.wedgePathMm(),
                        in.wedgeVelocityMPerS()));
            }
        }
        Optional<Double> beamDiameter6dbMm = null;
        if (in.distanceMm() != null) {
            double nearFieldAheadMm = nearFieldInPartMm != null ? nearFieldInPartMm : nearFieldLengthMm;
            beamDiameter6dbMm = beamDiameter(in.distanceMm(), nearFieldAheadMm, nearFieldInPartMm != null,
                    spread.at6db(), warnings, references);
        }
        return new Element(nearFieldLengthMm, nearFieldLengthExactMm, spread.at6db(), spread.at20db(),
                beamSpreadNullDeg, beamDiameter6dbMm, nearFieldInPartMm);
    }

    /** The far-field -6 dB beam diameter at a distance; empty inside the near field or without a -6 dB angle. */
    private static Optional<Double> beamDiameter(double distanceMm, double nearFieldAheadMm, boolean inPart,
            Optional<Double> beamSpread6dbDeg, List<Warning> warnings, List<Reference> references) {
        Optional<Double> beamDiameter6dbMm;
        references.add(Reference.of("beam diameter", Sources.NEAR_FIELD_PRACTICE));
        if (beamSpread6dbDeg.isEmpty()) {
            beamDiameter6dbMm = Optional.empty();
            warnings.add(PulseMessages.noBeamDiameter6db());
        } else if (distanceMm < nearFieldAheadMm) {
            beamDiameter6dbMm = Optional.empty();
        } else {
            beamDiameter6dbMm = Optional.of(PistonBeam.beamDiameterMm(distanceMm, beamSpread6dbDeg.get()));
        }
        if (distanceMm < nearFieldAheadMm) {
            warnings.add(PulseMessages.distanceInNearField(distanceMm, nearFieldAheadMm, inPart));
        }
        return beamDiameter6dbMm;
    }

    /** The refracted angle behind the wedge (Snell); empty at or past the critical angle. */
    private static Optional<Double> refractedAngleDeg(PulseInput in, List<Warning> warnings,
            List<Reference> references) {
        double incidentDeg = in.incidentAngleDeg();
        double wedgeVelocityMPerS = in.wedgeVelocityMPerS();
        double velocityMPerS = in.velocityMPerS();
        Optional<Double> refractedAngleDeg = Snell.refractedAngleDeg(incidentDeg, wedgeVelocityMPerS, velocityMPerS);
        references.add(Reference.of("refracted angle", Sources.SNELL));
        if (refractedAngleDeg.isEmpty()) {
            double criticalDeg = Snell.criticalAngleDeg(wedgeVelocityMPerS, velocityMPerS).orElseThrow();
            warnings.add(PulseMessages.pastCriticalAngle(incidentDeg, criticalDeg, wedgeVelocityMPerS, velocityMPerS,
                    in.elementDiameterMm() != null));
        }
        return refractedAngleDeg;
    }

    /**
     * The angle beam's figures in the incidence plane from the projected aperture D_eff =
     * D cos(beta)/cos(alpha): near field, near field left in the part, beam spread and beam width.
     * All empty past the critical angle (PAST_CRITICAL_ANGLE says why).
     */
    private static PulseResult.IncidencePlane incidencePlane(PulseInput in, double wavelengthMm,
            Optional<Double> refractedAngleDeg, List<Warning> warnings, List<Reference> references) {
        if (refractedAngleDeg.isEmpty()) {
            Optional<Double> none = Optional.empty();
            return new PulseResult.IncidencePlane(none, none, in.wedgePathMm() == null ? null : none, none, none,
                    in.distanceMm() == null ? null : none);
        }
        double alphaDeg = in.incidentAngleDeg();
        double betaDeg = refractedAngleDeg.get();
        double apertureMm = PistonBeam.projectedApertureMm(in.elementDiameterMm(), alphaDeg, betaDeg);
        double nearFieldMm = PistonBeam.nearFieldLengthMm(apertureMm, wavelengthMm);
        references.add(Reference.of("incidence plane of an angle beam", Sources.INCIDENCE_PLANE));
        PulseEchoSpread spread = pulseEchoSpread(wavelengthMm, apertureMm, "incidence_plane_", warnings);
        Optional<Double> beamSpread6 = spread.at6db();
        Optional<Double> nearFieldInPart = null;
        if (in.wedgePathMm() != null) {
            nearFieldInPart = Optional.of(nearFieldMm - PistonBeam.incidencePlaneWedgePathInPartMm(in.wedgePathMm(),
                    in.wedgeVelocityMPerS(), in.velocityMPerS(), alphaDeg, betaDeg));
            references.add(Reference.of("near field in the part, incidence plane", Sources.INCIDENCE_PLANE));
        }
        Optional<Double> beamDiameter = null;
        if (in.distanceMm() != null) {
            double distanceMm = in.distanceMm();
            double nearFieldAheadMm = nearFieldInPart != null ? nearFieldInPart.get() : nearFieldMm;
            if (beamSpread6.isEmpty()) {
                beamDiameter = Optional.empty();
                warnings.add(PulseMessages.noIncidencePlaneBeamDiameter(apertureMm));
            } else if (distanceMm < nearFieldAheadMm) {
                beamDiameter = Optional.empty();
                warnings.add(PulseMessages.distanceInIncidencePlaneNearField(distanceMm, nearFieldAheadMm,
                        nearFieldInPart != null, apertureMm));
            } else {
                beamDiameter = Optional.of(PistonBeam.beamDiameterMm(distanceMm, beamSpread6.get()));
            }
        }
        return new PulseResult.IncidencePlane(Optional.of(apertureMm), Optional.of(nearFieldMm), nearFieldInPart,
                beamSpread6, spread.at20db(), beamDiameter);
    }

    /** The band results, all null without a bandwidth. */
    private record Band(
            CentreFrequencyConvention convention,
            Double lowerFrequencyMhz,
            Double upperFrequencyMhz,
            Optional<Double> lowerFrequency20dbMhz,
            Double upperFrequency20dbMhz,
            Optional<Double> lowerFrequency40dbMhz,
            Double upperFrequency40dbMhz,
            Double pulseDuration6dbUs,
            Double pulseDuration20dbUs,
            Double cycles6db,
            Double spatialPulseLengthMm,
            Double axialResolutionMm) {
        static final Band NONE = new Band(null, null, null, null, null, null, null, null, null, null, null, null);
    }

    private static Band band(PulseInput in, List<Warning> warnings, List<Reference> references) {
        CentreFrequencyConvention convention = in.centreFrequencyConvention() == null
                ? DEFAULT_CONVENTION
                : in.centreFrequencyConvention();
        double bandwidthPercent = in.bandwidthPercent();
        double fractionalBandwidth = bandwidthPercent / 100.0;
        double[] edgesMhz = convention.bandEdgesMhz(in.frequencyMhz(), fractionalBandwidth);
        GaussianPulse model = convention.pulseModel(in.frequencyMhz(), fractionalBandwidth);

        references.add(Reference.of("-6 dB bandwidth", Sources.ASTM_E1065));
        references.add(Reference.of("centre frequency " + convention, Sources.CENTRE_FREQUENCY));
        references.add(Reference.of("-20 dB and -40 dB band edges, pulse durations and cycles", Sources.GAUSSIAN_MODEL));
        references.add(Reference.of("spatial pulse length and axial resolution", Sources.PULSE_LENGTH));

        if (bandwidthPercent > IMAGE_WARNING_BANDWIDTH_PERCENT) {
            Optional<Double> realLowerMhz = RealPulseSpectrum.lowerEdgeMhz(model, LEVEL_6DB);
            warnings.add(PulseMessages.bandwidthAbove100Percent(bandwidthPercent, edgesMhz[0], realLowerMhz));
            references.add(REAL_LOWER_EDGE_REFERENCE);
        }
        Optional<Double> lower20 = lowerEdge(model, LEVEL_20DB, NO_LOWER_FREQUENCY_20DB,
                "lower_frequency_20db_mhz", warnings, references);
        Optional<Double> lower40 = lowerEdge(model, LEVEL_40DB, NO_LOWER_FREQUENCY_40DB,
                "lower_frequency_40db_mhz", warnings, references);

        double duration6Us = model.envelopeDurationUs(LEVEL_6DB);
        double spatialPulseLengthMm = Waves.spatialPulseLengthMm(in.velocityMPerS(), duration6Us);
        return new Band(
                convention,
                edgesMhz[0],
                edgesMhz[1],
                lower20,
                model.upperEdgeMhz(LEVEL_20DB),
                lower40,
                model.upperEdgeMhz(LEVEL_40DB),
                duration6Us,
                model.envelopeDurationUs(LEVEL_20DB),
                model.cycles(LEVEL_6DB),
                spatialPulseLengthMm,
                Waves.axialResolutionMm(spatialPulseLengthMm));
    }

    private static final Reference REAL_LOWER_EDGE_REFERENCE = Reference.of("real pulse's lower band edge", Sources.REAL_LOWER_EDGE);

    private static Optional<Double> lowerEdge(GaussianPulse model, double levelDb, String code, String field,
            List<Warning> warnings, List<Reference> references) {
        double edgeMhz = model.lowerEdgeMhz(levelDb);
        if (!(edgeMhz > 0)) {
            warnings.add(PulseMessages.noLowerEdge(code, levelDb, edgeMhz, field));
            return Optional.empty();
        }
        if (RealPulseSpectrum.estimatedLowerEdgeShiftFraction(model, levelDb) > REAL_LOWER_EDGE_SOLVE_FRACTION) {
            Optional<Double> realMhz = RealPulseSpectrum.lowerEdgeMhz(model, levelDb);
            boolean departs = realMhz.isEmpty()
                    || edgeMhz - realMhz.get() > REAL_LOWER_EDGE_TOLERANCE_FRACTION * realMhz.get();
            if (departs) {
                if (!references.contains(REAL_LOWER_EDGE_REFERENCE)) {
                    references.add(REAL_LOWER_EDGE_REFERENCE);
                }
                warnings.add(PulseMessages.realLowerEdgeBelowModel(field, levelDb, edgeMhz, realMhz));
            }
        }
        return Optional.of(edgeMhz);
    }

    /** The pulse-echo -6 dB and -20 dB beam-spread half angles of an aperture. */
    private record PulseEchoSpread(Optional<Double> at6db, Optional<Double> at20db) {}

    /** Both pulse-echo beam spreads of an aperture; {@code fieldPrefix} names their fields in the warnings. */
    private static PulseEchoSpread pulseEchoSpread(double wavelengthMm, double apertureMm, String fieldPrefix,
            List<Warning> warnings) {
        Optional<Double> at6db = beamSpread(PistonDirectivity.twoWayConstant(BEAM_SPREAD_6DB),
                wavelengthMm, apertureMm, NO_BEAM_SPREAD_6DB, fieldPrefix + "beam_spread_6db_deg",
                "the pulse-echo -6 dB level", warnings);
        Optional<Double> at20db = beamSpread(PistonDirectivity.twoWayConstant(BEAM_SPREAD_20DB),
                wavelengthMm, apertureMm, NO_BEAM_SPREAD_20DB, fieldPrefix + "beam_spread_20db_deg",
                "the pulse-echo -20 dB level", warnings);
        return new PulseEchoSpread(at6db, at20db);
    }

    private static Optional<Double> beamSpread(double constant, double wavelengthMm, double diameterMm,
            String code, String field, String what, List<Warning> warnings) {
        Optional<Double> angleDeg = PistonDirectivity.halfAngleDeg(constant, wavelengthMm, diameterMm);
        if (angleDeg.isEmpty()) {
            warnings.add(PulseMessages.noBeamSpread(code, diameterMm, wavelengthMm,
                    PistonDirectivity.sineOfHalfAngle(constant, wavelengthMm, diameterMm), what, field));
        }
        return angleDeg;
    }

    private static void checkApplicability(PulseInput in) {
        if (in.centreFrequencyConvention() != null && in.bandwidthPercent() == null) {
            throw CalculationException.notApplicable("centre_frequency_convention",
                    "centre_frequency_convention applies only together with bandwidth_percent");
        }
        if (in.distanceMm() != null && in.elementDiameterMm() == null) {
            throw CalculationException.notApplicable("distance_mm",
                    "distance_mm needs element_diameter_mm: the beam diameter follows from the element's beam spread");
        }
        if (in.wedgePathMm() != null && in.wedgeVelocityMPerS() == null) {
            throw CalculationException.notApplicable("wedge_path_mm",
                    "wedge_path_mm needs wedge_velocity_m_per_s to give the near field left in the part");
        }
        if (in.wedgePathMm() != null && in.elementDiameterMm() == null) {
            throw CalculationException.notApplicable("wedge_path_mm",
                    "wedge_path_mm needs element_diameter_mm: the near field left in the part follows from "
                            + "the element's near field");
        }
        if (in.incidentAngleDeg() != null && in.wedgeVelocityMPerS() == null) {
            throw CalculationException.notApplicable("incident_angle_deg",
                    "incident_angle_deg needs wedge_velocity_m_per_s to give the refracted angle");
        }
        if (in.wedgeVelocityMPerS() != null && in.wedgePathMm() == null && in.incidentAngleDeg() == null) {
            throw CalculationException.notApplicable("wedge_velocity_m_per_s",
                    "wedge_velocity_m_per_s applies only together with wedge_path_mm or incident_angle_deg");
        }
    }
}
