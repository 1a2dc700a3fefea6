/**
 * Problem answers (RFC 9457): the types, the field errors, the one advice that turns failures
 * into problems, and the translation of JSON read failures.
 */
package utdigit.web.problem;
