package utdigit.core.rules;

/** The outcome of a rule, or of a whole sheet. */
public enum Verdict {
    PASS,
    FAIL,
    /** Of a rule: a value it needs was not computable from the sheet's inputs. */
    NOT_EVALUATED,
    /** Of a sheet: no rule failed, but at least one could not be evaluated. */
    INCOMPLETE
}
