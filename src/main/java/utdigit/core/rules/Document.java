package utdigit.core.rules;

/** A document a profile transcribes: name, edition and clause. */
public record Document(String name, String edition, String clause) {}
