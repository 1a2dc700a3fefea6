package utdigit.core.rules;

/**
 * The outcome of a rule, of a profile on a sheet, or of a whole sheet. A sheet's verdict under
 * several profiles is the worst of theirs, in the order FAIL, INCOMPLETE, NOT_COVERED, PASS.
 */
public enum Verdict {
    PASS,
    FAIL,
    /** Of a rule: a value it needs was not computable from the sheet's inputs. */
    NOT_EVALUATED,
    /** Of a sheet or profile: no rule failed, but at least one could not be evaluated. */
    INCOMPLETE,
    /**
     * Of a sheet or profile: no rule of the profile applies to the sheet (its technique or its
     * conditions), so nothing was checked; never a PASS.
     */
    NOT_COVERED;

    /** The worse of two sheet or profile verdicts: FAIL, then INCOMPLETE, then NOT_COVERED, then PASS. */
    public static Verdict worst(Verdict a, Verdict b) {
        return a.severity() >= b.severity() ? a : b;
    }

    private int severity() {
        return switch (this) {
            case PASS -> 0;
            case NOT_COVERED -> 1;
            case NOT_EVALUATED, INCOMPLETE -> 2;
            case FAIL -> 3;
        };
    }
}
