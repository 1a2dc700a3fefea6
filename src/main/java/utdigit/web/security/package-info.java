/**
 * What protects the service as a whole, ahead of every feature: security headers on every answer,
 * request bodies read before any controller (capped, with a deadline, without holding a worker
 * thread while a slow client trickles), connections closed without draining a body answered early,
 * and optional JWT bearer authentication of /api.
 */
package utdigit.web.security;
