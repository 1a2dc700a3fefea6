/**
 * The one path from a request to its stamped answer: the Calculation of each endpoint, the
 * runner that validates, computes, stamps and answers it (single, sheet or batch row), notes and
 * tolerance checks shared by the answers.
 */
package utdigit.web.pipeline;
