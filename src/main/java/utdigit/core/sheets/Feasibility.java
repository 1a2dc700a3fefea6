package utdigit.core.sheets;

import java.util.List;
import utdigit.core.common.CalculationError;
import utdigit.core.common.CalculationException;
import utdigit.core.rules.Finding;
import utdigit.core.rules.Verdict;

/**
 * The service's own feasibility checks, applied to every sheet whatever its profiles: settings that
 * cannot work together physically (a gate longer than the firing period, a TOFD depth below the back
 * wall...). The single endpoints refuse such inputs with a 422; inside a sheet each is a FAIL
 * finding of profile {@link Finding#FEASIBILITY} with the check's id and the calculator's reason, so
 * that a bulk run records a failed sheet rather than an unreadable row.
 *
 * <p>The checks are the calculators' own (one implementation): this class only names them.
 */
public final class Feasibility {
    private Feasibility() {}

    /** A check of the service: its id (kebab-case, unique within {@link Finding#FEASIBILITY}) and title. */
    public record Check(String id, String title) {}

    public static final Check GATE_WITHIN_FIRING_PERIOD = new Check("gate-within-firing-period",
            "The gate ends before the next firing: gate length at most the pulse repetition period");
    public static final Check POSITION_COUNTABLE = new Check("position-size-countable",
            "The bytes of one scan position can be counted (below 2^63)");
    public static final Check TOFD_DEPTH_WITHIN_WALL = new Check("tofd-depth-within-wall",
            "The TOFD depth of interest lies inside the wall (at most the thickness)");
    public static final Check FULL_SCREEN_CODE = new Check("full-screen-code",
            "The code mapping has a positive code to put at full screen");
    public static final Check EVALUATION_HEIGHT_ON_SCREEN = new Check("evaluation-height-on-screen",
            "The evaluation height (reference height at the evaluation level) is on the screen (at most 100 %FSH)");
    public static final Check SHEAR_WAVE_IN_SOLID = new Check("shear-wave-in-solid",
            "A shear wave is asked of a material that carries one (not a liquid)");
    /** Any other pair of settings a calculator finds impossible together. */
    public static final Check SETTINGS_POSSIBLE_TOGETHER = new Check("settings-possible-together",
            "The sheet's settings are possible together");

    /** Every check, in the order they are reported. */
    public static final List<Check> CHECKS = List.of(GATE_WITHIN_FIRING_PERIOD, POSITION_COUNTABLE,
            TOFD_DEPTH_WITHIN_WALL, FULL_SCREEN_CODE, EVALUATION_HEIGHT_ON_SCREEN, SHEAR_WAVE_IN_SOLID,
            SETTINGS_POSSIBLE_TOGETHER);

    /** Whether a calculator failure is one of these checks (settings impossible together). */
    public static boolean isFeasibilityFailure(CalculationException e) {
        return e.error() == CalculationError.IMPOSSIBLE_COMBINATION;
    }

    /** The check a calculator's IMPOSSIBLE_COMBINATION failure is, from the inputs it names. */
    public static Check checkOf(CalculationException e) {
        List<String> fields = e.fields();
        if (fields.contains("pulse_repetition_frequency_hz")) {
            return GATE_WITHIN_FIRING_PERIOD;
        }
        if (fields.contains("sampling_frequency_mhz") && fields.stream().anyMatch(f -> f.startsWith("gate_length"))) {
            return POSITION_COUNTABLE;
        }
        if (fields.contains("depth") || fields.contains("depth_mm")) {
            return TOFD_DEPTH_WITHIN_WALL;
        }
        if (fields.contains("code_mapping")) {
            return FULL_SCREEN_CODE;
        }
        if (fields.contains("evaluation_level_db")) {
            return EVALUATION_HEIGHT_ON_SCREEN;
        }
        if (fields.contains("wave_mode")) {
            return SHEAR_WAVE_IN_SOLID;
        }
        return SETTINGS_POSSIBLE_TOGETHER;
    }

    /**
     * The FAIL finding of a calculator's IMPOSSIBLE_COMBINATION failure.
     *
     * @param calculation the calculation that found it (prefixes the reason: "acquisition: ...")
     */
    public static Finding failure(String calculation, CalculationException e) {
        Check check = checkOf(e);
        return new Finding(Finding.FEASIBILITY, check.id(), check.title(), null, null, null, null, null,
                Verdict.FAIL, List.of(), List.of(), calculation + ": " + e.getMessage(), e.fields());
    }
}
