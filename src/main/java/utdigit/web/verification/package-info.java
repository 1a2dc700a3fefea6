/**
 * POST /api/stamp-verifications: recomputes a stamped answer and compares it with the
 * document, field by field.
 */
package utdigit.web.verification;
