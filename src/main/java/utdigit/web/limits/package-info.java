/**
 * HTTP limits in front of every feature: request bodies read capped and with a deadline without
 * holding a thread, connections closed without draining a refused body, batches in progress
 * capped; problems written from filters.
 */
package utdigit.web.limits;
