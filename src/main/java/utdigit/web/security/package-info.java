/**
 * What protects every answer: security headers (Spring Security's header writers, also on the
 * container's own refusals) and optional JWT bearer authentication of /api, with Spring Security
 * installed only when a JWT issuer or key is configured.
 */
package utdigit.web.security;
