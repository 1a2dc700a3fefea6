package utdigit.core.sheets;

import utdigit.core.dac.TcgMode;

/**
 * A technique sheet's set-up for coverage, arrays, DAC/TCG, the TOFD gate and an angle beam's wedge, normalised (lengths in
 * mm). Every field is optional.
 *
 * @param beamWidth6dbMm pulse-echo -6 dB beam width at the reflector's sound path, mm; else the
 *     round probe's (probe frequency and element diameter, the part's velocity) at soundPathMm
 * @param soundPathMm sound path to the reflector the coverage is judged at, mm
 * @param indexStepMm distance between scan lines, mm
 * @param angularStepDeg angle between neighbouring beams of a sector scan, deg
 * @param elementPitchMm array element pitch, mm
 * @param activeElements elements fired together
 * @param maxSteeringAngleDeg largest steering angle used, deg, in the medium of the steering
 * @param steeringVelocityMPerS velocity of the medium where the beam is steered (a wedge's for an
 *     array on a wedge), m/s; null: the part's velocity (a contact array)
 * @param dacSpanDb span of the DAC curve, dB
 * @param tcg how the span is corrected; null: NONE
 * @param gateStartUs TOFD gate opening time in the part, us
 * @param gateEndUs TOFD gate closing time in the part, us
 * @param incidentAngleDeg an angle beam's incident angle in its wedge, deg, in [0, 90)
 * @param wedgeVelocityMPerS longitudinal velocity of that wedge, m/s
 */
public record SheetSetup(Double beamWidth6dbMm, Double soundPathMm, Double indexStepMm, Double angularStepDeg,
                         Double elementPitchMm, Integer activeElements, Double maxSteeringAngleDeg,
                         Double steeringVelocityMPerS, Double dacSpanDb,
                         TcgMode tcg, Double gateStartUs, Double gateEndUs,
                         Double incidentAngleDeg, Double wedgeVelocityMPerS) {
    public static final SheetSetup EMPTY =
            new SheetSetup(null, null, null, null, null, null, null, null, null, null, null, null);

    /** A set-up without an angle beam's wedge. */
    public SheetSetup(Double beamWidth6dbMm, Double soundPathMm, Double indexStepMm, Double angularStepDeg,
                      Double elementPitchMm, Integer activeElements, Double maxSteeringAngleDeg,
                      Double steeringVelocityMPerS, Double dacSpanDb, TcgMode tcg, Double gateStartUs, Double gateEndUs) {
        this(beamWidth6dbMm, soundPathMm, indexStepMm, angularStepDeg, elementPitchMm, activeElements,
                maxSteeringAngleDeg, steeringVelocityMPerS, dacSpanDb, tcg, gateStartUs, gateEndUs, null, null);
    }

    /** Both of an angle beam's wedge inputs are given (the incidence-plane figures need them together). */
    public boolean angleBeam() {
        return incidentAngleDeg != null && wedgeVelocityMPerS != null;
    }
}
