package utdigit.core.rules;

/** Whether a profile's values were checked against the edition they cite. */
public enum VerificationStatus {
    /** Checked by a qualified person against the cited edition. */
    VERIFIED,
    /** Not checked: a transcription or recollection; verify before relying on it. */
    UNVERIFIED
}
